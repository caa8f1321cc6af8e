/**
 * Showing values with units at engineering precision.
 *
 * Numbers get `digits` significant figures (default 4) with trailing zeros dropped
 * ("2.5 barg", not "2.500 barg"). Values of 10^digits and above show as whole numbers without
 * grouping ("12346 kg/h"), so the text reads back with `parseQuantity`; below 0.001 and above
 * 1e15 they use an exponent ("1.5e-5"). Zero never shows as "-0". Non-finite values show as
 * "—".
 */
import { toUnit, type ConversionContext } from './convert';
import { DISPLAY_UNITS, unitBySymbol, type Quantity, type UnitSystem } from './quantities';

/** Shown for a value that is not a finite number. */
export const NOT_A_VALUE = '—';

/** Default number of significant figures. */
export const DEFAULT_DIGITS = 4;

function trimZeros(mantissa: string): string {
  return mantissa.includes('.') ? mantissa.replace(/0+$/, '').replace(/\.$/, '') : mantissa;
}

/** A plain number at `digits` significant figures, as described in the module comment. */
export function formatNumber(value: number, digits = DEFAULT_DIGITS): string {
  if (!Number.isFinite(value)) return NOT_A_VALUE;
  const d = Math.min(Math.max(Math.round(digits), 1), 15);
  if (value === 0) return '0';
  const abs = Math.abs(value);
  if (abs >= 1e-3 && abs < 10 ** d) {
    const fixed = value.toPrecision(d);
    if (!fixed.includes('e')) {
      const text = trimZeros(fixed);
      return /^-0(\.0*)?$/.test(text) ? '0' : text;
    }
  }
  if (abs >= 1e-3 && abs < 1e15) {
    const rounded = Math.round(value);
    return rounded === 0 ? '0' : String(rounded);
  }
  const [mantissa, exponent] = value.toExponential(d - 1).split('e');
  return `${trimZeros(mantissa)}e${Number(exponent)}`;
}

/** Options for `formatQuantity`. */
export interface FormatOptions {
  /** Append the unit symbol (default true). */
  withUnit?: boolean;
  /** Significant figures (default 4). */
  digits?: number;
  /** Show in this unit instead of the display unit (a symbol from the unit table). */
  unit?: string;
  /** Needed only when `unit` crosses gauge and absolute pressure. */
  context?: ConversionContext;
}

/**
 * A quantity's SI value as text in its display unit for `system` (or `opts.unit`), e.g.
 * formatQuantity(250000, 'pressureAbs', 'SI') → "2.5 bara". Throws only on a programming
 * error: an unknown or unfitting `opts.unit`, or a gauge/absolute crossing without context.
 */
export function formatQuantity(
  value: number,
  quantity: Quantity,
  system: UnitSystem,
  opts: FormatOptions = {},
): string {
  const symbol = opts.unit ?? DISPLAY_UNITS[quantity][system];
  const unit = unitBySymbol(symbol);
  if (!unit) throw new Error(`Unknown unit '${symbol}'`);
  const converted = toUnit(value, unit, quantity, opts.context);
  if (!converted.ok) throw new Error(converted.message);
  const text = formatNumber(converted.value, opts.digits ?? DEFAULT_DIGITS);
  return opts.withUnit === false || text === NOT_A_VALUE ? text : `${text} ${unit.symbol}`;
}
