/**
 * Water properties for the liquid range (about 0.01–200 °C at saturation pressure or above):
 * vapour pressure and saturation temperature from IAPWS-IF97 region 4, density from IAPWS-IF97
 * region 1, dynamic viscosity from the IAPWS 2008 formulation. All SI: K, Pa (absolute),
 * kg/m³, Pa·s.
 *
 * Pressure dependence: density is evaluated at the pressure given (IF97 region 1 is a full
 * function of T and p); viscosity follows pressure through that density. When no pressure is
 * given, density is taken at p = max(101 325 Pa, ps(T)) — liquid at one standard atmosphere,
 * or on the saturation line when the vapour pressure is higher. Between 101 325 Pa and a few
 * bar the density changes by about 0.05 % per MPa at 20 °C, so a line's local pressure matters
 * only at the level of tenths of a percent.
 */
import { waterSaturationPressure } from './saturation';
import { region1Density } from './region1';

export {
  waterSaturationPressure,
  waterSaturationTemperature,
  CRITICAL_PRESSURE,
  CRITICAL_TEMPERATURE,
  SATURATION_MIN_TEMPERATURE,
  TRIPLE_POINT_TEMPERATURE,
} from './saturation';
export { region1Properties, REGION1_MAX_TEMPERATURE } from './region1';
export type { Region1Properties } from './region1';
export { waterViscosity } from './viscosity';

/** One standard atmosphere, Pa: the default pressure for liquid properties. */
export const STANDARD_ATMOSPHERE = 101325;

/**
 * Density of liquid water, kg/m³, at temperature `temperature` in K and absolute pressure
 * `pressure` in Pa, from IAPWS-IF97 region 1 (IAPWS R7-97(2012), Eq. 7 and Table 3).
 * `pressure` defaults to max(101 325 Pa, ps(T)) with ps from IF97 Eq. 30. Inputs outside
 * region 1 are held at finite guards (see `region1Properties`); NaN gives NaN.
 */
export function waterDensity(temperature: number, pressure?: number): number {
  const p = pressure ?? Math.max(STANDARD_ATMOSPHERE, waterSaturationPressure(temperature));
  return region1Density(temperature, p);
}
