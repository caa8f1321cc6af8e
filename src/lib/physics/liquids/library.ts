/**
 * The built-in liquids library: water (IAPWS, via the water module) and common process
 * liquids from published correlations (see ./data).
 */
import {
  CRITICAL_PRESSURE as WATER_CRITICAL_PRESSURE,
  CRITICAL_TEMPERATURE as WATER_CRITICAL_TEMPERATURE,
  REGION1_MAX_TEMPERATURE,
  SATURATION_MIN_TEMPERATURE,
  TRIPLE_POINT_TEMPERATURE,
} from '../water';
import { HYDROCARBONS } from './data/hydrocarbons';
import { OXYGENATES } from './data/oxygenates';
import { CRC_BOILING_POINT, defineLiquid, type LibraryLiquid } from './libraryTypes';

/** Water, computed by src/lib/physics/water. */
const WATER: LibraryLiquid = defineLiquid({
  id: 'water',
  name: 'Water',
  casNumber: '7732-18-5',
  normalBoilingPoint: 373.12,
  normalBoilingPointSource: CRC_BOILING_POINT,
  criticalPressure: WATER_CRITICAL_PRESSURE,
  criticalPressureSource: 'IAPWS R7-97(2012) (IAPWS-IF97), Eq. 4: pc = 22.064 MPa',
  vapourPressure: {
    form: 'water-module',
    property: 'vapourPressure',
    range: { min: SATURATION_MIN_TEMPERATURE, max: WATER_CRITICAL_TEMPERATURE },
    source: 'IAPWS R7-97(2012) (IAPWS-IF97), region 4, Eq. 30',
  },
  density: {
    form: 'water-module',
    property: 'density',
    range: { min: SATURATION_MIN_TEMPERATURE, max: REGION1_MAX_TEMPERATURE },
    source:
      'IAPWS R7-97(2012) (IAPWS-IF97), region 1, Eq. 7, at p = max(101 325 Pa, saturation ' +
      'pressure)',
  },
  viscosity: {
    form: 'water-module',
    property: 'viscosity',
    range: { min: TRIPLE_POINT_TEMPERATURE, max: 1173.15 },
    source:
      'IAPWS R12-08 (IAPWS 2008 viscosity formulation), without the critical enhancement, at ' +
      'the IF97 region 1 density',
  },
});

/** Every built-in liquid, water first. */
export const LIQUID_LIBRARY: readonly LibraryLiquid[] = [WATER, ...OXYGENATES, ...HYDROCARBONS];

const BY_ID = new Map(LIQUID_LIBRARY.map((liquid) => [liquid.id, liquid]));

/** The library liquid with this id, or undefined when there is none. */
export function findLibraryLiquid(id: string): LibraryLiquid | undefined {
  return BY_ID.get(id);
}
