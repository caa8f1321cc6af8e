/**
 * Losses at changes of pipe diameter: expanders and reducers. Every K here is referred to
 * the velocity in the upstream pipe (diameter d1), whichever way the diameter changes.
 *
 * - Sudden expansion: Borda–Carnot, K = (1 − (d1/d2)²)², exact for the momentum balance.
 * - Gradual expansion and contraction: Crane Technical Paper No. 410, formulas 1–4 (the
 *   "K factor" table for reducers and enlargers), with θ the included cone angle and
 *   β = d_small/d_large; formulas typed from memory.
 */

function checkDiameters(d1: number, d2: number): void {
  if (!(d1 > 0 && d2 > 0 && Number.isFinite(d1) && Number.isFinite(d2))) {
    throw new RangeError(`Diameters must be positive (got ${d1} m and ${d2} m).`);
  }
}

function checkAngle(coneAngleDeg: number): void {
  if (!(coneAngleDeg > 0 && coneAngleDeg <= 180)) {
    throw new RangeError(
      `Cone angle must be above 0° and at most 180° (180° = sudden); got ${coneAngleDeg}°.`,
    );
  }
}

/**
 * Sudden expansion from d1 to d2 ≥ d1 by Borda–Carnot: K = (1 − (d1/d2)²)², referred to the
 * upstream velocity. Returns 0 when d2 = d1.
 * @throws RangeError if a diameter is not positive or d2 < d1
 */
export function suddenExpansionK(d1: number, d2: number): number {
  checkDiameters(d1, d2);
  if (d2 < d1) {
    throw new RangeError(`An expansion needs d2 ≥ d1 (got d1 = ${d1} m, d2 = ${d2} m).`);
  }
  const areaRatio = (d1 / d2) ** 2;
  // Borda–Carnot: h = (v1 − v2)²/2g = (1 − A1/A2)² v1²/2g.
  return (1 - areaRatio) ** 2;
}

/**
 * Gradual (conical) expansion from d1 to d2 ≥ d1, referred to the upstream velocity.
 * Crane TP-410 formula 3 (θ ≤ 45°): K = 2.6 sin(θ/2) (1 − β²)²;
 * formula 4 (45° < θ ≤ 180°): K = (1 − β²)², the Borda–Carnot value; β = d1/d2.
 * @param coneAngleDeg included cone angle θ, degrees (180 = sudden)
 */
export function gradualExpansionK(d1: number, d2: number, coneAngleDeg: number): number {
  checkDiameters(d1, d2);
  checkAngle(coneAngleDeg);
  if (d2 < d1) {
    throw new RangeError(`An expansion needs d2 ≥ d1 (got d1 = ${d1} m, d2 = ${d2} m).`);
  }
  const betaSquared = (d1 / d2) ** 2;
  const halfAngle = (coneAngleDeg * Math.PI) / 360;
  if (coneAngleDeg <= 45) return 2.6 * Math.sin(halfAngle) * (1 - betaSquared) ** 2;
  return (1 - betaSquared) ** 2;
}

/**
 * Sudden or conical contraction from d1 to d2 ≤ d1, referred to the upstream velocity.
 * Crane TP-410 gives, on the small-pipe (downstream) velocity, with β = d2/d1:
 * formula 1 (θ ≤ 45°): K_small = 0.8 sin(θ/2) (1 − β²);
 * formula 2 (45° < θ ≤ 180°): K_small = 0.5 (1 − β²) √(sin(θ/2)).
 * Referred to the upstream velocity: K = K_small / β⁴.
 * @param coneAngleDeg included cone angle θ, degrees (180 = sudden)
 */
export function contractionK(d1: number, d2: number, coneAngleDeg: number): number {
  checkDiameters(d1, d2);
  checkAngle(coneAngleDeg);
  if (d2 > d1) {
    throw new RangeError(`A contraction needs d2 ≤ d1 (got d1 = ${d1} m, d2 = ${d2} m).`);
  }
  const betaSquared = (d2 / d1) ** 2;
  const halfAngle = (coneAngleDeg * Math.PI) / 360;
  const kSmall =
    coneAngleDeg <= 45
      ? 0.8 * Math.sin(halfAngle) * (1 - betaSquared)
      : 0.5 * (1 - betaSquared) * Math.sqrt(Math.sin(halfAngle));
  return kSmall / (betaSquared * betaSquared);
}

/**
 * Loss across a reducer or expander for flow from `upstreamDiameter` to
 * `downstreamDiameter`, referred to the upstream velocity: an expansion or a contraction by
 * the formulas above, 0 when the diameters are equal. Use it for either flow direction.
 */
export function diameterChangeK(
  upstreamDiameter: number,
  downstreamDiameter: number,
  coneAngleDeg: number,
): number {
  if (downstreamDiameter > upstreamDiameter) {
    return gradualExpansionK(upstreamDiameter, downstreamDiameter, coneAngleDeg);
  }
  return contractionK(upstreamDiameter, downstreamDiameter, coneAngleDeg);
}
