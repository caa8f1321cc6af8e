/**
 * The time step of the method of characteristics. Each pipe is cut into a whole number of
 * reaches N with Δx = a·Δt (Courant number 1); since L/(a·Δt) is rarely whole, each pipe's
 * wave speed is adjusted to a' = L/(N·Δt) (Wylie & Streeter, Fluid Transients in Systems,
 * 1993, ch. 3, on adjusting the wave speed). The step is the largest Δt = min(L/a)/n, n = 1, 2, …,
 * that keeps every adjustment within the tolerance and gives the route at least
 * `minReaches` reaches, within a work budget (reaches × steps). When the budget runs out
 * first, the candidate with the smallest adjustment is taken and the caller reports it.
 */

/** The chosen step and reaches. */
export interface TimeStepChoice {
  /** Δt, s. */
  dt: number;
  /** Reaches per pipe. */
  reaches: number[];
  /** Largest |a'/a − 1|. */
  adjustment: number;
  /** Time steps over the duration. */
  steps: number;
}

/** Reaches the whole route gets at least (when the budget allows). */
export const MIN_ROUTE_REACHES = 60;

/** Most candidates tried. */
const MAX_CANDIDATES = 4000;

function evaluate(travel: readonly number[], dt: number, duration: number) {
  const reaches = travel.map((t) => Math.max(1, Math.round(t / dt)));
  let adjustment = 0;
  reaches.forEach((n, i) => {
    adjustment = Math.max(adjustment, Math.abs(travel[i] / (n * dt) - 1));
  });
  const steps = Math.max(1, Math.ceil(duration / dt - 1e-9));
  const work = reaches.reduce((s, n) => s + n + 1, 0) * steps;
  return { dt, reaches, adjustment, steps, work };
}

/**
 * Chooses Δt for pipes with wave travel times `travel` (Lᵢ/aᵢ, s, all > 0) over `duration` s.
 */
export function chooseTimeStep(
  travel: readonly number[],
  duration: number,
  tolerance: number,
  maxWork: number,
): TimeStepChoice {
  const shortest = Math.min(...travel);
  const total = travel.reduce((s, t) => s + t, 0);
  let best: ReturnType<typeof evaluate> | null = null;
  for (let n = 1; n <= MAX_CANDIDATES; n++) {
    const c = evaluate(travel, shortest / n, duration);
    if (c.work > maxWork) break;
    const fine = c.dt <= total / MIN_ROUTE_REACHES;
    if (c.adjustment <= tolerance && fine) return c;
    if (
      !best ||
      c.adjustment < best.adjustment - 1e-12 ||
      (fine && best.dt > total / MIN_ROUTE_REACHES)
    )
      best = c;
  }
  if (best) return best;
  // Even one reach on the shortest pipe is over budget: take the step the budget allows
  // (sections ≈ total/Δt, steps = duration/Δt) and let short pipes take one slowed reach.
  const dt = Math.max(Math.sqrt((total * duration) / maxWork), shortest);
  return evaluate(travel, dt, duration);
}
