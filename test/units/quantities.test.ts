import { describe, expect, it } from 'vitest';
import {
  CV_PER_KV,
  DISPLAY_UNITS,
  QUANTITY_DIMENSION,
  UNITS,
  displayUnit,
  fromDisplay,
  parseQuantity,
  toDisplay,
  unitBySymbol,
  unitsFor,
  type Quantity,
} from '../../src/lib/units';

/** SI value of 1 of the unit (factor), looked up from the table. */
function factor(symbol: string): number {
  const unit = unitBySymbol(symbol);
  if (!unit) throw new Error(`no unit ${symbol}`);
  return unit.factor;
}

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('unit table spot values — NIST SP 811 (2008), Appendix B.8', () => {
  it('inch = 2.54 E-02 m and foot = 3.048 E-01 m (exact)', () => {
    expect(factor('in')).toBe(0.0254);
    expect(factor('ft')).toBeCloseTo(0.3048, 15);
  });

  it('US gallon = 3.785411784 L exact (231 in³), gpm = 6.309020 E-05 m³/s', () => {
    expect(factor('gpm') * 60).toBeCloseTo(3.785411784e-3, 15);
    expect(rel(factor('gpm'), 6.30902e-5)).toBeLessThan(1e-6);
  });

  it('psi = 6.894757 E+03 Pa, bar = 1 E+05 Pa exact', () => {
    expect(rel(factor('psi'), 6.894757e3)).toBeLessThan(1e-7);
    expect(factor('bar')).toBe(1e5);
    expect(factor('barg')).toBe(1e5);
    expect(factor('psia')).toBe(factor('psi'));
  });

  it('lb/ft³ = 1.601846 E+01 kg/m³, lb/h = 1.259979 E-04 kg/s, ft³/s = 2.831685 E-02 m³/s', () => {
    expect(rel(factor('lb/ft3'), 1.601846e1)).toBeLessThan(1e-6);
    expect(rel(factor('lb/h'), 1.259979e-4)).toBeLessThan(1e-6);
    expect(rel(factor('ft3/s'), 2.831685e-2)).toBeLessThan(1e-6);
  });

  it('horsepower (550 ft·lbf/s) = 7.456999 E+02 W; cP = 1 E-03 Pa·s; cSt = 1 E-06 m²/s', () => {
    expect(rel(factor('hp'), 7.456999e2)).toBeLessThan(1e-7);
    expect(factor('cP')).toBe(1e-3);
    expect(factor('cSt')).toBe(1e-6);
  });

  it('°F ↔ K: T/K = (t/°F + 459.67)/1.8 (B.8); 32 °F = 273.15 K, 212 °F = 373.15 K, −40 °F = −40 °C', () => {
    expect(fromDisplay(32, 'temperature', 'US')).toBeCloseTo(273.15, 10);
    expect(fromDisplay(212, 'temperature', 'US')).toBeCloseTo(373.15, 10);
    expect(toDisplay(fromDisplay(-40, 'temperature', 'US'), 'temperature', 'SI')).toBeCloseTo(
      -40,
      10,
    );
    expect(toDisplay(0, 'temperature', 'US')).toBeCloseTo(-459.67, 10);
  });

  it('Cv = 1.156 Kv (IEC 60534-2-1) agrees with the unit definitions (gpm per m³/h × √(psi/bar))', () => {
    const fromDefinitions = (factor('m3/h') / factor('gpm')) * Math.sqrt(factor('psi') / 1e5);
    expect(rel(CV_PER_KV, fromDefinitions)).toBeLessThan(2e-4);
    expect(parseQuantity('1.156 Cv', 'kvCoefficient', 'SI')).toEqual({ ok: true, value: 1 });
  });
});

describe('unit table structure', () => {
  it('every spelling names one unit only', () => {
    const spellings = UNITS.flatMap((u) => [u.symbol, ...u.aliases]);
    expect(new Set(spellings).size).toBe(spellings.length);
  });

  it('every display unit exists and has the quantity’s dimension', () => {
    for (const quantity of Object.keys(DISPLAY_UNITS) as Quantity[]) {
      for (const system of ['SI', 'US'] as const) {
        const unit = unitBySymbol(displayUnit(quantity, system));
        expect(unit?.dimension, `${quantity} ${system}`).toBe(QUANTITY_DIMENSION[quantity]);
        expect(unitsFor(quantity)).toContain(unit?.symbol);
      }
    }
  });

  it('pressure drops accept only plain pressure units', () => {
    expect(unitsFor('pressureDrop')).toEqual(['Pa', 'kPa', 'MPa', 'mbar', 'bar', 'psi']);
    expect(unitsFor('pressureAbs')).toContain('barg');
  });

  it('display units per system (the agreed contract)', () => {
    expect(displayUnit('volumeFlow', 'SI')).toBe('m3/h');
    expect(displayUnit('volumeFlow', 'US')).toBe('gpm');
    expect(displayUnit('pressureAbs', 'US')).toBe('psia');
    expect(displayUnit('pressureGauge', 'SI')).toBe('barg');
    expect(displayUnit('fraction', 'SI')).toBe('%');
  });
});
