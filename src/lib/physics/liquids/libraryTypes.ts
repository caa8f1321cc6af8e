/**
 * Shape of a library liquid and the source strings shared by the data files.
 */
import {
  intersectRanges,
  type Correlation,
  type Dippr101,
  type Dippr105,
  type TemperatureRange,
} from './correlations';

/** The temperature-dependent properties of a liquid. */
export type LiquidProperty = 'density' | 'viscosity' | 'vapourPressure';

/**
 * A property computed by the water module (IAPWS-IF97 / IAPWS 2008) rather than by a stored
 * correlation; used only by the 'water' entry.
 */
export interface WaterModuleModel {
  form: 'water-module';
  property: LiquidProperty;
  range: TemperatureRange;
  source: string;
}

/** How one property of a library liquid is computed. */
export type PropertyModel = Correlation | WaterModuleModel;

/** One liquid of the built-in library. */
export interface LibraryLiquid {
  /** Stable id stored in project files (LiquidChoice `{ kind: 'library', id }`). */
  id: string;
  name: string;
  /** CAS registry number, for identifying the compound in the sources. */
  casNumber: string;
  /** Temperatures, K, where density, viscosity and vapour pressure all hold (their overlap). */
  validRange: TemperatureRange;
  /** Normal boiling point (at 101 325 Pa), K. */
  normalBoilingPoint: number;
  normalBoilingPointSource: string;
  /** Critical pressure, Pa abs, for the control-valve FF factor (IEC 60534-2-1). */
  criticalPressure: number | null;
  criticalPressureSource: string;
  /** Density, kg/m³. */
  density: PropertyModel;
  /** Dynamic viscosity, Pa·s. */
  viscosity: PropertyModel;
  /** Vapour pressure, Pa abs. */
  vapourPressure: PropertyModel;
}

/** A library entry before its overall valid range is worked out. */
export type LibraryLiquidInput = Omit<LibraryLiquid, 'validRange'>;

/** Adds the overall valid range (overlap of the three property ranges) to an entry. */
export function defineLiquid(input: LibraryLiquidInput): LibraryLiquid {
  const validRange = intersectRanges([
    input.density.range,
    input.viscosity.range,
    input.vapourPressure.range,
  ]);
  return { ...input, validRange };
}

/** The open-source library whose data files transcribe the handbook tables used here. */
const TRANSCRIBED =
  'coefficients copied from the transcription in the open-source Python library "chemicals" ' +
  '(CalebBell/chemicals, file';

/** Vapour pressure, DIPPR 101. */
export const PERRY_VAPOUR_PRESSURE =
  "Perry's Chemical Engineers' Handbook, 8th ed. (2008), Table 2-8 'Vapor Pressure of " +
  `Inorganic and Organic Liquids', DIPPR eq. 101; ${TRANSCRIBED} 'Table 2-8 Vapor Pressure of ` +
  "Inorganic and Organic Liquids.tsv')";

/** Liquid density, DIPPR 105. */
export const PERRY_DENSITY =
  "Perry's Chemical Engineers' Handbook, 8th ed. (2008), Table 2-32 'Densities of Inorganic " +
  `and Organic Liquids', DIPPR eq. 105; ${TRANSCRIBED} 'Perry Parameters 105.tsv'); molar ` +
  'mass from IUPAC standard atomic weights (C 12.011, H 1.008, O 15.999)';

/** Liquid viscosity, DIPPR 101. */
export const PERRY_VISCOSITY =
  "Perry's Chemical Engineers' Handbook, 8th ed. (2008), Table 2-313 'Viscosity of Inorganic " +
  `and Organic Liquids', DIPPR eq. 101; ${TRANSCRIBED} 'Table 2-313 Viscosity of Inorganic ` +
  "and Organic Liquids.tsv')";

/** Vapour pressure, Wagner 2.5-5. */
export const POLING_WAGNER =
  "Poling, Prausnitz and O'Connell, The Properties of Gases and Liquids, 5th ed. (2001), " +
  `Appendix A, Wagner eq. (2.5-5 form); ${TRANSCRIBED} 'Wagner Collection Poling.tsv')`;

/** Normal boiling points. */
export const CRC_BOILING_POINT =
  "CRC Handbook of Chemistry and Physics, table 'Enthalpy of Vaporization' (Tb column; " +
  `edition not stated in the transcription); ${TRANSCRIBED} 'CRC Handbook Heat of ` +
  "Vaporization.tsv')";

/** Critical pressures. */
export const CRC_CRITICAL_PRESSURE =
  "CRC Handbook of Chemistry and Physics, table 'Critical Constants of Organic Compounds' " +
  `(edition not stated in the transcription); ${TRANSCRIBED} 'CRCCriticalOrganics.tsv')`;

/** A DIPPR 101 vapour-pressure correlation from Perry's Table 2-8 (Tmin, Tmax in K). */
export function perryVapourPressure(c: Dippr101['c'], min: number, max: number): Dippr101 {
  return { form: 'dippr101', c, range: { min, max }, source: PERRY_VAPOUR_PRESSURE };
}

/** A DIPPR 105 density correlation from Perry's Table 2-32 (C1 in kmol/m³; M in kg/kmol). */
export function perryDensity(
  c: Dippr105['c'],
  molarMass: number,
  min: number,
  max: number,
): Dippr105 {
  return { form: 'dippr105', c, molarMass, range: { min, max }, source: PERRY_DENSITY };
}

/** A DIPPR 101 viscosity correlation from Perry's Table 2-313 (Pa·s). */
export function perryViscosity(c: Dippr101['c'], min: number, max: number): Dippr101 {
  return { form: 'dippr101', c, range: { min, max }, source: PERRY_VISCOSITY };
}
