/**
 * Fitting loss coefficients K (head loss h = K v²/2g, v the velocity in the pipe).
 *
 * Methods: a fixed K typed by the user; the 2-K method (Hooper, 1981); the 3-K method
 * (Darby, 2001). Reducers, expanders and restriction orifices depend on geometry, not on a
 * table: use the functions of diameterChange.ts and orifice.ts for them.
 *
 * Gaps in the published tables, and what is used instead:
 * - butterfly valve, 3-K: Darby's table has none; Hooper's 2-K row (K1 = 800, K∞ = 0.25) is
 *   used.
 * - strainer and flow meter, 2-K and 3-K: neither table has them (their loss depends on the
 *   make: screen, meter principle); the user's fixed K is used.
 */

import type { FittingType, LossMethod } from './fittingTypes';
import { LAMINAR_REYNOLDS_FLOOR } from '../friction';
import { HOOPER_2K, hooper2K } from './twoK';
import { DARBY_3K, darby3K } from './threeK';

export { ENTRANCE_K, EXIT_K } from './entranceExit';
export {
  suddenExpansionK,
  gradualExpansionK,
  contractionK,
  diameterChangeK,
} from './diameterChange';
export {
  orificeLossCoefficient,
  orificePressureLossRatio,
  readerHarrisGallagherC,
  ORIFICE_DEFAULT_DISCHARGE_COEFFICIENT,
  orificeMinimumReynolds,
} from './orifice';
export { HOOPER_2K, hooper2K, METRES_PER_INCH } from './twoK';
export { DARBY_3K, darby3K } from './threeK';

/** Fitting types whose K comes from their geometry rather than from a loss method. */
export const GEOMETRIC_FITTINGS: readonly FittingType[] = [
  'reducer',
  'expander',
  'restriction-orifice',
];

/** Where a fitting's K comes from under a loss method, in words for the details panel. */
export function lossCoefficientSource(type: FittingType, method: LossMethod): string {
  if (method === 'fixed') return 'Fixed K as typed';
  if (GEOMETRIC_FITTINGS.includes(type)) {
    return 'From the geometry (Borda–Carnot, Crane TP-410 formulas 1–4, or ISO 5167-2)';
  }
  if (method === '2K') {
    const row = HOOPER_2K[type];
    return row ? `Hooper (1981) 2-K: ${row.row}` : 'Not in Hooper (1981): fixed K as typed';
  }
  const row = DARBY_3K[type];
  if (row) return `Darby (2001) 3-K: ${row.row}`;
  const hooper = HOOPER_2K[type];
  if (hooper) return `Not in Darby (2001): Hooper (1981) 2-K used, ${hooper.row}`;
  return 'Not in Darby (2001) or Hooper (1981): fixed K as typed';
}

/**
 * Loss coefficient K of an inline fitting, referred to the velocity in the pipe of the given
 * inner diameter.
 *
 * The K1/Re terms of the 2-K and 3-K methods use Re no smaller than LAMINAR_REYNOLDS_FLOOR, so
 * K stays finite at zero flow.
 *
 * @param type fitting type
 * @param method 'fixed' returns `fixedK`; '2K' Hooper (1981); '3K' Darby (2001)
 * @param reynolds pipe Reynolds number
 * @param innerDiameter pipe inner diameter, m
 * @param fixedK the user's K, used for 'fixed' and where a table has no entry
 * @throws RangeError for reducers, expanders and orifices under 2-K/3-K (use the geometric
 *   functions), or a non-positive diameter
 */
export function fittingLossCoefficient(
  type: FittingType,
  method: LossMethod,
  reynolds: number,
  innerDiameter: number,
  fixedK: number,
): number {
  if (method === 'fixed') return fixedK;
  if (GEOMETRIC_FITTINGS.includes(type)) {
    throw new RangeError(
      `A ${type} has no ${method} coefficients; its K comes from its diameters (diameterChangeK, orificeLossCoefficient).`,
    );
  }
  if (!(innerDiameter > 0)) {
    throw new RangeError(`Pipe inner diameter must be positive (got ${innerDiameter} m).`);
  }
  const re = Math.max(Math.abs(reynolds), LAMINAR_REYNOLDS_FLOOR);
  if (method === '3K') {
    const darby = DARBY_3K[type];
    if (darby) return darby3K(darby, re, innerDiameter);
  }
  const hooper = HOOPER_2K[type];
  if (hooper) return hooper2K(hooper, re, innerDiameter);
  return fixedK;
}

/**
 * The two parts of a fitting's loss coefficient, K = k1/Re + kConstant, referred to the velocity
 * in the pipe of the given inner diameter: the form of both the 2-K method (Hooper, 1981:
 * k1 = K1, kConstant = K∞(1 + 1/D)) and the 3-K method (Darby, 2001: k1 = K1,
 * kConstant = Ki(1 + Kd/D^0.3)); a fixed K, or a type neither table has, is kConstant alone.
 * With Re no smaller than LAMINAR_REYNOLDS_FLOOR, k1/Re + kConstant equals
 * `fittingLossCoefficient` for the same arguments.
 * @throws RangeError as `fittingLossCoefficient` does
 */
export function fittingLossTerms(
  type: FittingType,
  method: LossMethod,
  innerDiameter: number,
  fixedK: number,
): { k1: number; kConstant: number } {
  if (method === 'fixed') return { k1: 0, kConstant: fixedK };
  // Checks the type and the diameter as the coefficient does (throws the same errors).
  fittingLossCoefficient(type, method, 1, innerDiameter, fixedK);
  if (method === '3K') {
    const darby = DARBY_3K[type];
    if (darby) return { k1: darby.k1, kConstant: darby3K({ ...darby, k1: 0 }, 1, innerDiameter) };
  }
  const hooper = HOOPER_2K[type];
  if (hooper) {
    return { k1: hooper.k1, kConstant: hooper2K({ ...hooper, k1: 0 }, 1, innerDiameter) };
  }
  return { k1: 0, kConstant: fixedK };
}
