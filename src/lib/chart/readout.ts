/**
 * Hover readout: the values of the grade lines at any chainage along a profile, interpolated
 * linearly between the stations either side (the lines are straight between stations).
 */
import type { Id } from '../model/types';
import type { Station } from '../solver/types';
import { isPipeStation } from './markedSpans';

/** Interpolated values at one chainage; SI units like the stations. */
export interface Readout {
  chainage: number;
  elevation: number;
  hgl: number;
  egl: number;
  vapourLine: number;
  pressureAbs: number;
  pressureGauge: number;
  /** p_abs − p_v, Pa. */
  vapourMargin: number;
  /** HGL − vapour line, m of liquid. */
  vapourMarginHead: number;
  /** The element under the pointer: the pipe, or the node when the pointer sits on a node. */
  elementId: Id;
}

const FIELDS = [
  'elevation',
  'hgl',
  'egl',
  'vapourLine',
  'pressureAbs',
  'pressureGauge',
  'vapourMargin',
] as const;

/**
 * Values at `chainage`, clamped to the ends of the profile. Where the chainage falls exactly on
 * a node (a pair of stations at one chainage), the downstream ('node-out') side is given.
 * Returns null for a profile with no pipe stations.
 */
export function readoutAt(stations: readonly Station[], chainage: number): Readout | null {
  const line = stations.filter(isPipeStation);
  if (line.length === 0) return null;
  const first = line[0];
  const last = line[line.length - 1];
  if (chainage <= first.chainage) return fromStation(atChainage(line, first.chainage));
  if (chainage >= last.chainage) return fromStation(last);
  // Last station at or before the chainage, then the first one after it.
  let i = 0;
  while (i + 1 < line.length && line[i + 1].chainage <= chainage) i++;
  const a = line[i];
  const b = line[i + 1];
  if (a.chainage === chainage) return fromStation(a);
  const t = (chainage - a.chainage) / (b.chainage - a.chainage);
  const r = { chainage, elementId: nearerElement(a, b, t) } as Readout;
  for (const f of FIELDS) r[f] = a[f] + (b[f] - a[f]) * t;
  r.vapourMarginHead = r.hgl - r.vapourLine;
  return r;
}

/** Station index nearest to a chainage (the downstream one of a pair at the same chainage). */
export function nearestStationIndex(stations: readonly Station[], chainage: number): number {
  let best = -1;
  let bestDistance = Infinity;
  stations.forEach((s, i) => {
    const d = Math.abs(s.chainage - chainage);
    if (d <= bestDistance) {
      best = i;
      bestDistance = d;
    }
  });
  return best;
}

function atChainage(line: readonly Station[], chainage: number): Station {
  let s = line[0];
  for (const t of line) if (t.chainage === chainage) s = t;
  return s;
}

function nearerElement(a: Station, b: Station, t: number): Id {
  // Along a pipe both stations usually name the pipe; next to a node prefer the pipe between.
  if (a.at === 'pipe') return a.elementId;
  if (b.at === 'pipe') return b.elementId;
  return t < 0.5 ? a.elementId : b.elementId;
}

function fromStation(s: Station): Readout {
  return {
    chainage: s.chainage,
    elevation: s.elevation,
    hgl: s.hgl,
    egl: s.egl,
    vapourLine: s.vapourLine,
    pressureAbs: s.pressureAbs,
    pressureGauge: s.pressureGauge,
    vapourMargin: s.vapourMargin,
    vapourMarginHead: s.hgl - s.vapourLine,
    elementId: s.elementId,
  };
}
