/**
 * Pipe friction: Reynolds number and the Darcy friction factor for Darcy–Weisbach,
 * h_f = f (L/D) v²/(2g).
 *
 * - Laminar (Re ≤ 2000): f = 64/Re (Hagen–Poiseuille).
 * - Turbulent (Re ≥ 4000): Colebrook–White (Colebrook, J. Inst. Civ. Eng. 11, 1939),
 *   1/√f = −2 log10( (ε/D)/3.7 + 2.51/(Re √f) ), solved to machine precision.
 * - Transition (2000 < Re < 4000): linear interpolation in Re between the laminar value at
 *   Re = 2000 (0.032) and the Colebrook–White value at Re = 4000. Common practice, no
 *   physical law: flow there is intermittent, so the result is flagged `uncertain`.
 */

/** Reynolds number at which laminar flow is assumed to end (common practice). */
export const LAMINAR_LIMIT_REYNOLDS = 2000;

/** Reynolds number from which flow is taken as fully turbulent (common practice). */
export const TURBULENT_LIMIT_REYNOLDS = 4000;

/**
 * Smallest Reynolds number used in 64/Re. Below it (including Re = 0) the friction factor is
 * held at 64/floor so it stays finite; the loss f·(L/D)·v²/2g it gives at such flows is
 * negligible. Callers that need the exact creeping-flow loss use the laminar form
 * h = 32 μ L v / (ρ g D²), which is the same law without the division by Re.
 */
export const LAMINAR_REYNOLDS_FLOOR = 1e-6;

const LN10 = Math.LN10;

/**
 * Reynolds number Re = ρ |v| D / μ.
 * @param velocity mean velocity, m/s (sign ignored)
 * @param diameter inner diameter, m
 * @param density kg/m³
 * @param viscosity dynamic viscosity, Pa·s
 */
export function reynoldsNumber(
  velocity: number,
  diameter: number,
  density: number,
  viscosity: number,
): number {
  return (density * Math.abs(velocity) * diameter) / viscosity;
}

function checkRelativeRoughness(relativeRoughness: number): void {
  if (!(relativeRoughness >= 0 && relativeRoughness < 1)) {
    throw new RangeError(
      `Relative roughness ε/D must be at least 0 and below 1 (got ${relativeRoughness}); check the pipe's roughness and inner diameter.`,
    );
  }
}

/**
 * Explicit first estimate of 1/√f from Serghides (1984), Chem. Eng. 91(5), 63–64: three
 * fixed-point passes of Colebrook–White with Steffensen acceleration. Only used for Re ≥ 1000,
 * where its terms stay positive.
 */
function serghidesInverseRoot(reynolds: number, relativeRoughness: number): number {
  const a = relativeRoughness / 3.7;
  const A = -2 * Math.log10(a + 12 / reynolds);
  const B = -2 * Math.log10(a + (2.51 * A) / reynolds);
  const C = -2 * Math.log10(a + (2.51 * B) / reynolds);
  const denominator = C - 2 * B + A;
  return denominator === 0 ? C : A - ((B - A) * (B - A)) / denominator;
}

/**
 * Darcy friction factor from the Colebrook–White equation (turbulent flow),
 * 1/√f = −2 log10( (ε/D)/3.7 + 2.51/(Re √f) ).
 *
 * Solved by Newton's method on x = 1/√f, g(x) = x + 2 log10(a + b x) with a = (ε/D)/3.7 and
 * b = 2.51/Re, started from Serghides' explicit estimate; g is increasing and concave, so the
 * iteration converges monotonically after the first step. It stops when the step is below
 * 1e-13 of x (relative error in f then far below 1e-10; typically 1–3 iterations).
 *
 * @param reynolds Re > 0 (the equation is evaluated as given; it is meaningful for Re ≳ 4000)
 * @param relativeRoughness ε/D, 0 ≤ ε/D < 1
 * @throws RangeError for Re ≤ 0 or NaN, or ε/D outside [0, 1)
 */
export function colebrookWhite(reynolds: number, relativeRoughness: number): number {
  if (!(reynolds > 0)) {
    throw new RangeError(`Colebrook–White needs a positive Reynolds number (got ${reynolds}).`);
  }
  checkRelativeRoughness(relativeRoughness);
  const a = relativeRoughness / 3.7;
  if (reynolds === Infinity) {
    // Fully rough limit (von Kármán): 1/√f = −2 log10((ε/D)/3.7); smooth pipe: f → 0.
    return a === 0 ? 0 : 1 / (2 * Math.log10(a)) ** 2;
  }
  const b = 2.51 / reynolds;
  let x = reynolds >= 1000 ? serghidesInverseRoot(reynolds, relativeRoughness) : 1;
  if (!(x > 0) || !Number.isFinite(x)) x = 1;
  for (let i = 0; i < 100; i++) {
    const s = a + b * x;
    const g = x + 2 * Math.log10(s);
    const dg = 1 + (2 * b) / (LN10 * s);
    let next = x - g / dg;
    // Newton from the right of the root can overshoot below zero; halve instead.
    if (!(next > 0)) next = x / 2;
    const step = Math.abs(next - x);
    x = next;
    if (step <= 1e-13 * x) break;
  }
  return 1 / (x * x);
}

/** Friction factor with the flow regime it was taken from. */
export interface FrictionFactorResult {
  /** Darcy friction factor (dimensionless, finite and positive). */
  factor: number;
  regime: 'laminar' | 'transitional' | 'turbulent';
  /** True in the transition zone, where the value is an interpolation, not a correlation. */
  uncertain: boolean;
}

/**
 * Darcy friction factor for any Reynolds number, continuous in Re.
 *
 * - Re ≤ 2000 (and Re ≤ 0): laminar, f = 64/max(Re, LAMINAR_REYNOLDS_FLOOR) — never Infinity.
 * - 2000 < Re < 4000: transitional, linear interpolation in Re between 64/2000 and
 *   Colebrook–White at Re = 4000 (common practice); `uncertain: true`.
 * - Re ≥ 4000: turbulent, Colebrook–White.
 *
 * @throws RangeError for NaN Reynolds number or ε/D outside [0, 1)
 */
export function darcyFrictionFactor(
  reynolds: number,
  relativeRoughness: number,
): FrictionFactorResult {
  if (Number.isNaN(reynolds)) {
    throw new RangeError('Reynolds number is not a number; check the flow, diameter and liquid.');
  }
  checkRelativeRoughness(relativeRoughness);
  if (reynolds <= LAMINAR_LIMIT_REYNOLDS) {
    // Hagen–Poiseuille: f = 64/Re.
    return {
      factor: 64 / Math.max(reynolds, LAMINAR_REYNOLDS_FLOOR),
      regime: 'laminar',
      uncertain: false,
    };
  }
  if (reynolds < TURBULENT_LIMIT_REYNOLDS) {
    const laminar = 64 / LAMINAR_LIMIT_REYNOLDS;
    const turbulent = colebrookWhite(TURBULENT_LIMIT_REYNOLDS, relativeRoughness);
    const t =
      (reynolds - LAMINAR_LIMIT_REYNOLDS) / (TURBULENT_LIMIT_REYNOLDS - LAMINAR_LIMIT_REYNOLDS);
    return { factor: laminar + t * (turbulent - laminar), regime: 'transitional', uncertain: true };
  }
  return {
    factor: colebrookWhite(reynolds, relativeRoughness),
    regime: 'turbulent',
    uncertain: false,
  };
}
