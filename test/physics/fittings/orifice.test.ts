import { describe, expect, it } from 'vitest';
import {
  orificeLossCoefficient,
  orificePressureLossRatio,
  readerHarrisGallagherC,
} from '../../../src/lib/physics/fittings';

describe('orificeLossCoefficient (ISO 5167-2:2003)', () => {
  it('matches the ISO 5167-2 flow equation and pressure-loss formula evaluated here (C = 0.61)', () => {
    const D = 0.1;
    const d = 0.05;
    const rho = 998;
    const V = 1.7;
    const C = 0.61;
    const beta = d / D;
    // ISO 5167-2, 4.1 (ε = 1): q_m = C/√(1 − β⁴) · (π/4) d² · √(2 Δp ρ) → solve for Δp.
    const massFlow = rho * V * (Math.PI / 4) * D * D;
    const perRootDp = (C / Math.sqrt(1 - beta ** 4)) * (Math.PI / 4) * d * d * Math.sqrt(2 * rho);
    const dp = (massFlow / perRootDp) ** 2;
    // ISO 5167-2, 5.4.1 eq. (5).
    const s = Math.sqrt(1 - beta ** 4 * (1 - C * C));
    const permanentLoss = ((s - C * beta ** 2) / (s + C * beta ** 2)) * dp;
    const expected = permanentLoss / (0.5 * rho * V * V);
    expect(orificeLossCoefficient(D, d)).toBeCloseTo(expected, 10);
    expect(expected).toBeCloseTo(29.457, 2); // hand value for β = 0.5, C = 0.61
  });

  it('uses Reader-Harris/Gallagher C when a Reynolds number is given', () => {
    const D = 0.1;
    const d = 0.05;
    const re = 1e6;
    const C = readerHarrisGallagherC(0.5, re, D);
    const b4 = 0.5 ** 4;
    const expected = ((1 - b4) / (C * C * b4)) * orificePressureLossRatio(0.5, C);
    expect(orificeLossCoefficient(D, d, re)).toBeCloseTo(expected, 12);
  });

  it('is close to the approximate relation Δϖ ≈ (1 − β^1.9) Δp (ISO 5167-2, 5.4 — from memory)', () => {
    for (const beta of [0.2, 0.3, 0.4, 0.5]) {
      const ratio = orificePressureLossRatio(beta, 0.6);
      expect(Math.abs(ratio - (1 - beta ** 1.9)) / ratio).toBeLessThan(0.02);
    }
  });

  it('falls as the bore opens and is 0 for a bore as large as the pipe', () => {
    let previous = Infinity;
    for (const beta of [0.1, 0.2, 0.4, 0.6, 0.75, 0.9]) {
      const k = orificeLossCoefficient(0.1, 0.1 * beta);
      expect(k).toBeLessThan(previous);
      expect(k).toBeGreaterThan(0);
      previous = k;
    }
    expect(orificeLossCoefficient(0.1, 0.1)).toBe(0);
  });

  it('rejects non-positive diameters with a clear message', () => {
    expect(() => orificeLossCoefficient(0.1, 0)).toThrow(/positive/);
    expect(() => orificeLossCoefficient(-1, 0.05)).toThrow(/positive/);
  });
});

describe('readerHarrisGallagherC (ISO 5167-2:2003 eq. 4, corner tappings)', () => {
  /** ISO 5167-2 eq. (4) written out term by term for L1 = L'2 = 0. */
  function isoEquation4(beta: number, re: number, diameterMm: number): number {
    const A = ((19000 * beta) / re) ** 0.8;
    let c =
      0.5961 +
      0.0261 * beta ** 2 -
      0.216 * beta ** 8 +
      0.000521 * ((1e6 * beta) / re) ** 0.7 +
      (0.0188 + 0.0063 * A) * beta ** 3.5 * (1e6 / re) ** 0.3 +
      (0.043 + 0.08 - 0.123) * (1 - 0.11 * A) * (beta ** 4 / (1 - beta ** 4));
    if (diameterMm < 71.12) c += 0.011 * (0.75 - beta) * (2.8 - diameterMm / 25.4);
    return c;
  }

  it.each([
    [0.5, 1e6, 100],
    [0.2, 1e5, 200],
    [0.75, 3e4, 500],
    [0.4, 1e5, 52.5],
  ])('β = %f, Re_D = %f, D = %f mm', (beta, re, dMm) => {
    expect(readerHarrisGallagherC(beta, re, dMm / 1000)).toBeCloseTo(
      isoEquation4(beta, re, dMm),
      12,
    );
  });

  it('stays between 0.59 and 0.65 within the standard’s range (orifice C ≈ 0.6 — common knowledge, from memory)', () => {
    for (const beta of [0.1, 0.3, 0.5, 0.75]) {
      for (const re of [Math.max(5000, 16000 * beta ** 2), 1e5, 1e7]) {
        const c = readerHarrisGallagherC(beta, re, 0.2);
        expect(c).toBeGreaterThan(0.59);
        expect(c).toBeLessThan(0.65);
      }
    }
  });

  it('is held at the standard’s lowest Re_D below it (ISO 5167-2: Re_D ≥ 5000, and ≥ 16000 β² for β > 0.56)', () => {
    expect(readerHarrisGallagherC(0.5, 10, 0.1)).toBe(readerHarrisGallagherC(0.5, 5000, 0.1));
    expect(readerHarrisGallagherC(0.75, 10, 0.1)).toBe(readerHarrisGallagherC(0.75, 9000, 0.1));
  });
});
