/**
 * Bulk modulus of the liquid for pressure waves. A pressure wave is fast enough to be
 * isentropic, so the modulus is the isentropic one, K = ρ·w², with w the speed of sound in the
 * unbounded liquid (Wylie & Streeter, Fluid Transients in Systems, 1993, §1.2: a = √(K/ρ) in a
 * rigid pipe).
 *
 * - Water: w and ρ from IAPWS-IF97 region 1 (IAPWS R7-97(2012), Table 3) at the liquid's
 *   temperature and pressure; checked against Debian's python3-iapws (IAPWS-95) in the tests.
 * - Library liquids: the speed of sound at 25 °C from the table below, with the density at
 *   the project temperature. These speeds are typed from memory of handbook tables of the speed
 *   of sound in liquids (the CRC Handbook of Chemistry and Physics carries one) and were not
 *   checked against a printed table: each is marked so and taken as uncertain by ±3 %.
 * - A user-defined liquid has no bulk modulus: the caller must say so (no number is made up).
 */
import type { LiquidChoice } from '../liquids/liquidChoice';
import { region1Properties } from '../water';

/** A bulk modulus and where it came from. */
export interface BulkModulus {
  /** Isentropic bulk modulus, Pa. */
  value: number;
  /** Source of the value, in words. */
  source: string;
  /** True when the value rests on a figure typed from memory. */
  fromMemory: boolean;
}

/**
 * Isentropic bulk modulus of liquid water, Pa, K = ρ·w² from IAPWS-IF97 region 1 at
 * `temperature` (K) and absolute `pressure` (Pa).
 */
export function waterBulkModulus(temperature: number, pressure: number): number {
  const props = region1Properties(temperature, pressure);
  return props.density * props.speedOfSound * props.speedOfSound;
}

/**
 * Speed of sound in library liquids at 25 °C, m/s: from memory of handbook tables (e.g. the
 * CRC Handbook of Chemistry and Physics, "speed of sound in liquids"); not checked against a
 * printed table. Keys are the liquid library's ids.
 */
export const LIBRARY_SOUND_SPEED_25C: Readonly<Record<string, number>> = {
  methanol: 1103,
  ethanol: 1143,
  isopropanol: 1139,
  acetone: 1174,
  'ethyl-acetate': 1139,
  'acetic-acid': 1150,
  'ethylene-glycol': 1658,
  'propylene-glycol': 1520,
  benzene: 1295,
  toluene: 1306,
  'o-xylene': 1331,
  styrene: 1350,
  'n-hexane': 1078,
  'n-heptane': 1131,
  'n-decane': 1235,
  'n-dodecane': 1279,
};

/**
 * The liquid's bulk modulus at `temperature` (K) and `pressure` (Pa abs) with `density`
 * (kg/m³) from the solve; null when none is known (a user-defined liquid, or a library liquid
 * with no speed of sound in {@link LIBRARY_SOUND_SPEED_25C}).
 */
export function liquidBulkModulus(
  liquid: LiquidChoice,
  temperature: number,
  pressure: number,
  density: number,
): BulkModulus | null {
  if (liquid.kind !== 'library') return null;
  if (liquid.id === 'water') {
    return {
      value: waterBulkModulus(temperature, pressure),
      source: 'water: K = ρ·w², IAPWS-IF97 region 1 (IAPWS R7-97(2012), Table 3)',
      fromMemory: false,
    };
  }
  const w = LIBRARY_SOUND_SPEED_25C[liquid.id];
  if (w === undefined || !(density > 0)) return null;
  return {
    value: density * w * w,
    source: `K = ρ·w² with the speed of sound at 25 °C, ${w} m/s (from memory of handbook tables, ±3 %)`,
    fromMemory: true,
  };
}
