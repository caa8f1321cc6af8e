/**
 * A surveyed route profile read from CSV text: one point a line, chainage then elevation,
 * separated by a comma, semicolon, tab or spaces, with or without one header line, in metres or
 * feet. Anything else is refused with the line at fault, so an import never changes the
 * document from half-read data.
 */

/** One surveyed point, SI. */
export interface SurveyPoint {
  /** Distance along the route from the survey's first point, m (horizontal chainage). */
  chainage: number;
  /** Elevation of the pipe at that point, m. */
  elevation: number;
}

/** Length unit of the survey's numbers; `auto` reads it from the header (metres without one). */
export type SurveyUnit = 'm' | 'ft' | 'auto';

/** A survey read, or the first thing wrong with it. */
export type SurveyParse =
  | { ok: true; points: SurveyPoint[]; unit: 'm' | 'ft'; header: string | null }
  | { ok: false; line: number | null; message: string };

/** Largest survey text accepted, bytes (a 5,000-point survey is about 100 kB). */
export const MAX_SURVEY_BYTES = 2_000_000;
/** Most points accepted in one survey. */
export const MAX_SURVEY_POINTS = 100_000;

const FOOT = 0.3048; // exact, by definition of the international foot (1959)
const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/** Cuts a cell to a few dozen characters for a message. */
function shown(cell: string): string {
  const clean = cell.replace(/[^\x20-\x7e]/g, '?');
  return clean.length > 24 ? `${clean.slice(0, 24)}…` : clean;
}

function cells(line: string): string[] {
  const trimmed = line.trim();
  if (/[,;\t]/.test(trimmed)) return trimmed.split(/[,;\t]/).map((c) => c.trim());
  return trimmed.split(/\s+/);
}

/** The unit a header names: "ft"/"feet" → feet, "m"/"metres" → metres, else null. */
function headerUnit(header: string): 'm' | 'ft' | null {
  const h = header.toLowerCase();
  if (/\b(ft|feet|foot)\b|\(ft\)|_ft\b/.test(h)) return 'ft';
  if (/\b(m|metres?|meters?)\b|\(m\)|_m\b/.test(h)) return 'm';
  return null;
}

/**
 * Reads a survey. Chainage must increase strictly from line to line; both columns must be
 * finite numbers; blank lines are skipped. Feet are converted to metres.
 */
export function parseSurveyCsv(text: string, unit: SurveyUnit = 'auto'): SurveyParse {
  if (text.length > MAX_SURVEY_BYTES) {
    const mb = (text.length / 1e6).toFixed(1);
    return { ok: false, line: null, message: `The survey is ${mb} MB; at most 2 MB is read.` };
  }
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  const raw: Array<{ line: number; chainage: number; elevation: number }> = [];
  let header: string | null = null;
  for (let i = 0; i < lines.length; i++) {
    const n = i + 1;
    if (lines[i].trim() === '') continue;
    const row = cells(lines[i]);
    const numeric = row.slice(0, 2).every((c) => NUMBER.test(c));
    if (!numeric && raw.length === 0 && header === null) {
      header = lines[i].trim();
      continue;
    }
    if (row.length < 2 || row[1] === '') {
      return {
        ok: false,
        line: n,
        message: `Line ${n} has one column; chainage and elevation are needed.`,
      };
    }
    for (const [k, name] of [
      [0, 'chainage'],
      [1, 'elevation'],
    ] as const) {
      if (!NUMBER.test(row[k])) {
        return {
          ok: false,
          line: n,
          message: `Line ${n}: the ${name} "${shown(row[k])}" is not a number.`,
        };
      }
    }
    const chainage = Number(row[0]);
    const elevation = Number(row[1]);
    if (!Number.isFinite(chainage) || !Number.isFinite(elevation)) {
      return { ok: false, line: n, message: `Line ${n}: a number is too large.` };
    }
    const last = raw[raw.length - 1];
    if (last && chainage <= last.chainage) {
      return {
        ok: false,
        line: n,
        message: `Line ${n}: chainage ${row[0]} does not increase (line ${last.line} has ${last.chainage}).`,
      };
    }
    if (raw.length >= MAX_SURVEY_POINTS) {
      return {
        ok: false,
        line: n,
        message: `More than ${MAX_SURVEY_POINTS} points; thin the survey first.`,
      };
    }
    raw.push({ line: n, chainage, elevation });
  }
  if (raw.length < 2) {
    return {
      ok: false,
      line: null,
      message: 'A survey needs at least two points (chainage, elevation).',
    };
  }
  const chosen = unit === 'auto' ? ((header === null ? null : headerUnit(header)) ?? 'm') : unit;
  const scale = chosen === 'ft' ? FOOT : 1;
  const origin = raw[0].chainage;
  const points = raw.map((p) => ({
    chainage: (p.chainage - origin) * scale,
    elevation: p.elevation * scale,
  }));
  return { ok: true, points, unit: chosen, header };
}
