/**
 * Aromatic and paraffinic hydrocarbons of the liquids library.
 *
 * Coefficients are Perry's 8th ed. values (Tables 2-8, 2-32, 2-313) with their stated Tmin
 * and Tmax, K; Perry's gives DIPPR 105 C1 in kmol/m³ (the transcription stores it in mol/m³,
 * i.e. ×1000). Normal boiling points and critical pressures are CRC Handbook values. See the
 * source strings in ../libraryTypes.ts.
 *
 * n-Decane and n-dodecane are pure compounds; they are not stand-ins for diesel or kerosene,
 * whose properties depend on the cut.
 */
import {
  CRC_BOILING_POINT,
  CRC_CRITICAL_PRESSURE,
  defineLiquid,
  perryDensity,
  perryVapourPressure,
  perryViscosity,
  type LibraryLiquid,
} from '../libraryTypes';

const crc = { normalBoilingPointSource: CRC_BOILING_POINT };
const crcPc = { criticalPressureSource: CRC_CRITICAL_PRESSURE };

/** Aromatics and n-alkanes, from Perry's 8th ed. */
export const HYDROCARBONS: readonly LibraryLiquid[] = [
  defineLiquid({
    id: 'benzene',
    name: 'Benzene',
    casNumber: '71-43-2',
    normalBoilingPoint: 353.24,
    ...crc,
    criticalPressure: 4.9e6,
    ...crcPc,
    vapourPressure: perryVapourPressure([83.107, -6486.2, -9.2194, 6.9844e-6, 2], 278.68, 562.05),
    density: perryDensity([1.0259, 0.26666, 562.05, 0.28394], 78.114, 278.68, 562.05),
    viscosity: perryViscosity([7.5117, 294.68, -2.794, 0, 0], 278.68, 545),
  }),
  defineLiquid({
    id: 'toluene',
    name: 'Toluene',
    casNumber: '108-88-3',
    normalBoilingPoint: 383.78,
    ...crc,
    criticalPressure: 4.13e6,
    ...crcPc,
    vapourPressure: perryVapourPressure([76.945, -6729.8, -8.179, 5.3017e-6, 2], 178.18, 591.75),
    density: perryDensity([0.8792, 0.27136, 591.75, 0.29241], 92.141, 178.18, 591.75),
    viscosity: perryViscosity([-226.08, 6805.7, 37.542, -0.060853, 1], 178.18, 383.78),
  }),
  defineLiquid({
    id: 'o-xylene',
    name: 'o-Xylene',
    casNumber: '95-47-6',
    normalBoilingPoint: 417.65,
    ...crc,
    criticalPressure: 3.74e6,
    ...crcPc,
    vapourPressure: perryVapourPressure([90.405, -7955.2, -10.086, 5.9594e-6, 2], 247.98, 630.3),
    density: perryDensity([0.69962, 0.26143, 630.3, 0.27365], 106.168, 247.98, 630.3),
    viscosity: perryViscosity([-15.489, 1393.5, 0.63711, 0, 0], 247.98, 418.1),
  }),
  defineLiquid({
    id: 'styrene',
    name: 'Styrene',
    casNumber: '100-42-5',
    normalBoilingPoint: 418.15,
    ...crc,
    criticalPressure: 3.9e6,
    ...crcPc,
    vapourPressure: perryVapourPressure([105.93, -8685.9, -12.42, 7.5583e-6, 2], 242.54, 636),
    density: perryDensity([0.7397, 0.2603, 636, 0.3009], 104.152, 242.54, 636),
    viscosity: perryViscosity([-22.675, 1758, 1.6701, 0, 0], 242.54, 418.31),
  }),
  defineLiquid({
    id: 'n-hexane',
    name: 'n-Hexane',
    casNumber: '110-54-3',
    normalBoilingPoint: 341.88,
    ...crc,
    criticalPressure: 3.03e6,
    ...crcPc,
    vapourPressure: perryVapourPressure([104.65, -6995.5, -12.702, 1.2381e-5, 2], 177.83, 507.6),
    density: perryDensity([0.70824, 0.26411, 507.6, 0.27537], 86.178, 177.83, 507.6),
    viscosity: perryViscosity([-6.3276, 640, -0.694, 5.6884e21, -10], 174.65, 406.08),
  }),
  defineLiquid({
    id: 'n-heptane',
    name: 'n-Heptane',
    casNumber: '142-82-5',
    normalBoilingPoint: 371.55,
    ...crc,
    criticalPressure: 2.74e6,
    ...crcPc,
    vapourPressure: perryVapourPressure([87.829, -6996.4, -9.8802, 7.2099e-6, 2], 182.57, 540.2),
    density: perryDensity([0.61259, 0.26211, 540.2, 0.28141], 100.205, 182.57, 540.2),
    viscosity: perryViscosity([-9.4622, 877.07, -0.23445, 1.4022e22, -10], 180.15, 432.16),
  }),
  defineLiquid({
    id: 'n-decane',
    name: 'n-Decane',
    casNumber: '124-18-5',
    normalBoilingPoint: 447.3,
    ...crc,
    criticalPressure: 2.1e6,
    ...crcPc,
    vapourPressure: perryVapourPressure([112.73, -9749.6, -13.245, 7.1266e-6, 2], 243.51, 617.7),
    density: perryDensity([0.41084, 0.25175, 617.7, 0.28571], 142.286, 243.51, 617.7),
    viscosity: perryViscosity([-9.6489, 1181.1, -0.24367, 9.0522e34, -15], 240.05, 494.16),
  }),
  defineLiquid({
    id: 'n-dodecane',
    name: 'n-Dodecane',
    casNumber: '112-40-3',
    normalBoilingPoint: 489.47,
    ...crc,
    criticalPressure: 1.8e6,
    ...crcPc,
    vapourPressure: perryVapourPressure([137.47, -11976, -16.698, 8.0906e-6, 2], 263.57, 658),
    density: perryDensity([0.33267, 0.24664, 658, 0.28571], 170.34, 263.57, 658),
    viscosity: perryViscosity([-7.8244, 1191.9, -0.49963, 3.9572e23, -10], 262.15, 526.4),
  }),
];
