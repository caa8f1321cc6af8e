/**
 * Liquid properties against temperature: the built-in library (water through the water
 * module, other liquids from published correlations) and user-defined tables.
 *
 * SI throughout: K, kg/m³, Pa·s, Pa abs.
 */
import type { LiquidChoice } from './liquidChoice';
import { waterDensity, waterSaturationPressure, waterViscosity } from '../water';
import { evaluateCorrelation, inRange, type TemperatureRange } from './correlations';
import { findLibraryLiquid } from './library';
import type { LibraryLiquid, LiquidProperty, PropertyModel } from './libraryTypes';
import { userLiquidValues, validateUserLiquid } from './userLiquid';

export { LIQUID_LIBRARY, findLibraryLiquid } from './library';
export type { LibraryLiquid, LiquidProperty, PropertyModel } from './libraryTypes';
export type { Correlation, TemperatureRange } from './correlations';
export { validateUserLiquid } from './userLiquid';
export type { UserLiquidChoice, UserLiquidIssue } from './userLiquid';

/** Properties of the chosen liquid at one temperature. */
export interface LiquidProperties {
  name: string;
  /** Density, kg/m³. */
  density: number;
  /** Dynamic viscosity, Pa·s. */
  viscosity: number;
  /** Vapour pressure, Pa abs. */
  vapourPressure: number;
  /** Critical pressure, Pa abs, or null when not known. */
  criticalPressure: number | null;
  /** Properties whose value lies outside the range its source (or table) covers. */
  extrapolated: Array<'density' | 'viscosity' | 'vapourPressure'>;
  /**
   * Temperatures, K, over which all three properties hold without extrapolation (a one-row
   * user table, constant values: 0 to Infinity; no usable data: NaN).
   */
  validRange: { min: number; max: number };
}

const PROPERTIES: readonly LiquidProperty[] = ['density', 'viscosity', 'vapourPressure'];

/** Raw value of one property model at `temperature`, K (may be non-finite). */
function evaluateModel(model: PropertyModel, temperature: number): number {
  if (model.form !== 'water-module') return evaluateCorrelation(model, temperature);
  switch (model.property) {
    case 'vapourPressure':
      return waterSaturationPressure(temperature);
    case 'density':
      return waterDensity(temperature);
    case 'viscosity':
      return waterViscosity(temperature, waterDensity(temperature));
  }
}

/** Nearest end of `range` to `temperature` (the lower end for NaN). */
function nearestEnd(range: TemperatureRange, temperature: number): number {
  return temperature > range.max ? range.max : range.min;
}

function libraryProperties(liquid: LibraryLiquid, temperature: number): LiquidProperties {
  const values = {} as Record<LiquidProperty, number>;
  const extrapolated: LiquidProperty[] = [];
  for (const property of PROPERTIES) {
    const model = liquid[property];
    let value = evaluateModel(model, temperature);
    if (!Number.isFinite(value) && Number.isFinite(temperature)) {
      // The correlation cannot be evaluated here (e.g. T ≤ 0 K, or overflow far outside its
      // range): hold its value at the nearest end of the range, flagged below.
      value = evaluateModel(model, nearestEnd(model.range, temperature));
    }
    values[property] = value;
    if (!inRange(model.range, temperature)) extrapolated.push(property);
  }
  return {
    name: liquid.name,
    ...values,
    criticalPressure: liquid.criticalPressure,
    extrapolated,
    validRange: { ...liquid.validRange },
  };
}

/**
 * Density, viscosity and vapour pressure of `choice` at `temperature`, K.
 *
 * Never throws for a finite temperature. Library liquids: outside a property's stated range
 * the correlation's own value is still returned (where it cannot be evaluated, e.g. T ≤ 0 K,
 * the value at the nearest end of its range) and the property is listed in `extrapolated`;
 * id 'water' uses the water module (IAPWS-IF97, IAPWS 2008), which holds its own finite
 * guards outside its range. User-defined liquids: see ./userLiquid.ts (linear interpolation,
 * vapour pressure in log space, end values held and flagged outside the table). An unknown
 * library id or a user table with no usable rows gives NaN values with every property
 * flagged; `validateLiquidChoice` reports why.
 */
export function liquidProperties(choice: LiquidChoice, temperature: number): LiquidProperties {
  if (choice.kind === 'library') {
    const liquid = findLibraryLiquid(choice.id);
    if (liquid) return libraryProperties(liquid, temperature);
    return {
      name: `Unknown liquid "${choice.id}"`,
      density: Number.NaN,
      viscosity: Number.NaN,
      vapourPressure: Number.NaN,
      criticalPressure: null,
      extrapolated: [...PROPERTIES],
      validRange: { min: Number.NaN, max: Number.NaN },
    };
  }
  const user = userLiquidValues(choice, temperature);
  return {
    name: choice.name,
    ...user.values,
    criticalPressure: user.criticalPressure,
    extrapolated: user.extrapolated,
    validRange: user.validRange,
  };
}

/**
 * Problems with a liquid choice, as messages the user can act on (empty when usable): an
 * unknown library id, or the issues `validateUserLiquid` finds in a user-defined table.
 */
export function validateLiquidChoice(choice: LiquidChoice): string[] {
  if (choice.kind === 'library') {
    return findLibraryLiquid(choice.id)
      ? []
      : [`There is no liquid "${choice.id}" in the library; choose another liquid.`];
  }
  return validateUserLiquid(choice).map((issue) => issue.message);
}
