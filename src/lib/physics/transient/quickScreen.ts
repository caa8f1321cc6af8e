/**
 * Quick surge screening by hand formulas of the trade:
 * - Joukowsky: a sudden change of velocity Δv changes the head by ΔH = a·Δv/g (Joukowsky 1898;
 *   Wylie & Streeter, Fluid Transients in Systems, 1993, ch. 1). It holds for a closure faster than the pipe period 2L/a.
 * - The pipe period 2L/a, the time a wave takes to run to the reflecting end and back; over
 *   reaches of several pipes, 2·Σ Lᵢ/aᵢ.
 * - A closure slower than 2L/a (time t꜀ > 2L/a): ΔH ≈ 2·L·v₀/(g·t꜀), Michaud's estimate
 *   (Michaud 1878, as quoted in Wylie & Streeter 1993 and Chaudhry); a first estimate that
 *   ignores the valve's characteristic.
 */
import { STANDARD_GRAVITY } from '../pump';

/** Joukowsky head change, m, for wave speed `waveSpeed` (m/s) and velocity change (m/s). */
export function joukowskyHead(waveSpeed: number, velocityChange: number): number {
  return (waveSpeed * velocityChange) / STANDARD_GRAVITY;
}

/** One pipe of a reach: length (m) and wave speed (m/s). */
export interface ReachPipe {
  length: number;
  waveSpeed: number;
  /** Steady velocity, m/s (for the slow-closure estimate). */
  velocity: number;
}

/** The reach's period 2·Σ Lᵢ/aᵢ, s. */
export function criticalTime(reach: readonly ReachPipe[]): number {
  return 2 * reach.reduce((s, p) => s + p.length / p.waveSpeed, 0);
}

/**
 * Head rise, m, for a closure over `closureTime` (s): Joukowsky a·v₀/g (of the pipe at the
 * valve, `waveSpeed` and `velocity`) while t꜀ ≤ 2L/a, else Michaud's 2·Σ(Lᵢ·vᵢ)/(g·t꜀), which
 * is never more than Joukowsky.
 */
export function closureHeadRise(
  reach: readonly ReachPipe[],
  waveSpeed: number,
  velocity: number,
  closureTime: number,
): number {
  const jouk = joukowskyHead(waveSpeed, Math.abs(velocity));
  const tc = criticalTime(reach);
  if (!(closureTime > tc)) return jouk;
  const lv = reach.reduce((s, p) => s + p.length * Math.abs(p.velocity), 0);
  return Math.min(jouk, (2 * lv) / (STANDARD_GRAVITY * closureTime));
}
