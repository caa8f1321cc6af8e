/**
 * Marked spans along a profile: where the liquid's absolute pressure is under its vapour
 * pressure (HGL below the vapour line) and where the line is under vacuum (HGL below the pipe).
 *
 * Span ends are found by linear interpolation of the margin between stations, so a span that
 * begins or ends inside a pipe is placed where the grade lines actually cross, not at the
 * nearest station. Between stations the grade lines and the pipe are straight, so the margin
 * is linear and its minimum over a span sits at a station.
 */
import type { Id } from '../model/types';
import type { FindingLevel, Station } from '../solver/types';

/** Which limit a span breaks: absolute pressure under vapour pressure, or gauge pressure under zero. */
export type SpanKind = 'vapour' | 'vacuum';

/** One marked span along the route. */
export interface MarkedSpan {
  kind: SpanKind;
  /** 'stop' for vapour (flashing, cavitation, column separation), 'caution' for vacuum. */
  level: Extract<FindingLevel, 'stop' | 'caution'>;
  /** Chainage where the span begins, m. */
  start: number;
  /** Chainage where the span ends, m (equal to start for a span at a single step). */
  end: number;
  /** Smallest (most negative) margin inside the span, m of liquid: HGL − vapour line, or HGL − pipe. */
  minMargin: number;
  /** The same margin in pascals: p_abs − p_v, or p_gauge. */
  minMarginPa: number;
  /** Chainage of the smallest margin, m. */
  minChainage: number;
  /** Elements whose stations lie inside the span, in route order, without repeats. */
  elements: Id[];
}

/** Stations that describe the pipe itself (vessel liquid surfaces are not part of the line). */
export function isPipeStation(s: Station): boolean {
  return s.at !== 'level';
}

interface MarginAccess {
  kind: SpanKind;
  level: MarkedSpan['level'];
  metres(s: Station): number;
  pascals(s: Station): number;
}

const VAPOUR: MarginAccess = {
  kind: 'vapour',
  level: 'stop',
  metres: (s) => s.hgl - s.vapourLine,
  pascals: (s) => s.vapourMargin,
};

const VACUUM: MarginAccess = {
  kind: 'vacuum',
  level: 'caution',
  metres: (s) => s.hgl - s.elevation,
  pascals: (s) => s.pressureGauge,
};

/**
 * All marked spans of a profile, vapour spans (stop) first, then vacuum spans (caution), each
 * list in order of chainage. Stations must be in order of chainage; stations with a
 * non-finite margin break the line (a span open at a gap closes at the last good station).
 */
export function markedSpans(stations: readonly Station[]): MarkedSpan[] {
  const line = stations.filter(isPipeStation);
  return [...spansOf(line, VAPOUR), ...spansOf(line, VACUUM)];
}

function spansOf(line: readonly Station[], access: MarginAccess): MarkedSpan[] {
  const spans: MarkedSpan[] = [];
  let open: MarkedSpan | null = null;
  let prev: Station | null = null;

  const close = (at: number) => {
    if (open) {
      open.end = at;
      spans.push(open);
      open = null;
    }
  };
  const include = (span: MarkedSpan, s: Station) => {
    const m = access.metres(s);
    if (m < span.minMargin) {
      span.minMargin = m;
      span.minMarginPa = access.pascals(s);
      span.minChainage = s.chainage;
    }
    if (!span.elements.includes(s.elementId)) span.elements.push(s.elementId);
  };
  const begin = (at: number): MarkedSpan => ({
    kind: access.kind,
    level: access.level,
    start: at,
    end: at,
    minMargin: 0,
    minMarginPa: 0,
    minChainage: at,
    elements: [],
  });

  for (const s of line) {
    const d = access.metres(s);
    if (!Number.isFinite(d) || !Number.isFinite(s.chainage)) {
      if (prev) close(prev.chainage);
      prev = null;
      continue;
    }
    const inside = d < 0;
    if (!prev) {
      if (inside) open = begin(s.chainage);
    } else {
      const d0 = access.metres(prev);
      const wasInside = d0 < 0;
      if (inside !== wasInside) {
        const at = crossing(prev.chainage, d0, s.chainage, d);
        if (inside) {
          open = begin(at);
        } else {
          close(at);
        }
      }
    }
    if (open && inside) include(open, s);
    prev = s;
  }
  if (prev) close(prev.chainage);
  return spans;
}

/**
 * Chainage where a margin that varies linearly from d0 at c0 to d1 at c1 passes through zero.
 * A vertical step (c0 = c1) crosses at its own chainage.
 */
export function crossing(c0: number, d0: number, c1: number, d1: number): number {
  if (c1 === c0 || d0 === d1) return c0;
  // Linear interpolation: d(c) = d0 + (d1 − d0)(c − c0)/(c1 − c0) = 0.
  return c0 + ((c1 - c0) * d0) / (d0 - d1);
}
