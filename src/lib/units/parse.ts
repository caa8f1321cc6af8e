/**
 * Reading typed values such as "3 in", "150 gpm", "2.5 barg", "60 °C" or "1,200 kg/m3".
 *
 * Rules:
 * - A number, optionally followed by a unit. No unit means the quantity's display unit in the
 *   chosen system. Spaces between number and unit are optional.
 * - The decimal mark is a point. A comma may only group thousands ("1,200", "12,345.6");
 *   any other comma is refused rather than guessed.
 * - Exponents ("1.5e-5") and a leading sign (including U+2212 "−") are accepted.
 * - Units match their symbol or an accepted spelling after normalising: superscripts become
 *   digits (m³ → m3), "^", spaces and the product dots "·", "*", "." are dropped
 *   (Pa·s → Pas). If the exact spelling is unknown, a case-insensitive match is tried, except
 *   where only the case of an "m" differs (mPa versus MPa differ by 10⁹).
 * - Gauge and absolute pressure stay apart; see convert.ts for the convention.
 */
import { fromUnit, type ConversionContext, type ConversionResult } from './convert';
import {
  DISPLAY_UNITS,
  QUANTITY_DIMENSION,
  QUANTITY_NOUN,
  UNITS,
  unitBySymbol,
  unitsFor,
  type Quantity,
  type UnitDefinition,
  type UnitSystem,
} from './quantities';

/** Normalised key of a unit spelling, used for matching. */
function unitKey(text: string): string {
  return text
    .replace(/³/g, '3')
    .replace(/²/g, '2')
    .replace(/[\s^·⋅*×.]/g, '');
}

const EXACT = new Map<string, UnitDefinition>();
const FOLDED = new Map<string, UnitDefinition[]>();
for (const u of UNITS) {
  for (const spelling of [u.symbol, ...u.aliases]) {
    const key = unitKey(spelling);
    EXACT.set(key, u);
    const folded = key.toLowerCase();
    const list = FOLDED.get(folded) ?? [];
    if (!list.includes(u)) list.push(u);
    FOLDED.set(folded, list);
  }
}

/** The unit a typed spelling names, preferring units of the given dimension. */
export function findUnit(
  text: string,
  quantity: Quantity,
): { ok: true; unit: UnitDefinition } | { ok: false; message: string } {
  const key = unitKey(text);
  const exact = EXACT.get(key);
  if (exact) return { ok: true, unit: exact };
  const candidates = FOLDED.get(key.toLowerCase()) ?? [];
  const dimension = QUANTITY_DIMENSION[quantity];
  const match = candidates.find((u) => u.dimension === dimension) ?? candidates[0];
  if (match) {
    const spelled = [match.symbol, ...match.aliases].find(
      (s) => unitKey(s).toLowerCase() === key.toLowerCase(),
    );
    const mDiffers = spelled !== undefined && /[mM]/.test(key) && !sameMCase(key, unitKey(spelled));
    if (!mDiffers) return { ok: true, unit: match };
    return {
      ok: false,
      message: `'${text}' is not a unit Headroute knows; did you mean '${match.symbol}'? (m and M differ)`,
    };
  }
  return {
    ok: false,
    message: `'${text}' is not a unit Headroute knows for ${QUANTITY_NOUN[quantity]}; use ${unitsFor(quantity).join(', ')}`,
  };
}

function sameMCase(a: string, b: string): boolean {
  for (let i = 0; i < a.length; i++) {
    if ((a[i] === 'm' || a[i] === 'M') && a[i] !== b[i]) return false;
  }
  return true;
}

const NUMBER =
  /^([+\-−]?)(\d{1,3}(?:,\d{3}(?!\d))+(?:\.\d*)?|\d+(?:\.\d*)?|\.\d+)(?:[eE]([+\-−]?\d+))?\s*(.*)$/s;
const NOT_FINITE = /^[+\-−]?\s*(nan|inf(inity)?|∞)/i;
const DECIMAL_COMMA = /^[+\-−]?\d+,\d/;

/** Split typed text into a number and the unit text after it. */
export function splitNumber(
  text: string,
): { ok: true; value: number; unitText: string } | { ok: false; message: string } {
  const trimmed = text.trim();
  if (NOT_FINITE.test(trimmed)) {
    return { ok: false, message: `'${trimmed}' is not a finite number` };
  }
  const m = NUMBER.exec(trimmed);
  if (!m) {
    return { ok: false, message: `'${trimmed}' is not a number` };
  }
  const [, sign, digits, exponent, rest] = m;
  if (rest.startsWith(',') || (DECIMAL_COMMA.test(trimmed) && !digits.includes(','))) {
    return {
      ok: false,
      message: `'${trimmed}': use a point for decimals; a comma only groups thousands, as in 1,200`,
    };
  }
  const source =
    (sign === '-' || sign === '−' ? '-' : '') +
    digits.replace(/,/g, '') +
    (exponent === undefined ? '' : 'e' + exponent.replace('−', '-'));
  const value = Number(source);
  if (!Number.isFinite(value)) {
    return { ok: false, message: `'${trimmed}' is too large a number` };
  }
  return { ok: true, value, unitText: rest.trim() };
}

/**
 * Read a typed value as a quantity, returning its SI value (Pa abs for `pressureAbs`, Pa gauge
 * for `pressureGauge`, K for temperature, 0–1 for `fraction`...). Without a unit the number is
 * taken in the quantity's display unit for `system`. Gauge units typed into an absolute
 * quantity (and absolute into gauge) convert with `context.atmosphericPressure`; without a
 * context that crossing is refused with a message.
 */
export function parseQuantity(
  text: string,
  quantity: Quantity,
  system: UnitSystem,
  context?: ConversionContext,
): ConversionResult {
  if (text.trim() === '') {
    return {
      ok: false,
      message: `Enter ${QUANTITY_NOUN[quantity]}: a number, optionally with a unit such as ${DISPLAY_UNITS[quantity][system]}`,
    };
  }
  const number = splitNumber(text);
  if (!number.ok) return number;
  let unit: UnitDefinition | undefined;
  if (number.unitText === '') {
    unit = unitBySymbol(DISPLAY_UNITS[quantity][system]);
  } else {
    const found = findUnit(number.unitText, quantity);
    if (!found.ok) return found;
    unit = found.unit;
  }
  if (!unit) return { ok: false, message: `No display unit for ${QUANTITY_NOUN[quantity]}` };
  const converted = fromUnit(number.value, unit, quantity, context);
  if (!converted.ok) return converted;
  if (!Number.isFinite(converted.value)) {
    return { ok: false, message: `'${text.trim()}' is too large a number` };
  }
  if (quantity === 'pressureAbs' && converted.value < 0) {
    return { ok: false, message: `'${text.trim()}' is below zero absolute pressure` };
  }
  if (quantity === 'temperature' && converted.value < 0) {
    return { ok: false, message: `'${text.trim()}' is below absolute zero` };
  }
  // Avoid storing -0 from "-0" or from offsets that cancel exactly.
  return { ok: true, value: converted.value === 0 ? 0 : converted.value };
}
