/**
 * Restriction orifice: permanent (unrecovered) pressure loss of a square-edged orifice
 * plate, from ISO 5167-2:2003.
 *
 * - Flow equation (ISO 5167-2, 4.1): q_m = C/√(1 − β⁴) · ε · (π/4) d² · √(2 Δp ρ), ε = 1 for
 *   liquids; hence with the pipe velocity V: Δp = ρ V² (1 − β⁴) / (2 C² β⁴).
 * - Pressure loss (ISO 5167-2, 5.4.1, eq. 5):
 *   Δϖ = Δp · [√(1 − β⁴(1 − C²)) − C β²] / [√(1 − β⁴(1 − C²)) + C β²].
 * - Discharge coefficient C: Reader-Harris/Gallagher (ISO 5167-2, 5.3.2.1, eq. 4) with corner
 *   tappings (L1 = L'2 = 0) when a Reynolds number is given, otherwise the constant 0.61.
 *
 * So K = Δϖ / (ρV²/2) on the pipe velocity. ISO 5167-2 validity: 50 mm ≤ D ≤ 1000 mm,
 * 0.1 ≤ β ≤ 0.75, Re_D ≥ 5000; outside it the same formulas are used as an extrapolation.
 */

/** Discharge coefficient used when no Reynolds number is given (round value, common practice). */
export const ORIFICE_DEFAULT_DISCHARGE_COEFFICIENT = 0.61;

/**
 * Lowest pipe Reynolds number at which the Reader-Harris/Gallagher equation is evaluated:
 * ISO 5167-2 corner tappings need Re_D ≥ 5000 for β ≤ 0.56 and Re_D ≥ 16000 β² above.
 */
export function orificeMinimumReynolds(beta: number): number {
  return Math.max(5000, 16000 * beta * beta);
}

/**
 * Reader-Harris/Gallagher discharge coefficient, ISO 5167-2:2003 eq. (4), corner tappings
 * (L1 = L'2 = 0, so the tapping terms vanish), including the term for D < 71.12 mm.
 * @param beta d/D
 * @param reynolds pipe Reynolds number Re_D (evaluated at no less than orificeMinimumReynolds)
 * @param pipeDiameter D, m
 */
export function readerHarrisGallagherC(
  beta: number,
  reynolds: number,
  pipeDiameter: number,
): number {
  const re = Math.max(reynolds, orificeMinimumReynolds(beta));
  const A = Math.pow((19000 * beta) / re, 0.8);
  const b4 = beta ** 4;
  const L1 = 0;
  const M2 = 0; // M'2 = 2 L'2 / (1 − β), L'2 = 0 for corner tappings
  let c =
    0.5961 +
    0.0261 * beta ** 2 -
    0.216 * beta ** 8 +
    0.000521 * Math.pow((1e6 * beta) / re, 0.7) +
    (0.0188 + 0.0063 * A) * Math.pow(beta, 3.5) * Math.pow(1e6 / re, 0.3) +
    (0.043 + 0.08 * Math.exp(-10 * L1) - 0.123 * Math.exp(-7 * L1)) *
      (1 - 0.11 * A) *
      (b4 / (1 - b4)) -
    0.031 * (M2 - 0.8 * Math.pow(M2, 1.1)) * Math.pow(beta, 1.3);
  const diameterMm = pipeDiameter * 1000;
  if (diameterMm < 71.12) c += 0.011 * (0.75 - beta) * (2.8 - diameterMm / 25.4);
  return c;
}

/**
 * Ratio of the permanent pressure loss to the orifice differential pressure,
 * ISO 5167-2:2003 eq. (5): Δϖ/Δp.
 */
export function orificePressureLossRatio(beta: number, dischargeCoefficient: number): number {
  const c = dischargeCoefficient;
  const root = Math.sqrt(1 - beta ** 4 * (1 - c * c));
  return (root - c * beta * beta) / (root + c * beta * beta);
}

/**
 * Permanent loss coefficient of a restriction orifice, referred to the pipe velocity.
 * @param pipeDiameter D, m
 * @param boreDiameter d, m; a bore as large as the pipe gives 0
 * @param reynolds optional pipe Reynolds number; with it C is Reader-Harris/Gallagher
 *   (corner tappings), without it C = 0.61
 * @throws RangeError if a diameter is not positive
 */
export function orificeLossCoefficient(
  pipeDiameter: number,
  boreDiameter: number,
  reynolds?: number,
): number {
  if (!(pipeDiameter > 0 && boreDiameter > 0)) {
    throw new RangeError(
      `Orifice and pipe diameters must be positive (got bore ${boreDiameter} m in pipe ${pipeDiameter} m).`,
    );
  }
  const beta = boreDiameter / pipeDiameter;
  if (beta >= 1) return 0;
  const c =
    reynolds !== undefined && reynolds > 0
      ? readerHarrisGallagherC(beta, reynolds, pipeDiameter)
      : ORIFICE_DEFAULT_DISCHARGE_COEFFICIENT;
  const b4 = beta ** 4;
  // Differential pressure on the pipe velocity head (from the ISO 5167 flow equation).
  const differentialK = (1 - b4) / (c * c * b4);
  return differentialK * orificePressureLossRatio(beta, c);
}
