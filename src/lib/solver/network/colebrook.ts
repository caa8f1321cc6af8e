/**
 * Colebrook–White friction factor re-solved from a nearby root. Between two iterations of the
 * network solve a pipe's Reynolds number changes little, so the last 1/√f of that pipe is a
 * better start for Newton's method than an explicit estimate: it saves the estimate's three
 * logarithms and usually a Newton step, and ends on the same root.
 */

/**
 * Darcy friction factor from the Colebrook–White equation (Colebrook, J. Inst. Civ. Eng. 11,
 * 1939), 1/√f = −2 log10( (ε/D)/3.7 + 2.51/(Re √f) ), by Newton's method on x = 1/√f,
 * g(x) = x + 2 log10(a + b x) with a = (ε/D)/3.7 and b = 2.51/Re, started from `start`.
 * Iteration and stopping rule are those of physics/friction `colebrookWhite` (step below 1e-13
 * of x; a step below zero is halved instead), which starts from Serghides' estimate; g is
 * increasing and concave, so from any positive start the iteration reaches the same root.
 *
 * @param reynolds Re > 0, finite (the caller checks)
 * @param relativeRoughness ε/D, 0 ≤ ε/D < 1 (the caller checks)
 * @param start a positive starting value of 1/√f (e.g. the root at a nearby Re)
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
    if (step <= 1e-13 * x) break;
  }
  return 1 / (x * x);
}
