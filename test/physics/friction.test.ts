import { describe, expect, it } from 'vitest';
import {
  colebrookWhite,
  darcyFrictionFactor,
  LAMINAR_LIMIT_REYNOLDS,
  reynoldsNumber,
  TURBULENT_LIMIT_REYNOLDS,
} from '../../src/lib/physics/friction';

/**
 * Independent solution of Colebrook–White (Colebrook 1939):
 * 1/√f = −2 log10(ε/3.7D + 2.51/(Re √f)), by plain bisection on x = 1/√f until the bracket
 * can shrink no further in double precision. Written here, separately from the Newton solver.
 */
function colebrookByBisection(reynolds: number, relativeRoughness: number): number {
  // With √f = 1/x: 2.51/(Re √f) = 2.51 x / Re.
  const residual = (x: number) =>
    x + 2 * Math.log10(relativeRoughness / 3.7 + (2.51 * x) / reynolds);
  let lo = 1e-12;
  let hi = 100;
  expect(residual(lo)).toBeLessThan(0);
  expect(residual(hi)).toBeGreaterThan(0);
  for (let i = 0; i < 400; i++) {
    const mid = 0.5 * (lo + hi);
    if (mid === lo || mid === hi) break;
    if (residual(mid) < 0) lo = mid;
    else hi = mid;
  }
  const x = 0.5 * (lo + hi);
  return 1 / (x * x);
}

function relativeError(value: number, reference: number): number {
  return Math.abs(value - reference) / Math.abs(reference);
}

describe('reynoldsNumber', () => {
  it('is ρ|v|D/μ (definition), ignoring the sign of the velocity', () => {
    // Water near 20 °C: ρ = 998.2 kg/m³, μ = 1.002 mPa·s (values only used as inputs).
    expect(reynoldsNumber(-1, 0.05, 998.2, 1.002e-3)).toBeCloseTo((998.2 * 0.05) / 1.002e-3, 6);
    expect(reynoldsNumber(2, 0.1, 1000, 1e-3)).toBeCloseTo(2e5, 6);
  });
});

describe('colebrookWhite', () => {
  // Grid Re 10³–10⁸ (log spaced, 6 per decade) × ε/D 0–0.05.
  const roughnesses = [0, 1e-6, 1e-5, 1e-4, 5e-4, 1e-3, 5e-3, 0.01, 0.02, 0.05];
  const reynoldsGrid = Array.from({ length: 31 }, (_, i) => 10 ** (3 + i / 6));

  it('matches an independent bisection solution to 1e-9 relative over the grid (Colebrook 1939 equation)', () => {
    let worst = 0;
    for (const rr of roughnesses) {
      for (const re of reynoldsGrid) {
        const err = relativeError(colebrookWhite(re, rr), colebrookByBisection(re, rr));
        worst = Math.max(worst, err);
      }
    }
    expect(worst).toBeLessThan(1e-9);
  });

  // Reference values computed outside the project: Colebrook–White solved by bisection in
  // Python 3's decimal module at 50 significant digits (200 halvings of [1e-12, 100] on
  // x = 1/√f), rounded here to 14 significant digits.
  it.each([
    [1e3, 0, 0.062589114951891],
    [4e3, 0.05, 0.076986834889225],
    [1e5, 1e-4, 0.018513866077472],
    [1e6, 1e-3, 0.019943465840477],
    [1e8, 0, 0.0059404663516368],
    [3.3e4, 2e-5, 0.023022901231143],
  ])('Re = %f, ε/D = %f gives f = %f to 1e-12 (50-digit decimal bisection)', (re, rr, f) => {
    expect(relativeError(colebrookWhite(re, rr), f)).toBeLessThan(1e-12);
  });

  it('satisfies its own equation to 1e-12 (residual check, Colebrook 1939)', () => {
    for (const rr of roughnesses) {
      for (const re of [4e3, 1e5, 1e8]) {
        const f = colebrookWhite(re, rr);
        const lhs = 1 / Math.sqrt(f);
        const rhs = -2 * Math.log10(rr / 3.7 + 2.51 / (re * Math.sqrt(f)));
        expect(relativeError(lhs, rhs)).toBeLessThan(1e-12);
      }
    }
  });

  it('agrees with Haaland (1983) within its stated ±2 % (Haaland, J. Fluids Eng. 105:89)', () => {
    for (const rr of [0, 1e-5, 1e-4, 1e-3, 0.01, 0.05]) {
      for (const re of [4e3, 1e4, 1e5, 1e6, 1e7, 1e8]) {
        const haaland = (-1.8 * Math.log10((rr / 3.7) ** 1.11 + 6.9 / re)) ** -2;
        expect(relativeError(colebrookWhite(re, rr), haaland)).toBeLessThan(0.02);
      }
    }
  });

  // Readings of the Moody chart (Moody 1944, Trans. ASME 66, Fig. 1). The readings are from
  // memory of the chart. The band is the chart's readability: on its logarithmic f axis the
  // minor divisions are 0.001 apart near f = 0.02, so half a division is about 2.5 %, and a
  // careful reading is good to about a third of a division; 1.5 % is used. (At 3 % the
  // ε/D = 1e-4 reading, 0.0185, passed for ε/D = 2e-4, where Colebrook gives 0.0190.)
  it.each([
    { re: 1e5, rr: 0, f: 0.018, note: 'smooth pipe, Re = 1e5' },
    { re: 1e6, rr: 0, f: 0.0116, note: 'smooth pipe, Re = 1e6' },
    { re: 1e6, rr: 0.001, f: 0.02, note: 'ε/D = 0.001, Re = 1e6' },
    { re: 1e5, rr: 0.0002, f: 0.019, note: 'ε/D = 0.0002, Re = 1e5' },
    { re: 1e5, rr: 0.0001, f: 0.0185, note: 'ε/D = 0.0001, Re = 1e5' },
    { re: 1e8, rr: 0.01, f: 0.038, note: 'ε/D = 0.01, fully rough' },
    { re: 1e8, rr: 0.05, f: 0.072, note: 'ε/D = 0.05, fully rough' },
  ])(
    'reads the Moody chart within 1.5 %: $note (Moody 1944 chart, from memory)',
    ({ re, rr, f }) => {
      expect(relativeError(colebrookWhite(re, rr), f)).toBeLessThan(0.015);
    },
  );

  it('reaches the von Kármán fully rough limit at Re = ∞ (Colebrook 1939 with Re → ∞)', () => {
    expect(colebrookWhite(Infinity, 0.01)).toBeCloseTo((2 * Math.log10(0.01 / 3.7)) ** -2, 14);
    expect(colebrookWhite(Infinity, 0)).toBe(0);
  });

  it('stays finite and positive at low Re where callers should not use it', () => {
    for (const re of [1e-3, 1, 100]) {
      const f = colebrookWhite(re, 0);
      expect(Number.isFinite(f) && f > 0).toBe(true);
      expect(relativeError(f, colebrookByBisection(re, 0))).toBeLessThan(1e-9);
    }
  });

  it('rejects Re ≤ 0 and roughness outside [0, 1) with a clear message', () => {
    expect(() => colebrookWhite(0, 0.001)).toThrow(/positive Reynolds/);
    expect(() => colebrookWhite(1e5, -0.001)).toThrow(/Relative roughness/);
    expect(() => colebrookWhite(1e5, Number.NaN)).toThrow(/Relative roughness/);
  });
});

describe('darcyFrictionFactor', () => {
  it('is 64/Re in laminar flow (Hagen–Poiseuille)', () => {
    for (const re of [1, 100, 1000, 1999, 2000]) {
      const result = darcyFrictionFactor(re, 0.001);
      expect(result.regime).toBe('laminar');
      expect(result.uncertain).toBe(false);
      expect(result.factor).toBeCloseTo(64 / re, 12);
    }
  });

  it('is Colebrook–White from Re = 4000 up', () => {
    for (const re of [4000, 1e5, 1e8]) {
      const result = darcyFrictionFactor(re, 1e-4);
      expect(result.regime).toBe('turbulent');
      expect(result.uncertain).toBe(false);
      expect(result.factor).toBe(colebrookWhite(re, 1e-4));
    }
  });

  it('interpolates linearly in the transition zone and flags it uncertain (common practice)', () => {
    const rr = 1e-4;
    const atStart = 64 / LAMINAR_LIMIT_REYNOLDS;
    const atEnd = colebrookWhite(TURBULENT_LIMIT_REYNOLDS, rr);
    const middle = darcyFrictionFactor(3000, rr);
    expect(middle.regime).toBe('transitional');
    expect(middle.uncertain).toBe(true);
    expect(middle.factor).toBeCloseTo((atStart + atEnd) / 2, 14);
  });

  it('is continuous across Re = 2000 and Re = 4000 for every roughness', () => {
    for (const rr of [0, 1e-4, 0.001, 0.01, 0.05]) {
      for (const edge of [LAMINAR_LIMIT_REYNOLDS, TURBULENT_LIMIT_REYNOLDS]) {
        const below = darcyFrictionFactor(edge * (1 - 1e-12), rr).factor;
        const above = darcyFrictionFactor(edge * (1 + 1e-12), rr).factor;
        expect(relativeError(above, below)).toBeLessThan(1e-9);
      }
    }
  });

  it('returns finite values at Re = 0, negative and tiny Re (laminar, no NaN or Infinity)', () => {
    for (const re of [0, -5, 1e-300, Number.MIN_VALUE, -Infinity]) {
      const result = darcyFrictionFactor(re, 0.001);
      expect(result.regime).toBe('laminar');
      expect(Number.isFinite(result.factor)).toBe(true);
      expect(result.factor).toBeGreaterThan(0);
    }
  });

  it('returns a finite value at Re = ∞ and rejects NaN', () => {
    expect(Number.isFinite(darcyFrictionFactor(Infinity, 0.001).factor)).toBe(true);
    expect(() => darcyFrictionFactor(Number.NaN, 0.001)).toThrow(/not a number/);
  });
});
