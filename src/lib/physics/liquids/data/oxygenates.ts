/**
 * Alcohols, glycols, a ketone, an ester and an acid of the liquids library.
 *
 * Coefficients are Perry's 8th ed. values (Tables 2-8, 2-32, 2-313) with their stated Tmin
 * and Tmax, K; Perry's gives DIPPR 105 C1 in kmol/m³ (the transcription stores it in mol/m³,
 * i.e. ×1000). Normal boiling points and critical pressures are CRC Handbook values. See the
 * source strings in ../libraryTypes.ts.
 */
import {
  CRC_BOILING_POINT,
  CRC_CRITICAL_PRESSURE,
  POLING_WAGNER,
  defineLiquid,
  perryDensity,
  perryVapourPressure,
  perryViscosity,
  type LibraryLiquid,
} from '../libraryTypes';

const crc = { normalBoilingPointSource: CRC_BOILING_POINT };
const crcPc = { criticalPressureSource: CRC_CRITICAL_PRESSURE };

/** Alcohols, glycols, acetone, ethyl acetate and acetic acid, from Perry's 8th ed. */
export const OXYGENATES: readonly LibraryLiquid[] = [
  defineLiquid({
    id: 'methanol',
    name: 'Methanol',
    casNumber: '67-56-1',
    normalBoilingPoint: 337.75,
    ...crc,
    // 8.084 MPa: CRC Handbook, 'Critical Constants of Organic Compounds' (from memory; the
    // transcription's 8.01 MPa was 1.7 % below Perry's Table 2-8 row at its Tmax = Tc, 8.145
    // MPa, and below every handbook value remembered, 8.08–8.10 MPa).
    criticalPressure: 8.084e6,
    criticalPressureSource:
      "CRC Handbook of Chemistry and Physics, table 'Critical Constants of Organic Compounds' " +
      '(from memory: 8.084 MPa; the transcription gave 8.01 MPa)',
    vapourPressure: perryVapourPressure([82.718, -6904.5, -8.8622, 7.4664e-6, 2], 175.47, 512.5),
    density: perryDensity([2.3267, 0.27073, 512.5, 0.24713], 32.042, 175.47, 512.5),
    viscosity: perryViscosity([-25.317, 1789.2, 2.069, 0, 0], 175.47, 337.85),
  }),
  defineLiquid({
    id: 'ethanol',
    name: 'Ethanol',
    casNumber: '64-17-5',
    normalBoilingPoint: 351.44,
    ...crc,
    criticalPressure: 6.25e6,
    ...crcPc,
    vapourPressure: perryVapourPressure([73.304, -7122.3, -7.1424, 2.8853e-6, 2], 159.05, 514),
    density: perryDensity([1.6288, 0.27469, 514, 0.23178], 46.069, 159.05, 514),
    viscosity: perryViscosity([7.875, 781.98, -3.0418, 0, 0], 200, 440),
  }),
  defineLiquid({
    id: 'isopropanol',
    name: 'Isopropanol (2-propanol)',
    casNumber: '67-63-0',
    normalBoilingPoint: 355.45,
    ...crc,
    criticalPressure: 4.7e6,
    ...crcPc,
    // Perry's Table 2-8 row for 2-propanol gives 104.1 kPa at the CRC boiling point (+2.7 %),
    // so the Wagner equation of Poling et al. is used instead (101.6 kPa there).
    vapourPressure: {
      form: 'wagner25',
      a: -8.73656,
      b: 2.1624,
      c: -8.70785,
      d: 4.77927,
      criticalTemperature: 508.3,
      criticalPressure: 4.763e6,
      range: { min: 185.258, max: 508.3 },
      source: POLING_WAGNER,
    },
    density: perryDensity([1.1799, 0.2644, 508.3, 0.24653], 60.096, 185.26, 508.3),
    viscosity: perryViscosity([-8.8918, 2357.6, -0.91376, 0, 0], 185.26, 355.3),
  }),
  defineLiquid({
    id: 'acetone',
    name: 'Acetone',
    casNumber: '67-64-1',
    normalBoilingPoint: 329.2,
    ...crc,
    criticalPressure: 4.7e6,
    ...crcPc,
    vapourPressure: perryVapourPressure([69.006, -5599.6, -7.0985, 6.2237e-6, 2], 178.45, 508.2),
    density: perryDensity([1.2332, 0.25886, 508.2, 0.2913], 58.08, 178.45, 508.2),
    viscosity: perryViscosity([-14.918, 1023.4, 0.5961, 0, 0], 190, 329.44),
  }),
  defineLiquid({
    id: 'ethyl-acetate',
    name: 'Ethyl acetate',
    casNumber: '141-78-6',
    normalBoilingPoint: 350.26,
    ...crc,
    criticalPressure: 3.88e6,
    ...crcPc,
    vapourPressure: perryVapourPressure([66.824, -6227.6, -6.41, 1.7914e-17, 6], 189.6, 523.3),
    density: perryDensity([0.8996, 0.25856, 523.3, 0.278], 88.106, 189.6, 523.3),
    viscosity: perryViscosity([14.354, -154.6, -3.7887, 0, 0], 220, 473.15),
  }),
  defineLiquid({
    id: 'acetic-acid',
    name: 'Acetic acid (glacial)',
    casNumber: '64-19-7',
    normalBoilingPoint: 391.05,
    ...crc,
    criticalPressure: 5.79e6,
    ...crcPc,
    vapourPressure: perryVapourPressure([53.27, -6304.5, -4.2985, 8.8865e-18, 6], 289.81, 591.95),
    density: perryDensity([1.4486, 0.25892, 591.95, 0.2529], 60.052, 289.81, 591.95),
    viscosity: perryViscosity([-9.03, 1212.3, -0.322, 0, 0], 289.81, 391.05),
  }),
  defineLiquid({
    id: 'ethylene-glycol',
    name: 'Ethylene glycol (pure)',
    casNumber: '107-21-1',
    normalBoilingPoint: 470.45,
    ...crc,
    criticalPressure: 8.1e6,
    ...crcPc,
    vapourPressure: perryVapourPressure([84.09, -10411, -8.1976, 1.6536e-18, 6], 260.15, 720),
    density: perryDensity([1.315, 0.25125, 720, 0.21868], 62.068, 260.15, 720),
    viscosity: perryViscosity([-20.515, 2468.5, 1.2435, 2.4998e12, -5], 260.15, 576),
  }),
  defineLiquid({
    id: 'propylene-glycol',
    name: 'Propylene glycol (pure 1,2-propanediol)',
    casNumber: '57-55-6',
    normalBoilingPoint: 460.75,
    ...crc,
    criticalPressure: 5.9e6,
    ...crcPc,
    vapourPressure: perryVapourPressure([212.8, -15420, -28.109, 2.1564e-5, 2], 213.15, 626),
    density: perryDensity([1.0923, 0.26106, 626, 0.20459], 76.095, 213.15, 626),
    viscosity: perryViscosity([-804.54, 30487, 130.79, -0.15449, 1], 213.15, 500.8),
  }),
];
