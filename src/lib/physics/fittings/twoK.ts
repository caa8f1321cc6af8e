/**
 * The 2-K method: W. B. Hooper, "The two-K method predicts head losses in pipe fittings",
 * Chemical Engineering 88(17), 24 Aug 1981, pp. 96–100:
 *
 *   K = K1/Re + K∞ (1 + 1/D),  D = inner diameter in inches.
 *
 * Coefficients from Hooper's table (1981). They were typed from memory and checked against a
 * public transcription of the table (the open-source `fluids` library, fittings module).
 */

import type { FittingType } from './fittingTypes';

/** Hooper's two constants for one fitting. */
export interface HooperCoefficients {
  k1: number;
  kInfinity: number;
  /** The row of Hooper's table these come from. */
  row: string;
}

/** Metres per inch (exact, by definition of the international inch). */
export const METRES_PER_INCH = 0.0254;

/**
 * Hooper (1981) coefficients for the fittings Headroute knows. Strainers and flow meters
 * are not in Hooper's table (see `fittingLossCoefficient`).
 */
export const HOOPER_2K: Partial<Record<FittingType, HooperCoefficients>> = {
  'elbow-90-standard': {
    k1: 800,
    kInfinity: 0.25,
    row: 'Elbow 90°, standard (R/D = 1), flanged/welded',
  },
  'elbow-90-long-radius': {
    k1: 800,
    kInfinity: 0.2,
    row: 'Elbow 90°, long radius (R/D = 1.5), all types',
  },
  'elbow-45-standard': { k1: 500, kInfinity: 0.2, row: 'Elbow 45°, standard (R/D = 1), all types' },
  'elbow-45-long-radius': {
    k1: 500,
    kInfinity: 0.15,
    row: 'Elbow 45°, long radius (R/D = 1.5), all types',
  },
  'tee-run': { k1: 150, kInfinity: 0.05, row: 'Tee, run through, flanged or welded' },
  'tee-branch': {
    k1: 800,
    kInfinity: 0.8,
    row: 'Tee, used as elbow (through branch), standard, flanged or welded',
  },
  'gate-valve': { k1: 300, kInfinity: 0.1, row: 'Valve: gate, ball, plug — full line size, β = 1' },
  'ball-valve': { k1: 300, kInfinity: 0.1, row: 'Valve: gate, ball, plug — full line size, β = 1' },
  'globe-valve': { k1: 1500, kInfinity: 4.0, row: 'Valve: globe, standard' },
  'butterfly-valve': { k1: 800, kInfinity: 0.25, row: 'Valve: butterfly' },
  'swing-check-valve': { k1: 1500, kInfinity: 1.5, row: 'Valve: check, swing' },
  'lift-check-valve': { k1: 2000, kInfinity: 10.0, row: 'Valve: check, lift' },
};

/**
 * Hooper's 2-K loss coefficient, referred to the velocity in the pipe.
 * @param coefficients K1 and K∞ from Hooper's table
 * @param reynolds pipe Reynolds number (> 0)
 * @param innerDiameter pipe inner diameter, m (converted to inches for the formula)
 */
export function hooper2K(
  coefficients: Pick<HooperCoefficients, 'k1' | 'kInfinity'>,
  reynolds: number,
  innerDiameter: number,
): number {
  const diameterInches = innerDiameter / METRES_PER_INCH;
  // Hooper (1981): K = K1/Re + K∞ (1 + 1/D[in]).
  return coefficients.k1 / reynolds + coefficients.kInfinity * (1 + 1 / diameterInches);
}
