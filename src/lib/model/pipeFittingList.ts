/**
 * Quick entry of a pipe's fittings: text such as "6 × 90° elbow", "2x gate valve" or
 * "45 LR elbow" read into a count and a fitting type, and the list edits that follow from it.
 * Pure (no Svelte): the details panel turns the results into `updatePipe` commands.
 */
import type { PipeFittingItem, PipeFittings, PipeFittingType } from './types';
import { DARBY_3K, HOOPER_2K } from '../physics/fittings';

/** A fitting-list line read from text, or why it could not be read. */
export type FittingEntry =
  { ok: true; count: number; fittingType: PipeFittingType } | { ok: false; message: string };

/** The largest count one line takes (as the file format allows). */
export const MAX_ENTRY_COUNT = 1000;

/** Names of the types a pipe may carry, as the pickers show them. */
export const PIPE_FITTING_LABELS: ReadonlyArray<readonly [PipeFittingType, string]> = [
  ['elbow-90-standard', '90° elbow'],
  ['elbow-90-long-radius', '90° elbow, long radius'],
  ['elbow-45-standard', '45° elbow'],
  ['elbow-45-long-radius', '45° elbow, long radius'],
  ['tee-run', 'Tee, flow through run'],
  ['tee-branch', 'Tee, flow through branch'],
  ['gate-valve', 'Gate valve'],
  ['globe-valve', 'Globe valve'],
  ['ball-valve', 'Ball valve'],
  ['butterfly-valve', 'Butterfly valve'],
  ['strainer', 'Strainer'],
  ['flow-meter', 'Flow meter'],
];

/** The picker's name of a type. */
export function fittingLabel(type: PipeFittingType): string {
  return PIPE_FITTING_LABELS.find(([t]) => t === type)?.[1] ?? type;
}

const COUNT = /^\s*(\d+)\s*(?:[×x*]|off\b|no\.?)?\s*/i;

/** The type named by the words of `text` (lower case, count removed), or null. */
function typeOf(words: string): PipeFittingType | 'check' | 'geometric' | null {
  const has = (...w: string[]) => w.some((x) => new RegExp(`(^|[^a-z])${x}`).test(words));
  const longRadius = has('lr', 'long', 'l\\.r\\.') || /1\.5\s*d/.test(words);
  if (has('check', 'non-return', 'nrv')) return 'check';
  if (has('reducer', 'expander', 'orifice', 'restriction')) return 'geometric';
  if (has('elbow', 'ell', 'bend')) {
    if (/45/.test(words)) return longRadius ? 'elbow-45-long-radius' : 'elbow-45-standard';
    if (/90/.test(words) || !/\d/.test(words))
      return longRadius ? 'elbow-90-long-radius' : 'elbow-90-standard';
    return null;
  }
  if (has('tee')) return has('branch', 'side') ? 'tee-branch' : 'tee-run';
  if (has('gate')) return 'gate-valve';
  if (has('globe')) return 'globe-valve';
  if (has('ball')) return 'ball-valve';
  if (has('butterfly', 'bfv')) return 'butterfly-valve';
  if (has('strainer', 'filter')) return 'strainer';
  if (has('meter', 'flowmeter')) return 'flow-meter';
  return null;
}

/**
 * Reads "6 × 90° elbow", "6x 90 ell", "2 gate valves", "tee branch" (a count of 1) and the like.
 * Check valves, reducers, expanders and orifices are refused with the reason (they are drawn as
 * parts of their own).
 */
export function parseFittingEntry(text: string): FittingEntry {
  const trimmed = text.trim();
  if (trimmed === '') return { ok: false, message: 'Type a fitting, e.g. “6 × 90° elbow”.' };
  const match = COUNT.exec(trimmed);
  let count = 1;
  let rest = trimmed;
  // A leading 90 or 45 is an angle, not a count ("90° elbow", "45 ell").
  if (match && !/^\s*(90|45)\s*(°|deg|\s)/i.test(trimmed) && match[0].length < trimmed.length) {
    count = Number(match[1]);
    rest = trimmed.slice(match[0].length);
  }
  if (!Number.isInteger(count) || count < 1 || count > MAX_ENTRY_COUNT) {
    return { ok: false, message: `The count must be a whole number from 1 to ${MAX_ENTRY_COUNT}.` };
  }
  const type = typeOf(rest.toLowerCase());
  if (type === 'check') {
    return {
      ok: false,
      message: 'A check valve stops reverse flow: draw it on the sheet as a part of its own.',
    };
  }
  if (type === 'geometric') {
    return {
      ok: false,
      message:
        'Reducers, expanders and orifices take diameters of their own: draw them on the sheet.',
    };
  }
  if (type === null) {
    const names = PIPE_FITTING_LABELS.map(([, l]) => l.toLowerCase()).join(', ');
    return { ok: false, message: `“${rest.trim()}” is not a fitting Headroute knows (${names}).` };
  }
  return { ok: true, count, fittingType: type };
}

/** A new list line of `count` fittings of `type`, with the method a fitting node starts with. */
export function newFittingItem(type: PipeFittingType, count: number): PipeFittingItem {
  // Types with a row in Darby's or Hooper's table start with 3-K as a fitting node does; the
  // others (strainer, meter) take a typed K: 0.75 as a new fitting node, to be replaced.
  const tabled = DARBY_3K[type] !== undefined || HOOPER_2K[type] !== undefined;
  return { fittingType: type, count, lossMethod: tabled ? '3K' : 'fixed', fixedK: 0.75 };
}

/** An empty fittings list (losses spread along the pipe). */
export function emptyFittings(): PipeFittings {
  return { items: [], lumpedK: 0, place: 'spread' };
}

/**
 * The list with `count` more fittings of `type`: added to the line of that type and method
 * when there is one, otherwise a new line.
 */
export function withFittings(
  list: PipeFittings | undefined,
  type: PipeFittingType,
  count: number,
): PipeFittings {
  const base = list ?? emptyFittings();
  const item = newFittingItem(type, count);
  const at = base.items.findIndex(
    (i) => i.fittingType === type && i.lossMethod === item.lossMethod,
  );
  const items =
    at >= 0
      ? base.items.map((i, j) =>
          j === at ? { ...i, count: Math.min(MAX_ENTRY_COUNT, i.count + count) } : i,
        )
      : [...base.items, item];
  return { ...base, items };
}

/** Σ count per type, in words: "6 × 90° elbow, 1 × gate valve, K 1.2 lumped". */
export function fittingsSummary(list: PipeFittings | undefined): string {
  if (!list) return 'none';
  const parts = list.items.map((i) => `${i.count} × ${fittingLabel(i.fittingType).toLowerCase()}`);
  if (list.lumpedK > 0) parts.push(`lumped K ${list.lumpedK}`);
  return parts.length ? parts.join(', ') : 'none';
}
