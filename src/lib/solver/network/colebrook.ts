/**
 * Colebrook–White friction factor re-solved from a nearby root. Between two iterations of the
 * network solve a pipe's Reynolds number changes little, so its last root (moved along the
 * root's known slope dx/dRe) is a better start for Newton's method than an explicit estimate:
 * it saves the estimate's three logarithms and usually a Newton step, and ends on the same root.
 */

/**
 * Relative Newton step after which the iteration stops, 1e-7. Newton's error after a step is
 * |g''|/(2g')·e² with e ≈ δ (the step) the error before it. For g(x) = x + 2 log10(a + b x),
 * g' ≥ 1 and |g''| = 2b²/(ln10·(a + bx)²) ≤ 2/(ln10·x²), so what is left after a step
 * δ ≤ 1e-7·x is at most 0.434·(δ/x)² ≤ 4.4e-15 in x = 1/√f: rounding level for x ≥ 3
 * (f ≤ 0.11). physics/friction `colebrookWhite` takes one more step, to δ ≤ 1e-13·x.
 */
export const STOP_STEP = 1e-7;

/**
 * Darcy friction factor from the Colebrook–White equation (Colebrook, J. Inst. Civ. Eng. 11,
 * 1939), 1/√f = −2 log10( (ε/D)/3.7 + 2.51/(Re √f) ), by Newton's method on x = 1/√f,
 * g(x) = x + 2 log10(a + b x) with a = (ε/D)/3.7 and b = 2.51/Re, started from `start`.
 * The iteration is that of physics/friction `colebrookWhite` (a step below zero is halved
 * instead), which starts from Serghides' estimate; g is increasing and concave, so from any
 * positive start it reaches the same root. It stops after a step below STOP_STEP·x.
 *
 * @param reynolds Re > 0, finite (the caller checks)
 * @param relativeRoughness ε/D, 0 ≤ ε/D < 1 (the caller checks)
 * @param start a starting value of 1/√f (e.g. the root at a nearby Re); 1 if not positive
 */
export function colebrookWhiteFrom(
  reynolds: number,
  relativeRoughness: number,
  start: number,
): number {
  const a = relativeRoughness / 3.7;
  const b = 2.51 / reynolds;
  let x = start > 0 && Number.isFinite(start) ? start : 1;
  for (let i = 0; i < 100; i++) {
    const s = a + b * x;
    const g = x + 2 * Math.log10(s);
    const dg = 1 + (2 * b) / (Math.LN10 * s);
    let next = x - g / dg;
    if (!(next > 0)) next = x / 2;
    const step = Math.abs(next - x);
    x = next;
    if (step <= STOP_STEP * x) break;
  }
  return 1 / (x * x);
}
