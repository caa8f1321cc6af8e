/**
 * The 3-K method: R. Darby, "Correlate pressure drops through fittings", Chemical
 * Engineering 108(4), April 2001, pp. 127–130 (after Darby, Chem. Eng., July 1999), also
 * Darby, "Chemical Engineering Fluid Mechanics" (2nd ed., 2001), Table 7-3:
 *
 *   K = K1/Re + Ki (1 + Kd/D^0.3),  D = diameter in inches.
 *
 * Darby correlates against the nominal size in inches; Headroute passes the inner diameter
 * converted to inches (the difference is small through D^0.3 and keeps typed bores working).
 * Coefficients typed from memory and checked against a public transcription of Darby's
 * table (the open-source `fluids` library, fittings module).
 */

import type { FittingType } from './fittingTypes';
import { METRES_PER_INCH } from './twoK';

/** Darby's three constants for one fitting. */
export interface DarbyCoefficients {
  k1: number;
  ki: number;
  kd: number;
  /** The row of Darby's table these come from. */
  row: string;
}

/**
 * Darby (2001) coefficients for the fittings Headroute knows. Darby's table has no
 * butterfly valve, strainer or flow meter (see `fittingLossCoefficient`).
 */
export const DARBY_3K: Partial<Record<FittingType, DarbyCoefficients>> = {
  'elbow-90-standard': {
    k1: 800,
    ki: 0.091,
    kd: 4.0,
    row: 'Elbow 90°, flanged/welded/bends, r/D = 1',
  },
  'elbow-90-long-radius': {
    k1: 800,
    ki: 0.071,
    kd: 4.2,
    row: 'Elbow 90°, long radius, r/D = 1.5 (the table lists it under threaded)',
  },
  'elbow-45-standard': {
    k1: 500,
    ki: 0.071,
    kd: 4.2,
    row: 'Elbow 45°, threaded standard, r/D = 1',
  },
  'elbow-45-long-radius': { k1: 500, ki: 0.052, kd: 4.0, row: 'Elbow 45°, long radius, r/D = 1.5' },
  'tee-run': { k1: 150, ki: 0.05, kd: 4.0, row: 'Tee, run through, flanged, r/D = 1' },
  'tee-branch': {
    k1: 800,
    ki: 0.28,
    kd: 4.0,
    row: 'Tee, through branch (as elbow), flanged, r/D = 1',
  },
  'gate-valve': { k1: 300, ki: 0.037, kd: 3.9, row: 'Gate valve, standard, β = 1' },
  'ball-valve': { k1: 300, ki: 0.017, kd: 3.5, row: 'Ball valve, standard, β = 1' },
  'globe-valve': { k1: 1500, ki: 1.7, kd: 3.6, row: 'Globe valve, standard, β = 1' },
  'swing-check-valve': { k1: 1500, ki: 0.46, kd: 4.0, row: 'Swing check valve' },
  'lift-check-valve': { k1: 2000, ki: 2.85, kd: 3.8, row: 'Lift check valve' },
};

/**
 * Darby's 3-K loss coefficient, referred to the velocity in the pipe.
 * @param coefficients K1, Ki, Kd from Darby's table
 * @param reynolds pipe Reynolds number (> 0)
 * @param innerDiameter pipe diameter, m (converted to inches for the formula)
 */
export function darby3K(
  coefficients: Pick<DarbyCoefficients, 'k1' | 'ki' | 'kd'>,
  reynolds: number,
  innerDiameter: number,
): number {
  const diameterInches = innerDiameter / METRES_PER_INCH;
  // Darby (2001): K = K1/Re + Ki (1 + Kd / D[in]^0.3).
  return (
    coefficients.k1 / reynolds +
    coefficients.ki * (1 + coefficients.kd / Math.pow(diameterInches, 0.3))
  );
}
