/**
 * Compressed (sub-cooled) liquid water, IAPWS-IF97 region 1.
 *
 * Source: IAPWS R7-97(2012), "Revised Release on the IAPWS Industrial Formulation 1997 for
 * the Thermodynamic Properties of Water and Steam", section 5: the dimensionless Gibbs free
 * energy γ(π, τ) of Eq. 7 with the 34 coefficients of Table 2, the property relations of
 * Table 3 and the derivatives of Table 4. The coefficients were typed from memory and then
 * checked digit for digit against iapws 1.5.2 (`iapws97._Region1`): n25 and n26 had been
 * recalled wrongly and were corrected to the library's values, which the verification values
 * of Table 5 (test/physics/water/region1.test.ts) confirm to all nine digits.
 *
 * Region 1 covers 273.15 K ≤ T ≤ 623.15 K at ps(T) ≤ p ≤ 100 MPa (IAPWS R7-97(2012), Eq. 1).
 */

/** Specific gas constant of water used by IF97, J/(kg·K) (IAPWS R7-97(2012), Eq. 1). */
export const IF97_GAS_CONSTANT = 461.526;

/** Upper temperature of IF97 region 1, K (IAPWS R7-97(2012), section 4). */
export const REGION1_MAX_TEMPERATURE = 623.15;

/** Upper pressure of IF97 region 1, Pa (100 MPa; IAPWS R7-97(2012), section 4). */
export const REGION1_MAX_PRESSURE = 100e6;

/**
 * Temperature guards, K, for evaluating Eq. 7 outside region 1. Between them the equation is
 * used as an extrapolation (metastable liquid below 273.15 K, near-critical liquid above
 * 623.15 K); beyond them the value at the guard is returned so results stay finite.
 */
export const REGION1_GUARD_TEMPERATURE = { min: 243.15, max: 640 } as const;

/** Reducing pressure p* = 16.53 MPa and temperature T* = 1386 K of Eq. 7. */
const P_STAR = 16.53e6;
const T_STAR = 1386;

// IAPWS R7-97(2012), Table 2: exponents I, J and coefficients n of Eq. 7 (from memory,
// n25 and n26 corrected from iapws 1.5.2; all 34 now match it).
const I = [
  0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 4, 4, 4, 5, 8, 8, 21, 23, 29,
  30, 31, 32,
];
const J = [
  -2, -1, 0, 1, 2, 3, 4, 5, -9, -7, -1, 0, 1, 3, -3, 0, 1, 3, 17, -4, 0, 6, -5, -2, 10, -8, -11, -6,
  -29, -31, -38, -39, -40, -41,
];
const N = [
  0.14632971213167, -0.84548187169114, -0.3756360367204e1, 0.33855169168385e1, -0.95791963387872,
  0.15772038513228, -0.16616417199501e-1, 0.81214629983568e-3, 0.28319080123804e-3,
  -0.60706301565874e-3, -0.18990068218419e-1, -0.32529748770505e-1, -0.21841717175414e-1,
  -0.5283835796993e-4, -0.47184321073267e-3, -0.30001780793026e-3, 0.47661393906987e-4,
  -0.44141845330846e-5, -0.72694996297594e-15, -0.31679644845054e-4, -0.28270797985312e-5,
  -0.85205128120103e-9, -0.22425281908e-5, -0.65171222895601e-6, -0.14341729937924e-12,
  -0.40516996860117e-6, -0.12734301741641e-8, -0.17424871230634e-9, -0.68762131295531e-18,
  0.14478307828521e-19, 0.26335781662795e-22, -0.11947622640071e-22, 0.18228094581404e-23,
  -0.93537087292458e-25,
];

/** Properties of liquid water from IF97 region 1 at one state point (all SI). */
export interface Region1Properties {
  /** Specific volume, m³/kg. */
  specificVolume: number;
  /** Density, kg/m³. */
  density: number;
  /** Specific enthalpy, J/kg. */
  enthalpy: number;
  /** Specific internal energy, J/kg. */
  internalEnergy: number;
  /** Specific entropy, J/(kg·K). */
  entropy: number;
  /** Specific isobaric heat capacity, J/(kg·K). */
  isobaricHeatCapacity: number;
  /** Speed of sound, m/s. */
  speedOfSound: number;
}

/**
 * Properties of liquid water, IAPWS-IF97 region 1 (Eq. 7 and Table 3 of IAPWS R7-97(2012)),
 * at temperature `temperature` in K and absolute pressure `pressure` in Pa.
 *
 * No pressure dependence is dropped: every property is evaluated at the given (T, p). Inputs
 * outside region 1 are kept finite rather than rejected: T is held within
 * {@link REGION1_GUARD_TEMPERATURE} and p within 0…100 MPa. Below the saturation pressure the
 * equation describes metastable (superheated) liquid. NaN inputs give NaN.
 */
export function region1Properties(temperature: number, pressure: number): Region1Properties {
  const T = clamp(temperature, REGION1_GUARD_TEMPERATURE.min, REGION1_GUARD_TEMPERATURE.max);
  const pi = clamp(pressure, 0, REGION1_MAX_PRESSURE) / P_STAR;
  const tau = T_STAR / T;
  const a = 7.1 - pi;
  const b = tau - 1.222;

  // Eq. 7 and its derivatives (IAPWS R7-97(2012), Table 4).
  let g = 0;
  let gPi = 0;
  let gPiPi = 0;
  let gTau = 0;
  let gTauTau = 0;
  let gPiTau = 0;
  for (let k = 0; k < N.length; k++) {
    const i = I[k];
    const j = J[k];
    const n = N[k];
    const aI = a ** i;
    const aI1 = i >= 1 ? a ** (i - 1) : 0;
    const aI2 = i >= 2 ? a ** (i - 2) : 0;
    const bJ = b ** j;
    const bJ1 = b ** (j - 1);
    const bJ2 = b ** (j - 2);
    g += n * aI * bJ;
    gPi += -n * i * aI1 * bJ;
    gPiPi += n * i * (i - 1) * aI2 * bJ;
    gTau += n * aI * j * bJ1;
    gTauTau += n * aI * j * (j - 1) * bJ2;
    gPiTau += -n * i * aI1 * j * bJ1;
  }

  // IAPWS R7-97(2012), Table 3.
  const RT = IF97_GAS_CONSTANT * T;
  // v = (RT/p)·π·γπ, written as RT·γπ/p* (π = p/p*) so that p = 0 stays finite.
  const specificVolume = (RT * gPi) / P_STAR;
  const enthalpy = tau * gTau * RT;
  const internalEnergy = RT * (tau * gTau - pi * gPi);
  const entropy = IF97_GAS_CONSTANT * (tau * gTau - g);
  const isobaricHeatCapacity = -IF97_GAS_CONSTANT * tau * tau * gTauTau;
  const speedOfSound = Math.sqrt(
    RT * ((gPi * gPi) / ((gPi - tau * gPiTau) ** 2 / (tau * tau * gTauTau) - gPiPi)),
  );
  return {
    specificVolume,
    density: 1 / specificVolume,
    enthalpy,
    internalEnergy,
    entropy,
    isobaricHeatCapacity,
    speedOfSound,
  };
}

/**
 * Density of liquid water, kg/m³, from IAPWS-IF97 region 1 (IAPWS R7-97(2012), Eq. 7 and
 * Table 3: v = (RT/p)·π·γπ) at temperature `temperature` in K and absolute pressure `pressure`
 * in Pa. Same input handling as {@link region1Properties}.
 */
export function region1Density(temperature: number, pressure: number): number {
  return region1Properties(temperature, pressure).density;
}

function clamp(x: number, lo: number, hi: number): number {
  return x < lo ? lo : x > hi ? hi : x;
}
