import { describe, expect, it } from 'vitest';
import { parseQuantity, unitBySymbol } from '../../src/lib/units';

const atm = { atmosphericPressure: 101325 };
const PSI = unitBySymbol('psi')!.factor;

/** Value of a successful parse; fails the test with the message otherwise. */
function value(...args: Parameters<typeof parseQuantity>): number {
  const r = parseQuantity(...args);
  if (!r.ok) throw new Error(r.message);
  return r.value;
}

/** Message of a failed parse; fails the test if it parsed. */
function message(...args: Parameters<typeof parseQuantity>): string {
  const r = parseQuantity(...args);
  if (r.ok) throw new Error(`expected an error for '${args[0]}', got ${r.value}`);
  return r.message;
}

describe('parseQuantity: numbers with units (factors: NIST SP 811 (2008) App. B)', () => {
  it('reads the examples of the contract', () => {
    expect(value('3 in', 'diameter', 'SI')).toBeCloseTo(0.0762, 12);
    expect(value('150 gpm', 'volumeFlow', 'SI')).toBeCloseTo((150 * 3.785411784e-3) / 60, 12);
    expect(value('2.5 barg', 'pressureAbs', 'SI', atm)).toBeCloseTo(351325, 6);
    expect(value('35 psia', 'pressureAbs', 'SI')).toBeCloseTo(35 * 6894.757293168, 3);
    expect(value('60 °C', 'temperature', 'US')).toBeCloseTo(333.15, 10);
    expect(value('80 F', 'temperature', 'SI')).toBeCloseTo((80 + 459.67) / 1.8, 10);
    expect(value('1,200 kg/m3', 'density', 'US')).toBe(1200);
    expect(value('12.5 m3/h', 'volumeFlow', 'US')).toBeCloseTo(12.5 / 3600, 14);
    expect(value('3 cP', 'dynamicViscosity', 'SI')).toBeCloseTo(0.003, 15);
  });

  it('no unit means the display unit of the system', () => {
    expect(value('100', 'diameter', 'SI')).toBeCloseTo(0.1, 14);
    expect(value('4', 'diameter', 'US')).toBeCloseTo(0.1016, 14);
    expect(value('100', 'volumeFlow', 'US')).toBeCloseTo((100 * 3.785411784e-3) / 60, 14);
    expect(value('50', 'fraction', 'SI')).toBeCloseTo(0.5, 14);
    expect(value('68', 'temperature', 'US')).toBeCloseTo(293.15, 10);
  });

  it('accepts common spellings, no space, exponents, signs and thousands groups', () => {
    expect(value('100 m³/h', 'volumeFlow', 'SI')).toBeCloseTo(100 / 3600, 14);
    expect(value('100m^3/h', 'volumeFlow', 'SI')).toBeCloseTo(100 / 3600, 14);
    expect(value('2 Pa·s', 'dynamicViscosity', 'SI')).toBe(2);
    expect(value('0.89 mPa s', 'dynamicViscosity', 'SI')).toBeCloseTo(0.00089, 15);
    expect(value('45um', 'roughness', 'SI')).toBeCloseTo(4.5e-5, 15);
    expect(value('1.5e-5 m', 'roughness', 'SI')).toBe(1.5e-5);
    expect(value('−3.5 m', 'elevation', 'SI')).toBe(-3.5);
    expect(value('+2 ft', 'elevation', 'SI')).toBeCloseTo(0.6096, 14);
    expect(value('12,345.5 kg/h', 'massFlow', 'SI')).toBeCloseTo(12345.5 / 3600, 12);
    expect(value('10 US gpm', 'volumeFlow', 'SI')).toBeCloseTo(6.30902e-4, 9);
    expect(value('50 PSIG', 'pressureGauge', 'SI')).toBeCloseTo(50 * PSI, 6);
    expect(value('1 MPA', 'pressureAbs', 'SI')).toBe(1e6);
    expect(value('-0', 'elevation', 'SI')).toBe(0);
    expect(Object.is(value('-0', 'elevation', 'SI'), -0)).toBe(false);
  });
});

describe('parseQuantity: gauge and absolute pressure', () => {
  it('gauge units into an absolute quantity add the atmospheric pressure', () => {
    expect(value('0 barg', 'pressureAbs', 'SI', atm)).toBe(101325);
    expect(value('10 psig', 'pressureAbs', 'US', atm)).toBeCloseTo(10 * PSI + 101325, 6);
    expect(value('20 kPag', 'pressureAbs', 'SI', { atmosphericPressure: 95000 })).toBe(115000);
  });

  it('absolute units into a gauge quantity subtract it', () => {
    expect(value('1.01325 bara', 'pressureGauge', 'SI', atm)).toBeCloseTo(0, 8);
    expect(value('50 kPa(a)', 'pressureGauge', 'SI', atm)).toBe(-51325);
  });

  it('plain bar/kPa/psi take the reference of the quantity', () => {
    expect(value('2 bar', 'pressureAbs', 'SI', atm)).toBe(2e5);
    expect(value('2 bar', 'pressureGauge', 'SI', atm)).toBe(2e5);
    expect(value('150 kPa', 'pressureAbs', 'SI')).toBe(150000);
    expect(value('3 psi', 'pressureDrop', 'SI')).toBeCloseTo(3 * PSI, 8);
  });

  it('the same reference needs no atmospheric pressure', () => {
    expect(value('2 bara', 'pressureAbs', 'SI')).toBe(2e5);
    expect(value('2 barg', 'pressureGauge', 'SI')).toBe(2e5);
  });

  it('crossing gauge and absolute without an atmospheric pressure is refused', () => {
    expect(message('2 barg', 'pressureAbs', 'SI')).toMatch(/atmospheric pressure/);
    expect(message('2 psia', 'pressureGauge', 'US')).toMatch(/atmospheric pressure/);
  });

  it('pressure drops refuse gauge and absolute units', () => {
    expect(message('2 barg', 'pressureDrop', 'SI')).toMatch(
      /^'barg' is a gauge pressure; a pressure drop has no gauge or absolute reference/,
    );
    expect(message('5 psia', 'pressureDrop', 'US')).toMatch(/'psia' is an absolute pressure/);
  });

  it('an absolute pressure below zero is refused; a negative gauge pressure is fine', () => {
    expect(message('-0.5 bara', 'pressureAbs', 'SI')).toMatch(/below zero absolute pressure/);
    expect(message('-1.5 barg', 'pressureAbs', 'SI', atm)).toMatch(/below zero absolute/);
    expect(value('-0.5 barg', 'pressureGauge', 'SI')).toBe(-50000);
  });
});

describe('parseQuantity: messages for bad input', () => {
  it('empty text', () => {
    expect(message('', 'diameter', 'SI')).toBe(
      'Enter a diameter: a number, optionally with a unit such as mm',
    );
    expect(message('   ', 'volumeFlow', 'US')).toMatch(/such as gpm/);
  });

  it('not a number', () => {
    expect(message('abc', 'length', 'SI')).toBe("'abc' is not a number");
    expect(message('in', 'length', 'SI')).toBe("'in' is not a number");
  });

  it('NaN, Infinity and overflow', () => {
    expect(message('NaN', 'length', 'SI')).toBe("'NaN' is not a finite number");
    expect(message('-Infinity m', 'length', 'SI')).toBe("'-Infinity m' is not a finite number");
    expect(message('∞', 'length', 'SI')).toMatch(/not a finite number/);
    expect(message('1e400', 'length', 'SI')).toMatch(/too large/);
  });

  it('a decimal comma is refused, not guessed', () => {
    expect(message('1,5 m', 'length', 'SI')).toMatch(/use a point for decimals/);
    expect(message('1,2345', 'length', 'SI')).toMatch(/use a point for decimals/);
  });

  it('unknown unit lists the units that fit', () => {
    expect(message('3 furlong', 'length', 'SI')).toBe(
      "'furlong' is not a unit Headroute knows for a length; use m, mm, cm, km, µm, in, ft",
    );
  });

  it('wrong dimension names both', () => {
    expect(message('150 gpm', 'length', 'SI')).toBe("'gpm' is a flow, not a length");
    expect(message('2 bar', 'head', 'SI')).toBe("'bar' is a pressure, not a head");
    expect(message('3 m', 'volumeFlow', 'SI')).toBe("'m' is a length, not a flow");
    expect(message('20 °C', 'pressureAbs', 'SI')).toBe(
      "'°C' is a temperature, not an absolute pressure",
    );
  });

  it('m and M are not confused (mPa·s versus MPa·s)', () => {
    expect(message('1 MPa·s', 'dynamicViscosity', 'SI')).toMatch(/did you mean 'mPa.s'/);
  });

  it('below absolute zero', () => {
    expect(message('-300 °C', 'temperature', 'SI')).toBe("'-300 °C' is below absolute zero");
  });
});
