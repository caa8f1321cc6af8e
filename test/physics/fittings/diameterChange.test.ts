import { describe, expect, it } from 'vitest';
import {
  contractionK,
  diameterChangeK,
  ENTRANCE_K,
  EXIT_K,
  gradualExpansionK,
  suddenExpansionK,
} from '../../../src/lib/physics/fittings';

const g = 9.80665;

describe('suddenExpansionK (Borda–Carnot)', () => {
  it('equals the momentum-balance loss (v1 − v2)²/2g on the upstream velocity head, exactly', () => {
    for (const [d1, d2] of [
      [0.05, 0.1],
      [0.0525, 0.0779],
      [0.1, 0.1],
      [0.01, 1],
    ]) {
      const v1 = 2.3;
      const v2 = v1 * (d1 / d2) ** 2; // continuity
      const headLoss = (v1 - v2) ** 2 / (2 * g); // Borda–Carnot
      expect(suddenExpansionK(d1, d2)).toBeCloseTo(headLoss / (v1 ** 2 / (2 * g)), 14);
    }
    expect(suddenExpansionK(0.05, 0.1)).toBeCloseTo(0.5625, 15); // (1 − 0.25)²
  });

  it('tends to the exit loss EXIT_K = 1 into a very large vessel (Borda–Carnot, A2 → ∞)', () => {
    expect(suddenExpansionK(0.05, 1e4)).toBeCloseTo(EXIT_K, 9);
  });

  it('rejects a smaller outlet and non-positive diameters', () => {
    expect(() => suddenExpansionK(0.1, 0.05)).toThrow(/d2 ≥ d1/);
    expect(() => suddenExpansionK(0, 0.05)).toThrow(/positive/);
  });
});

describe('gradualExpansionK (Crane TP-410 formulas 3 and 4 — from memory)', () => {
  it('is 2.6 sin(θ/2)(1 − β²)² up to 45° (formula 3)', () => {
    // β = 0.5, θ = 10°: 2.6 × sin 5° × 0.75² by hand.
    expect(gradualExpansionK(0.05, 0.1, 10)).toBeCloseTo(
      2.6 * Math.sin((5 * Math.PI) / 180) * 0.5625,
      14,
    );
  });

  it('is the Borda–Carnot value (1 − β²)² above 45° (formula 4)', () => {
    expect(gradualExpansionK(0.05, 0.1, 180)).toBeCloseTo(suddenExpansionK(0.05, 0.1), 15);
    expect(gradualExpansionK(0.05, 0.1, 60)).toBeCloseTo(suddenExpansionK(0.05, 0.1), 15);
  });

  it('is nearly continuous at 45° (2.6 sin 22.5° = 0.995)', () => {
    const below = gradualExpansionK(0.05, 0.1, 45);
    const above = gradualExpansionK(0.05, 0.1, 45.0001);
    expect(Math.abs(below - above) / above).toBeLessThan(0.01);
  });
});

describe('contractionK (Crane TP-410 formulas 1 and 2 — from memory), on the upstream velocity', () => {
  it('gives 0.5(1 − β²) on the small-pipe velocity for a sudden contraction (formula 2, θ = 180°)', () => {
    const beta = 0.5;
    const kUpstream = contractionK(0.1, 0.05, 180);
    // Referred back to the downstream (small) velocity: K_small = K_up × β⁴.
    expect(kUpstream * beta ** 4).toBeCloseTo(0.5 * (1 - beta ** 2), 14);
    expect(kUpstream).toBeCloseTo(6.0, 12); // 0.375 / 0.0625
  });

  it('gives 0.8 sin(θ/2)(1 − β²) on the small-pipe velocity for a 30° cone (formula 1)', () => {
    const beta = 0.5;
    const kSmall = 0.8 * Math.sin((15 * Math.PI) / 180) * (1 - beta ** 2);
    expect(contractionK(0.1, 0.05, 30)).toBeCloseTo(kSmall / beta ** 4, 12);
  });

  it('approaches the square-edged entrance loss ENTRANCE_K = 0.5 as β → 0 (Crane TP-410)', () => {
    const d1 = 10;
    const d2 = 0.01;
    const beta = d2 / d1;
    expect(contractionK(d1, d2, 180) * beta ** 4).toBeCloseTo(ENTRANCE_K, 5);
  });

  it('rejects a larger outlet and impossible cone angles', () => {
    expect(() => contractionK(0.05, 0.1, 30)).toThrow(/d2 ≤ d1/);
    expect(() => contractionK(0.1, 0.05, 0)).toThrow(/Cone angle/);
    expect(() => contractionK(0.1, 0.05, 200)).toThrow(/Cone angle/);
  });
});

describe('diameterChangeK', () => {
  it('picks expansion or contraction by the flow direction, and 0 for equal diameters', () => {
    expect(diameterChangeK(0.05, 0.1, 20)).toBe(gradualExpansionK(0.05, 0.1, 20));
    expect(diameterChangeK(0.1, 0.05, 20)).toBe(contractionK(0.1, 0.05, 20));
    expect(diameterChangeK(0.1, 0.1, 20)).toBe(0);
  });
});
