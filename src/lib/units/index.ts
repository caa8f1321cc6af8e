/**
 * Units at the edges of Headroute: SI inside, SI or US customary on screen.
 * See quantities.ts (the table), convert.ts (gauge/absolute convention), parse.ts and format.ts.
 */
export {
  CV_PER_KV,
  DISPLAY_UNITS,
  QUANTITY_DIMENSION,
  UNITS,
  displayUnit,
  unitBySymbol,
  unitsFor,
  type Dimension,
  type PressureReference,
  type Quantity,
  type UnitDefinition,
  type UnitSystem,
} from './quantities';
export {
  fromDisplay,
  fromUnit,
  toDisplay,
  displayConverter,
  toUnit,
  type ConversionContext,
  type ConversionResult,
} from './convert';
export { findUnit, parseQuantity, splitNumber } from './parse';
export {
  DEFAULT_DIGITS,
  NOT_A_VALUE,
  formatNumber,
  formatQuantity,
  type FormatOptions,
} from './format';
