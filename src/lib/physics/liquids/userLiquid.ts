/**
 * User-defined liquids: a property table against temperature (LiquidChoice kind 'user').
 *
 * Interpolation (documented choice):
 * - density and viscosity: linear in temperature between neighbouring rows, as the document
 *   type states;
 * - vapour pressure: linear in ln(p) against temperature. Vapour pressure rises roughly
 *   exponentially with temperature (Clausius–Clapeyron; the Antoine and DIPPR 101 forms are
 *   both exponential), so interpolating its logarithm follows the curve much more closely
 *   between sparse rows, and linear interpolation would overstate it there.
 * - one usable row: constant values at every temperature (not flagged);
 * - outside the table's temperatures: the end row's value is held and the property is listed
 *   in `extrapolated`.
 *
 * Robustness: rows whose temperature is not a finite positive number are skipped; for each
 * property, rows whose value is not finite and positive are skipped for that property only;
 * rows are sorted by temperature and, of rows with equal temperatures, the first one listed is
 * used. `validateUserLiquid` reports each of these problems so the user can fix them.
 */
import type { LiquidChoice, UserLiquidRow } from './liquidChoice';
import type { LiquidProperty } from './libraryTypes';

/** A user-defined liquid choice. */
export type UserLiquidChoice = Extract<LiquidChoice, { kind: 'user' }>;

/** One problem found in a user-defined liquid. */
export interface UserLiquidIssue {
  /** Index of the row at fault in `table` as given, or null for the liquid as a whole. */
  row: number | null;
  /** The field at fault. */
  field: 'name' | 'table' | 'temperature' | LiquidProperty | 'criticalPressure';
  /** A message the user can act on. */
  message: string;
}

const PROPERTIES: readonly LiquidProperty[] = ['density', 'viscosity', 'vapourPressure'];

const LABEL: Record<LiquidProperty, string> = {
  density: 'Density',
  viscosity: 'Viscosity',
  vapourPressure: 'Vapour pressure',
};

function isPositiveFinite(value: unknown): value is number {
  return typeof value === 'number' && Number.isFinite(value) && value > 0;
}

/**
 * Checks a user-defined liquid and returns every problem found (an empty list when it is
 * usable as given): missing name, empty table, non-positive or non-finite values, unsorted or
 * repeated temperatures, and a non-positive critical pressure.
 */
export function validateUserLiquid(choice: UserLiquidChoice): UserLiquidIssue[] {
  const issues: UserLiquidIssue[] = [];
  if (typeof choice.name !== 'string' || choice.name.trim() === '') {
    issues.push({ row: null, field: 'name', message: 'The liquid needs a name.' });
  }
  const table: readonly UserLiquidRow[] = Array.isArray(choice.table) ? choice.table : [];
  if (table.length === 0) {
    issues.push({
      row: null,
      field: 'table',
      message: 'The property table needs at least one row.',
    });
  }
  let previous: number | null = null;
  table.forEach((row, index) => {
    const n = index + 1;
    if (!isPositiveFinite(row.temperature)) {
      issues.push({
        row: index,
        field: 'temperature',
        message: `Row ${n}: temperature must be a positive absolute temperature.`,
      });
    } else {
      if (previous !== null && row.temperature === previous) {
        issues.push({
          row: index,
          field: 'temperature',
          message: `Row ${n}: temperature repeats the row above; each row needs its own.`,
        });
      } else if (previous !== null && row.temperature < previous) {
        issues.push({
          row: index,
          field: 'temperature',
          message: `Row ${n}: temperatures must rise from row to row.`,
        });
      }
      previous = row.temperature;
    }
    for (const property of PROPERTIES) {
      if (!isPositiveFinite(row[property])) {
        issues.push({
          row: index,
          field: property,
          message: `Row ${n}: ${LABEL[property].toLowerCase()} must be greater than zero.`,
        });
      }
    }
  });
  if (choice.criticalPressure !== undefined && !isPositiveFinite(choice.criticalPressure)) {
    issues.push({
      row: null,
      field: 'criticalPressure',
      message: 'Critical pressure must be greater than zero, or left empty.',
    });
  }
  return issues;
}

/** Points (temperature, value) usable for one property, sorted, first of equal temperatures. */
function usablePoints(
  table: readonly UserLiquidRow[],
  property: LiquidProperty,
): Array<[number, number]> {
  const points: Array<[number, number]> = [];
  for (const row of table) {
    if (isPositiveFinite(row.temperature) && isPositiveFinite(row[property])) {
      points.push([row.temperature, row[property]]);
    }
  }
  // Array.prototype.sort is stable, so the first-listed of equal temperatures stays first.
  points.sort((a, b) => a[0] - b[0]);
  return points.filter((p, i) => i === 0 || p[0] !== points[i - 1][0]);
}

/** Value of one property from its points, and whether the temperature was outside them. */
function interpolate(
  points: ReadonlyArray<[number, number]>,
  temperature: number,
  logarithmic: boolean,
): { value: number; extrapolated: boolean } {
  if (points.length === 0) return { value: Number.NaN, extrapolated: true };
  if (points.length === 1) return { value: points[0][1], extrapolated: false };
  const first = points[0];
  const last = points[points.length - 1];
  if (!(temperature >= first[0])) {
    return { value: first[1], extrapolated: true };
  }
  if (temperature > last[0]) return { value: last[1], extrapolated: true };
  let i = 1;
  while (points[i][0] < temperature) i++;
  const [t0, v0] = points[i - 1];
  const [t1, v1] = points[i];
  const f = (temperature - t0) / (t1 - t0);
  const value = logarithmic
    ? Math.exp(Math.log(v0) + f * (Math.log(v1) - Math.log(v0)))
    : v0 + f * (v1 - v0);
  return { value, extrapolated: false };
}

/** Properties of a user-defined liquid at `temperature`, K; never throws. */
export function userLiquidValues(
  choice: UserLiquidChoice,
  temperature: number,
): {
  values: Record<LiquidProperty, number>;
  extrapolated: LiquidProperty[];
  validRange: { min: number; max: number };
  criticalPressure: number | null;
} {
  const table: readonly UserLiquidRow[] = Array.isArray(choice.table) ? choice.table : [];
  const values = {} as Record<LiquidProperty, number>;
  const extrapolated: LiquidProperty[] = [];
  let min = Number.NEGATIVE_INFINITY;
  let max = Number.POSITIVE_INFINITY;
  for (const property of PROPERTIES) {
    const points = usablePoints(table, property);
    const result = interpolate(points, temperature, property === 'vapourPressure');
    values[property] = result.value;
    if (result.extrapolated) extrapolated.push(property);
    if (points.length === 0) {
      min = Number.NaN;
      max = Number.NaN;
    } else if (points.length > 1) {
      min = Math.max(min, points[0][0]);
      max = Math.min(max, points[points.length - 1][0]);
    }
  }
  if (min === Number.NEGATIVE_INFINITY) min = 0;
  const criticalPressure = isPositiveFinite(choice.criticalPressure)
    ? choice.criticalPressure
    : null;
  return { values, extrapolated, validRange: { min, max }, criticalPressure };
}
