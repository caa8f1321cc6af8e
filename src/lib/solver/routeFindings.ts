/**
 * Findings along a route, located by chainage: spans where the absolute pressure is below the
 * vapour pressure (stop) and spans under vacuum (caution).
 *
 * Between two stations the pipe and the grade lines are straight (see profile.ts), so the
 * margins p_abs − p_v and p_gauge vary linearly: a span starts or ends where the margin passes
 * through zero by linear interpolation, and its lowest margin sits at a station.
 */
import type { HeadrouteDocument, Id } from '../model/types';
import { findingsIn } from './findings/catalogue';
import type { Finding, Profile, SolveResult, Station } from './types';

/** A stretch of a route where a margin is negative. */
export interface RouteSpan {
  /** Chainage where the margin first goes negative, m. */
  start: number;
  /** Chainage where it comes back to zero (or the last station), m. */
  end: number;
  /** The lowest (most negative) margin in the span, Pa. */
  lowestMargin: number;
  /** The station with the lowest margin. */
  lowest: Station;
  /** Elements with stations inside the span, in route order, without repeats. */
  elements: Id[];
}

/** Chainage where a margin varying linearly from m0 at c0 to m1 at c1 is zero (c0 for a step). */
function crossing(c0: number, m0: number, c1: number, m1: number): number {
  if (c1 === c0 || m0 === m1) return c0;
  return c0 + ((c1 - c0) * m0) / (m0 - m1);
}

/**
 * Spans of a profile where `margin` is below −`tolerance`, over the stations on the line (vessel
 * levels excluded: a liquid surface is not part of the pipe). Stations with a non-finite
 * margin break the line.
 */
export function negativeSpans(
  stations: readonly Station[],
  margin: (s: Station) => number,
  tolerance = 0,
): RouteSpan[] {
  const spans: RouteSpan[] = [];
  let open: RouteSpan | null = null;
  let prev: Station | null = null;
  for (const s of stations) {
    if (s.at === 'level') continue;
    const m = margin(s);
    if (!Number.isFinite(m)) {
      if (open && prev) spans.push({ ...open, end: prev.chainage });
      open = null;
      prev = null;
      continue;
    }
    if (m < -tolerance) {
      if (!open) {
        const start = prev ? crossing(prev.chainage, margin(prev), s.chainage, m) : s.chainage;
        open = { start, end: s.chainage, lowestMargin: m, lowest: s, elements: [] };
      }
      if (m < open.lowestMargin) [open.lowestMargin, open.lowest] = [m, s];
      if (!open.elements.includes(s.elementId)) open.elements.push(s.elementId);
      open.end = s.chainage;
    } else if (open && prev) {
      spans.push({ ...open, end: crossing(prev.chainage, margin(prev), s.chainage, m) });
      open = null;
    }
    prev = s;
  }
  if (open) spans.push(open);
  return spans;
}

/** The station with the smallest margin to vapour pressure (p_abs − p_v) on the line, or null. */
export function lowestVapourMargin(prof: Profile): Station | null {
  let lowest: Station | null = null;
  for (const s of prof.stations) {
    if (s.at === 'level' || !Number.isFinite(s.vapourMargin)) continue;
    if (lowest === null || s.vapourMargin < lowest.vapourMargin) lowest = s;
  }
  return lowest;
}

function elementName(doc: HeadrouteDocument, id: Id): string {
  if (Object.hasOwn(doc.nodes, id)) return doc.nodes[id].name || id;
  if (Object.hasOwn(doc.pipes, id)) return doc.pipes[id].name || id;
  return id;
}

/** "First → Last" from a profile's node list. */
export function routeName(doc: HeadrouteDocument, prof: Profile): string {
  const nodes = prof.route;
  if (nodes.length === 0) return 'route';
  return `${elementName(doc, nodes[0])} → ${elementName(doc, nodes[nodes.length - 1])}`;
}

/**
 * Findings along the route of `prof`, each located by the chainage where its span starts:
 * absolute pressure below vapour pressure (stop, with the lowest margin and where), and the
 * line under vacuum, HGL below the pipe (caution). `name` defaults to "first → last".
 */
export function routeFindings(
  doc: HeadrouteDocument,
  result: SolveResult,
  prof: Profile,
  name: string = routeName(doc, prof),
): Finding[] {
  const findings = findingsIn(doc.settings.unitSystem);
  const out: Finding[] = [];
  const pv = result.fluid.vapourPressure;
  for (const span of negativeSpans(prof.stations, (s) => s.vapourMargin)) {
    out.push(
      findings.routeBelowVapourPressure(
        name,
        span.start,
        span.end,
        elementName(doc, span.lowest.elementId),
        span.lowestMargin,
        span.lowest.chainage,
        pv,
        span.elements,
      ),
    );
  }
  // Rounding tolerance as the sheet findings use: 1e-6 of the atmospheric pressure.
  const vacuumTolerance = 1e-6 * result.fluid.atmosphericPressure;
  for (const span of negativeSpans(prof.stations, (s) => s.pressureGauge, vacuumTolerance)) {
    out.push(
      findings.routeVacuum(
        name,
        span.start,
        span.end,
        elementName(doc, span.lowest.elementId),
        span.lowestMargin,
        span.lowest.chainage,
        span.elements,
      ),
    );
  }
  return out;
}
