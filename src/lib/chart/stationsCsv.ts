/**
 * The station table of a profile as CSV text, in the project's display units, headed by a
 * comment block with the export's title-block facts and the screening caution.
 */
import type { Id } from '../model/types';
import type { Profile, Station } from '../solver/types';
import { displayUnit, toDisplay, type Quantity, type UnitSystem } from '../units';
import { metaLines, SCREENING_CAUTION, type ExportMeta } from './exportMeta';

interface Column {
  title: string;
  quantity: Quantity | null;
  value(s: Station): number | string;
}

const COLUMNS: Column[] = [
  { title: 'chainage', quantity: 'length', value: (s) => s.chainage },
  { title: 'element', quantity: null, value: (s) => s.elementId },
  { title: 'at', quantity: null, value: (s) => s.at },
  { title: 'elevation', quantity: 'elevation', value: (s) => s.elevation },
  { title: 'HGL', quantity: 'head', value: (s) => s.hgl },
  { title: 'EGL', quantity: 'head', value: (s) => s.egl },
  { title: 'vapour line', quantity: 'head', value: (s) => s.vapourLine },
  { title: 'pressure abs', quantity: 'pressureAbs', value: (s) => s.pressureAbs },
  { title: 'pressure gauge', quantity: 'pressureGauge', value: (s) => s.pressureGauge },
  { title: 'margin to vapour pressure', quantity: 'pressureDrop', value: (s) => s.vapourMargin },
];

/**
 * CSV of the stations: one header comment block (lines starting with '#'), one header row
 * naming each column with its unit, then one row per station. `names` turns element ids into
 * the names people know; the id is written where no name is given.
 */
export function stationsCsv(
  profile: Profile,
  system: UnitSystem,
  meta: ExportMeta,
  names: Record<Id, string> = {},
): string {
  const comments = [...metaLines(meta), `Units: ${system}`, SCREENING_CAUTION].map(
    (l) => `# ${oneLine(l)}`,
  );
  const header = COLUMNS.map((c) =>
    csvField(c.quantity ? `${c.title} (${displayUnit(c.quantity, system)})` : c.title),
  ).join(',');
  const rows = profile.stations.map((s) =>
    COLUMNS.map((c) => {
      const v = c.value(s);
      if (typeof v === 'string') return csvField(c.title === 'element' ? (names[v] ?? v) : v);
      return c.quantity ? numberField(toDisplay(v, c.quantity, system)) : numberField(v);
    }).join(','),
  );
  return [...comments, header, ...rows, ''].join('\n');
}

/** A number to six significant figures; empty where the value is not finite. */
function numberField(v: number): string {
  return Number.isFinite(v) ? String(Number(v.toPrecision(6))) : '';
}

/** A comment line's text on one line: a line break in a name cannot end the `#` line. */
function oneLine(text: string): string {
  return text.replace(/[\r\n\u2028\u2029]+/g, ' ');
}

/**
 * A text cell a spreadsheet will not run as a formula: one beginning with '=', '+', '@', a tab,
 * a carriage return, or '-' not starting a number gets a leading apostrophe (the usual guidance
 * on CSV formula injection, common practice).
 */
export function neutralise(text: string): string {
  return /^[=+@\t\r]/.test(text) ||
    (text.startsWith('-') && !/^-\d+(\.\d+)?([eE][+-]?\d+)?$/.test(text))
    ? `'${text}`
    : text;
}

/** A text cell: neutralised, then quoted when it holds a comma, quote or line break (RFC 4180). */
export function csvField(text: string): string {
  const safe = neutralise(text);
  return /[",\n\r]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}
