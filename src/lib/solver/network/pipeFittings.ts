/**
 * The fittings a pipe carries (its fittings list and lumped K) as one loss coefficient referred
 * to the pipe's velocity, K = k1/Re + k0, and where along the pipe that loss acts.
 */
import type { Pipe } from '../../model/types';
import { fittingLossTerms } from '../../physics/fittings';

/** The summed K of a pipe's fittings, K = k1/Re + k0, or why it cannot be found. */
export type PipeFittingTerms = { k1: number; k0: number } | { problem: string };

/**
 * Σ count × K(type, method) + lumped K over the pipe's fittings list, each K by the same
 * library as a fitting node (fixed K, Hooper's 2-K, Darby's 3-K) at the pipe's bore.
 * A pipe without a list gives k1 = k0 = 0.
 */
export function pipeFittingTerms(pipe: Pipe, innerDiameter: number): PipeFittingTerms {
  const list = pipe.fittings;
  if (!list) return { k1: 0, k0: 0 };
  let k1 = 0;
  let k0 = list.lumpedK;
  for (const item of list.items) {
    try {
      const terms = fittingLossTerms(item.fittingType, item.lossMethod, innerDiameter, item.fixedK);
      k1 += item.count * terms.k1;
      k0 += item.count * terms.kConstant;
    } catch (error) {
      const why = error instanceof Error ? error.message : String(error);
      return { problem: `the K of its ${item.fittingType} cannot be found (${why})` };
    }
  }
  if (!Number.isFinite(k1) || !Number.isFinite(k0) || k1 < 0 || k0 < 0) {
    return { problem: 'its fittings list gives no usable loss coefficient' };
  }
  return { k1, k0 };
}

/**
 * Distance from the pipe's `from` end where its fitting loss acts as one step, m, or null when
 * it is spread evenly (or the pipe carries none). A chainage beyond the pipe's length is held
 * at its `to` end (`fittingsBeyondEnd` says so).
 */
export function fittingStepAt(pipe: Pipe): number | null {
  const list = pipe.fittings;
  if (!list || list.place === 'spread') return null;
  const length = pipe.length > 0 ? pipe.length : 0;
  if (list.place === 'inlet') return 0;
  if (list.place === 'outlet') return length;
  return Math.min(length, Math.max(0, list.chainage ?? 0));
}

/** True when the fitting losses are placed at a chainage beyond the pipe's length. */
export function fittingsBeyondEnd(pipe: Pipe): boolean {
  const list = pipe.fittings;
  return list?.place === 'chainage' && (list.chainage ?? 0) > pipe.length;
}
