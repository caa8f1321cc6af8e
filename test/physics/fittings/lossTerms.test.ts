/**
 * `fittingLossTerms` splits a fitting's K into k1/Re + kConstant, the form of the 2-K (Hooper,
 * 1981) and 3-K (Darby, 2001) methods; a pipe's fittings list sums these parts. They must give
 * the same K as `fittingLossCoefficient` (which the tests beside this one check against the
 * papers' tables) for every type a pipe may carry, every method, bore and Reynolds number.
 */
import { describe, expect, it } from 'vitest';
import { fittingLossCoefficient, fittingLossTerms } from '../../../src/lib/physics/fittings';
import { PIPE_FITTING_TYPES } from '../../../src/lib/model/file/schema';
import type { LossMethod } from '../../../src/lib/model/types';

const METHODS: LossMethod[] = ['fixed', '2K', '3K'];

describe('fittingLossTerms', () => {
  it.each(PIPE_FITTING_TYPES.flatMap((t) => METHODS.map((m) => [t, m] as const)))(
    '%s by %s equals fittingLossCoefficient',
    (type, method) => {
      for (const d of [0.0158, 0.0525, 0.1023, 0.3048]) {
        const { k1, kConstant } = fittingLossTerms(type, method, d, 0.7);
        for (const re of [50, 2_000, 1e5, 1e7]) {
          const k = fittingLossCoefficient(type, method, re, d, 0.7);
          expect(k1 / re + kConstant).toBeCloseTo(k, 12);
        }
      }
    },
  );

  it('Hooper 2-K, standard 90° elbow in a 2 in bore: K1 = 800, K∞(1 + 1/D) = 0.25 × 1.5', () => {
    // Hooper (1981) table: elbow 90° standard, K1 = 800, K∞ = 0.25; D = 2 in.
    const terms = fittingLossTerms('elbow-90-standard', '2K', 2 * 0.0254, 0);
    expect(terms.k1).toBe(800);
    expect(terms.kConstant).toBeCloseTo(0.375, 12);
  });

  it('refuses what fittingLossCoefficient refuses', () => {
    expect(() => fittingLossTerms('reducer', '2K', 0.05, 0)).toThrow(RangeError);
    expect(() => fittingLossTerms('gate-valve', '3K', 0, 0)).toThrow(RangeError);
  });
});
