/**
 * Conversion between a unit and a quantity's SI value, keeping gauge and absolute pressure
 * apart.
 *
 * Pressure convention: `pressureAbs` is stored as Pa absolute, `pressureGauge` as Pa gauge
 * (relative to the site's atmospheric pressure) and `pressureDrop` as a plain Pa difference.
 * A unit marked gauge (barg, psig, kPag) or absolute (bara, psia, kPaa) keeps its reference;
 * a plain unit (Pa, kPa, MPa, mbar, bar, psi) takes the reference of the quantity it is used
 * for: absolute for `pressureAbs`, gauge for `pressureGauge`. A pressure drop has no
 * reference, so only plain units fit it. Crossing between gauge and absolute needs the
 * atmospheric pressure: p_abs = p_gauge + p_atm.
 */
import {
  DIMENSION_NOUN,
  DISPLAY_UNITS,
  QUANTITY_DIMENSION,
  QUANTITY_NOUN,
  quantityReference,
  unitBySymbol,
  unitsFor,
  type Quantity,
  type UnitDefinition,
  type UnitSystem,
} from './quantities';

/** Site conditions needed to cross between gauge and absolute pressure. */
export interface ConversionContext {
  /** Atmospheric pressure, Pa abs. */
  atmosphericPressure: number;
}

/** A conversion result: a value, or a message the user can read. */
export type ConversionResult = { ok: true; value: number } | { ok: false; message: string };

/** Why a unit does not fit a quantity, or null when it fits. */
export function unitMismatch(unit: UnitDefinition, quantity: Quantity): string | null {
  if (unit.dimension !== QUANTITY_DIMENSION[quantity]) {
    return `'${unit.symbol}' is ${DIMENSION_NOUN[unit.dimension]}, not ${QUANTITY_NOUN[quantity]}`;
  }
  if (quantity === 'pressureDrop' && unit.reference !== 'plain') {
    const kind = unit.reference === 'gauge' ? 'a gauge' : 'an absolute';
    return `'${unit.symbol}' is ${kind} pressure; a pressure drop has no gauge or absolute reference (use ${unitsFor('pressureDrop').join(', ')})`;
  }
  return null;
}

/** Shift in Pa to add when going from the unit's reference to the quantity's. */
function referenceShift(
  unit: UnitDefinition,
  quantity: Quantity,
  context: ConversionContext | undefined,
): { ok: true; shift: number } | { ok: false; message: string } {
  const target = quantityReference(quantity);
  if (target === null || unit.reference === undefined || unit.reference === 'plain') {
    return { ok: true, shift: 0 };
  }
  if (unit.reference === target) return { ok: true, shift: 0 };
  const atm = context?.atmosphericPressure;
  if (atm === undefined || !Number.isFinite(atm)) {
    return {
      ok: false,
      message: `'${unit.symbol}' is ${unit.reference === 'gauge' ? 'a gauge' : 'an absolute'} pressure; turning it into ${QUANTITY_NOUN[quantity]} needs the site's atmospheric pressure`,
    };
  }
  // p_abs = p_gauge + p_atm
  return { ok: true, shift: unit.reference === 'gauge' ? atm : -atm };
}

/** SI value of the quantity from a number in the given unit. */
export function fromUnit(
  value: number,
  unit: UnitDefinition,
  quantity: Quantity,
  context?: ConversionContext,
): ConversionResult {
  const mismatch = unitMismatch(unit, quantity);
  if (mismatch) return { ok: false, message: mismatch };
  const shift = referenceShift(unit, quantity, context);
  if (!shift.ok) return shift;
  return { ok: true, value: value * unit.factor + unit.offset + shift.shift };
}

/** Number in the given unit from the quantity's SI value. */
export function toUnit(
  value: number,
  unit: UnitDefinition,
  quantity: Quantity,
  context?: ConversionContext,
): ConversionResult {
  const mismatch = unitMismatch(unit, quantity);
  if (mismatch) return { ok: false, message: mismatch };
  const shift = referenceShift(unit, quantity, context);
  if (!shift.ok) return shift;
  return { ok: true, value: (value - shift.shift - unit.offset) / unit.factor };
}

function displayDefinition(quantity: Quantity, system: UnitSystem): UnitDefinition {
  const symbol = DISPLAY_UNITS[quantity][system];
  const unit = unitBySymbol(symbol);
  if (!unit) throw new Error(`Display unit '${symbol}' is missing from the unit table`);
  return unit;
}

/**
 * A quantity's SI value in its display unit (e.g. Pa abs → bara in SI, psia in US).
 * Display units never cross gauge and absolute, so no atmospheric pressure is needed.
 */
export function toDisplay(value: number, quantity: Quantity, system: UnitSystem): number {
  const unit = displayDefinition(quantity, system);
  return (value - unit.offset) / unit.factor;
}

/**
 * `toDisplay` for one quantity and unit system, with the unit looked up once: for converting
 * many values (a chart's thousands of points).
 */
export function displayConverter(
  quantity: Quantity,
  system: UnitSystem,
): (value: number) => number {
  const { offset, factor } = displayDefinition(quantity, system);
  return (value) => (value - offset) / factor;
}

/** The SI value of a number given in the quantity's display unit; inverse of `toDisplay`. */
export function fromDisplay(value: number, quantity: Quantity, system: UnitSystem): number {
  const unit = displayDefinition(quantity, system);
  return value * unit.factor + unit.offset;
}
