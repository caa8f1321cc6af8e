/**
 * Saturation line of water, IAPWS-IF97 region 4.
 *
 * Source: IAPWS R7-97(2012), "Revised Release on the IAPWS Industrial Formulation 1997 for
 * the Thermodynamic Properties of Water and Steam", section 8: the basic equation (Eq. 28),
 * its explicit forms for the saturation pressure (Eq. 30) and the saturation temperature
 * (Eq. 31), and the coefficients n1…n10 of Table 34. The coefficients were typed from memory
 * and checked digit for digit against iapws 1.5.2 (`iapws97._PSat_T`); the verification
 * values of Tables 35 and 36 are checked in test/physics/water/saturation.test.ts.
 */

/** Triple-point temperature of water, K (ITS-90 fixed point; 0.01 °C). */
export const TRIPLE_POINT_TEMPERATURE = 273.16;

/** Lower end of the IF97 region 4 range, K (IAPWS R7-97(2012), section 8.1). */
export const SATURATION_MIN_TEMPERATURE = 273.15;

/** Critical temperature of water, K (IAPWS R7-97(2012), Eq. 3). */
export const CRITICAL_TEMPERATURE = 647.096;

/** Critical pressure of water, Pa (IAPWS R7-97(2012), Eq. 4: 22.064 MPa). */
export const CRITICAL_PRESSURE = 22.064e6;

/**
 * Saturation pressure at 273.15 K from Eq. 30, Pa: the lower end of the range of Eq. 31
 * (IAPWS R7-97(2012), section 8.2, gives it as 611.213 Pa).
 */
export const SATURATION_MIN_PRESSURE = 611.212677;

/**
 * Lowest temperature, K, at which Eqs. 30 and 31 are evaluated. Below the IF97 range the
 * equation is used as an extrapolation down to this guard (supercooled liquid); below it the
 * value at the guard is returned so results stay finite.
 */
export const SATURATION_GUARD_MIN_TEMPERATURE = 243.15;

// IAPWS R7-97(2012), Table 34 (from memory; matched against iapws 1.5.2).
const N1 = 0.11670521452767e4;
const N2 = -0.72421316703206e6;
const N3 = -0.17073846940092e2;
const N4 = 0.1202082470247e5;
const N5 = -0.32325550322333e7;
const N6 = 0.1491510861353e2;
const N7 = -0.48232657361591e4;
const N8 = 0.40511340542057e6;
const N9 = -0.23855557567849;
const N10 = 0.65017534844798e3;

/** Reference pressure p* = 1 MPa of Eqs. 30 and 31. */
const P_STAR = 1e6;

/**
 * Saturation (vapour) pressure of water, Pa, at temperature `temperature` in K.
 *
 * IAPWS-IF97 region 4, Eq. 30 (IAPWS R7-97(2012)), valid from 273.15 K to the critical point
 * 647.096 K. Outside that range the result is kept finite: above the critical temperature the
 * critical pressure is returned; below 273.15 K the equation is extrapolated down to
 * {@link SATURATION_GUARD_MIN_TEMPERATURE} and held there. A NaN temperature gives NaN.
 */
export function waterSaturationPressure(temperature: number): number {
  if (temperature >= CRITICAL_TEMPERATURE) return CRITICAL_PRESSURE;
  const T = Math.max(temperature, SATURATION_GUARD_MIN_TEMPERATURE);
  // Eq. 29b: ϑ = T/T* + n9 / (T/T* − n10), T* = 1 K.
  const theta = T + N9 / (T - N10);
  // Eq. 30.
  const A = theta * theta + N1 * theta + N2;
  const B = N3 * theta * theta + N4 * theta + N5;
  const C = N6 * theta * theta + N7 * theta + N8;
  const ratio = (2 * C) / (-B + Math.sqrt(B * B - 4 * A * C));
  return P_STAR * ratio ** 4;
}

/** Saturation pressure at the low-temperature guard; the floor of Eq. 31's input. */
const GUARD_MIN_PRESSURE = waterSaturationPressure(SATURATION_GUARD_MIN_TEMPERATURE);

/**
 * Saturation temperature of water, K, at absolute pressure `pressure` in Pa.
 *
 * IAPWS-IF97 region 4 backward equation, Eq. 31 (IAPWS R7-97(2012)), valid from 611.213 Pa to
 * the critical pressure 22.064 MPa. Outside that range the result is kept finite: above the
 * critical pressure the critical temperature is returned; below the range the equation is
 * extrapolated down to the pressure at {@link SATURATION_GUARD_MIN_TEMPERATURE} and held there.
 * A NaN pressure gives NaN.
 */
export function waterSaturationTemperature(pressure: number): number {
  if (pressure >= CRITICAL_PRESSURE) return CRITICAL_TEMPERATURE;
  const p = Math.max(pressure, GUARD_MIN_PRESSURE);
  // Eq. 29a: β = (ps/p*)^(1/4).
  const beta = (p / P_STAR) ** 0.25;
  // Eq. 31.
  const E = beta * beta + N3 * beta + N6;
  const F = N1 * beta * beta + N4 * beta + N7;
  const G = N2 * beta * beta + N5 * beta + N8;
  const D = (2 * G) / (-F - Math.sqrt(F * F - 4 * E * G));
  return (N10 + D - Math.sqrt((N10 + D) ** 2 - 4 * (N9 + N10 * D))) / 2;
}
