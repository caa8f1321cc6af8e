/**
 * Pressure-wave speed in a liquid-filled elastic pipe: the Korteweg form with the restraint
 * factor c₁ for the pipe's axial support (Wylie & Streeter, Fluid Transients in Systems, 1993,
 * §2.3 "Wavespeed"; the same forms are in Chaudhry, Applied Hydraulic Transients):
 *
 *   a = √( (K/ρ) / (1 + c₁·(K/E)·(D/e)) )
 *
 * with the thick-walled c₁ of that section, which tends to the thin-walled one as e/D → 0:
 *   anchored at the upstream end only:  c₁ = (2e/D)(1+μ) + D(1 − μ/2)/(D+e)
 *   anchored throughout (no axial movement): c₁ = (2e/D)(1+μ) + D(1 − μ²)/(D+e)
 *   expansion joints throughout:        c₁ = (2e/D)(1+μ) + D/(D+e)
 * The c₁ forms are written from memory of that section.
 */

/** How the pipe is held against axial movement. */
export type PipeRestraint = 'anchored-upstream' | 'anchored-throughout' | 'expansion-joints';

/** The restraints, in the order offered to the user. */
export const PIPE_RESTRAINTS: readonly PipeRestraint[] = [
  'anchored-throughout',
  'anchored-upstream',
  'expansion-joints',
];

/** Restraint used when none is chosen: a pipe held against axial movement (racks, buried). */
export const DEFAULT_RESTRAINT: PipeRestraint = 'anchored-throughout';

/**
 * The restraint factor c₁ (Wylie & Streeter 1993, §2.3) for inner diameter `diameter` (m),
 * wall `wall` (m) and Poisson's ratio `poisson`.
 */
export function restraintFactor(
  restraint: PipeRestraint,
  diameter: number,
  wall: number,
  poisson: number,
): number {
  const thick = ((2 * wall) / diameter) * (1 + poisson);
  const ring = diameter / (diameter + wall);
  switch (restraint) {
    case 'anchored-upstream':
      return thick + ring * (1 - poisson / 2);
    case 'anchored-throughout':
      return thick + ring * (1 - poisson * poisson);
    case 'expansion-joints':
      return thick + ring;
  }
}

/** Inputs of the wave-speed formula (SI). */
export interface WaveSpeedInput {
  /** Liquid bulk modulus K, Pa. */
  bulkModulus: number;
  /** Liquid density ρ, kg/m³. */
  density: number;
  /** Inner diameter D, m. */
  diameter: number;
  /** Wall thickness e, m. */
  wall: number;
  /** Young's modulus of the wall E, Pa. */
  youngsModulus: number;
  /** Poisson's ratio μ. */
  poisson: number;
  restraint: PipeRestraint;
}

/**
 * Wave speed a, m/s, by the Korteweg form above. NaN when an input is not a finite positive
 * number (Poisson's ratio may be 0).
 */
export function kortewegWaveSpeed(input: WaveSpeedInput): number {
  const { bulkModulus: K, density: rho, diameter: D, wall: e, youngsModulus: E } = input;
  const ok = [K, rho, D, e, E].every((v) => Number.isFinite(v) && v > 0);
  if (!ok || !(input.poisson >= 0 && input.poisson < 0.5)) return NaN;
  const c1 = restraintFactor(input.restraint, D, e, input.poisson);
  return Math.sqrt(K / rho / (1 + c1 * (K / E) * (D / e)));
}

/** Wave speed in a rigid pipe, m/s: the speed of sound in the liquid, √(K/ρ). */
export function rigidPipeWaveSpeed(bulkModulus: number, density: number): number {
  return Math.sqrt(bulkModulus / density);
}
