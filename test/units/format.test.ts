import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  DISPLAY_UNITS,
  formatNumber,
  formatQuantity,
  fromDisplay,
  parseQuantity,
  toDisplay,
  type Quantity,
  type UnitSystem,
} from '../../src/lib/units';

const QUANTITIES = Object.keys(DISPLAY_UNITS) as Quantity[];
const SYSTEMS: UnitSystem[] = ['SI', 'US'];
const atm = { atmosphericPressure: 101325 };

/** Largest rounding error of a number shown with `digits` significant figures. */
function displayTolerance(shown: number, digits: number): number {
  const abs = Math.abs(shown);
  if (abs === 0) return 0;
  const exponent = Math.floor(Math.log10(abs));
  return 0.5 * 10 ** (exponent - digits + 1) * (1 + 1e-9) + 1e-12 * abs;
}

/** Display values worth trying: wide in magnitude, both signs, plus exact zero. */
const displayValue = fc.oneof(
  fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true }),
  fc.double({ min: 1e-9, max: 1, noNaN: true }),
  fc.constant(0),
);

describe('formatNumber', () => {
  it('engineering precision with trailing zeros dropped', () => {
    expect(formatNumber(2.5)).toBe('2.5');
    expect(formatNumber(0.0123456)).toBe('0.01235');
    expect(formatNumber(1.23456)).toBe('1.235');
    expect(formatNumber(999.96)).toBe('1000');
    expect(formatNumber(9999.6)).toBe('10000');
    expect(formatNumber(123456.7)).toBe('123457');
    expect(formatNumber(1.5e-5)).toBe('1.5e-5');
    expect(formatNumber(-2.5e-5)).toBe('-2.5e-5');
    expect(formatNumber(1e20)).toBe('1e20');
    expect(formatNumber(3.14159, 3)).toBe('3.14');
  });

  it('never shows -0, and shows non-finite values as a dash', () => {
    expect(formatNumber(-0)).toBe('0');
    expect(formatNumber(0)).toBe('0');
    expect(formatNumber(NaN)).toBe('—');
    expect(formatNumber(Infinity)).toBe('—');
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (v) => {
        expect(formatNumber(v)).not.toMatch(/^-0(\.0*)?$/);
        expect(formatNumber(v)).not.toMatch(/,/);
      }),
    );
  });
});

describe('formatQuantity', () => {
  it('shows the display unit of the system', () => {
    expect(formatQuantity(250000, 'pressureAbs', 'SI')).toBe('2.5 bara');
    expect(formatQuantity(0.0254, 'diameter', 'US')).toBe('1 in');
    expect(formatQuantity(293.15, 'temperature', 'US')).toBe('68 °F');
    expect(formatQuantity(0.5, 'fraction', 'SI')).toBe('50 %');
    expect(formatQuantity(100 / 3600, 'volumeFlow', 'SI', { withUnit: false })).toBe('100');
    expect(formatQuantity(NaN, 'head', 'SI')).toBe('—');
  });

  it('can show another unit, crossing gauge/absolute with the atmospheric pressure', () => {
    expect(formatQuantity(250000, 'pressureAbs', 'SI', { unit: 'barg', context: atm })).toBe(
      '1.487 barg',
    );
    expect(formatQuantity(0.1016, 'diameter', 'SI', { unit: 'in' })).toBe('4 in');
    expect(() => formatQuantity(250000, 'pressureAbs', 'SI', { unit: 'barg' })).toThrow(
      /atmospheric pressure/,
    );
    expect(() => formatQuantity(1, 'head', 'SI', { unit: 'gpm' })).toThrow(/is a flow/);
  });
});

describe('round trips (property-based, fast-check)', () => {
  it('fromDisplay(toDisplay(v)) = v for every quantity and system', () => {
    for (const quantity of QUANTITIES) {
      for (const system of SYSTEMS) {
        fc.assert(
          fc.property(displayValue, (shown) => {
            const si = fromDisplay(shown, quantity, system);
            const back = toDisplay(si, quantity, system);
            expect(Math.abs(back - shown)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(shown)));
          }),
          { numRuns: 60 },
        );
      }
    }
  });

  it('parse(format(v)) returns v within the display precision, with or without the unit', () => {
    for (const quantity of QUANTITIES) {
      for (const system of SYSTEMS) {
        fc.assert(
          fc.property(
            displayValue,
            fc.integer({ min: 3, max: 6 }),
            fc.boolean(),
            (shown, digits, withUnit) => {
              const si = fromDisplay(shown, quantity, system);
              // Skip values no one can type: below absolute zero or below zero absolute pressure.
              fc.pre(!((quantity === 'temperature' || quantity === 'pressureAbs') && si < 0));
              const text = formatQuantity(si, quantity, system, { digits, withUnit });
              const parsed = parseQuantity(text, quantity, system, atm);
              if (!parsed.ok) throw new Error(`${text}: ${parsed.message}`);
              const back = toDisplay(parsed.value, quantity, system);
              expect(Math.abs(back - shown)).toBeLessThanOrEqual(
                displayTolerance(shown, digits) + 1e-9,
              );
            },
          ),
          { numRuns: 60 },
        );
      }
    }
  });

  it('a value shown in the other system reads back in this one', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e3, max: 1e7, noNaN: true }), (pa) => {
        const text = formatQuantity(pa, 'pressureAbs', 'US', { digits: 6 });
        const parsed = parseQuantity(text, 'pressureAbs', 'SI');
        if (!parsed.ok) throw new Error(`${text}: ${parsed.message}`);
        expect(Math.abs(parsed.value - pa) / pa).toBeLessThan(5e-6);
      }),
    );
  });
});
