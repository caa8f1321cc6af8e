/**
 * The HGL envelope across cases along one route: the band between the lowest and the highest
 * HGL of all cases, on a chainage grid merged from every case's stations, and the marked spans
 * of all cases merged, each naming the case with the worst margin inside it.
 *
 * Between stations each case's HGL is straight, so it is interpolated linearly onto the merged
 * grid. Where any case steps (two stations at one chainage: a pump, fitting or valve), the grid
 * holds two points at that chainage, one for each side of the step, so the band steps too.
 */
import type { Profile, Station } from '../solver/types';
import { isPipeStation, markedSpans, type MarkedSpan } from './markedSpans';

/** One case's profile along the route, with the name to show for it. */
export interface EnvelopeCase {
  name: string;
  profile: Profile;
}

/** One point of the band. */
export interface EnvelopePoint {
  /** Chainage, m. */
  chainage: number;
  /** Lowest HGL of the cases that reach this chainage, m. */
  low: number;
  /** Highest HGL, m. */
  high: number;
  /** Index of the case with the lowest HGL here. */
  lowCase: number;
  /** Index of the case with the highest HGL here. */
  highCase: number;
}

/** A marked span of the envelope: the union of the cases' spans of one kind that overlap. */
export interface EnvelopeSpan extends MarkedSpan {
  /** Index of the case with the smallest (most negative) margin inside the span. */
  worstCase: number;
  /** Its name. */
  worstCaseName: string;
  /** Indices of every case with a span here, in case order. */
  cases: number[];
}

/** The band and the spans. */
export interface Envelope {
  points: EnvelopePoint[];
  spans: EnvelopeSpan[];
}

interface Line {
  chainage: number[];
  hgl: number[];
}

function lineOf(stations: readonly Station[]): Line {
  const line: Line = { chainage: [], hgl: [] };
  let last = -Infinity;
  for (const s of stations) {
    if (!isPipeStation(s) || !Number.isFinite(s.chainage) || !Number.isFinite(s.hgl)) continue;
    if (s.chainage < last) continue; // out-of-order stations are dropped, not reordered
    line.chainage.push(s.chainage);
    line.hgl.push(s.hgl);
    last = s.chainage;
  }
  return line;
}

/**
 * A line's HGL at chainage `c`, approached from the left (side 'in') or the right ('out');
 * null outside the line's extent.
 */
function hglAt(line: Line, c: number, side: 'in' | 'out'): number | null {
  const xs = line.chainage;
  const n = xs.length;
  if (n === 0 || c < xs[0] || c > xs[n - 1]) return null;
  // First index with chainage ≥ c (binary search).
  let lo = 0;
  let hi = n - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (xs[mid] < c) lo = mid + 1;
    else hi = mid;
  }
  if (xs[lo] === c) {
    if (side === 'in') return line.hgl[lo];
    let last = lo;
    while (last + 1 < n && xs[last + 1] === c) last++;
    return line.hgl[last];
  }
  // Linear interpolation between stations lo − 1 and lo.
  const c0 = xs[lo - 1];
  const c1 = xs[lo];
  const t = (c - c0) / (c1 - c0);
  return line.hgl[lo - 1] + t * (line.hgl[lo] - line.hgl[lo - 1]);
}

function hasStep(line: Line, c: number): boolean {
  const i = line.chainage.indexOf(c);
  if (i < 0) return false;
  let j = i;
  while (j + 1 < line.chainage.length && line.chainage[j + 1] === c) j++;
  return j > i && line.hgl[j] !== line.hgl[i];
}

/** The band's points on the merged chainage grid (see the module comment). */
export function envelopePoints(cases: readonly EnvelopeCase[]): EnvelopePoint[] {
  const lines = cases.map((c) => lineOf(c.profile.stations));
  const grid = [...new Set(lines.flatMap((l) => l.chainage))].sort((a, b) => a - b);
  const points: EnvelopePoint[] = [];
  for (const c of grid) {
    const sides: Array<'in' | 'out'> = lines.some((l) => hasStep(l, c)) ? ['in', 'out'] : ['in'];
    for (const side of sides) {
      let point: EnvelopePoint | null = null;
      lines.forEach((line, i) => {
        const h = hglAt(line, c, side);
        if (h === null) return;
        if (!point) {
          point = { chainage: c, low: h, high: h, lowCase: i, highCase: i };
          return;
        }
        if (h < point.low) {
          point.low = h;
          point.lowCase = i;
        }
        if (h > point.high) {
          point.high = h;
          point.highCase = i;
        }
      });
      if (point) points.push(point);
    }
  }
  return points;
}

/**
 * Every case's marked spans, merged: spans of one kind that overlap or touch become one, which
 * names the case with the smallest margin inside it. Vapour (stop) spans first, then vacuum
 * (caution), each in order of chainage.
 */
export function envelopeSpans(cases: readonly EnvelopeCase[]): EnvelopeSpan[] {
  const all = cases.flatMap((c, i) =>
    markedSpans(c.profile.stations).map((span) => ({ span, caseIndex: i })),
  );
  const merged: EnvelopeSpan[] = [];
  for (const kind of ['vapour', 'vacuum'] as const) {
    const ofKind = all
      .filter((s) => s.span.kind === kind)
      .sort((a, b) => a.span.start - b.span.start);
    let open: EnvelopeSpan | null = null;
    for (const { span, caseIndex } of ofKind) {
      if (open && span.start <= open.end) {
        open.end = Math.max(open.end, span.end);
        if (!open.cases.includes(caseIndex)) open.cases.push(caseIndex);
        for (const e of span.elements) if (!open.elements.includes(e)) open.elements.push(e);
        if (span.minMargin < open.minMargin) {
          open.minMargin = span.minMargin;
          open.minMarginPa = span.minMarginPa;
          open.minChainage = span.minChainage;
          open.worstCase = caseIndex;
          open.worstCaseName = cases[caseIndex].name;
        }
        continue;
      }
      if (open) merged.push(open);
      open = {
        ...span,
        elements: [...span.elements],
        worstCase: caseIndex,
        worstCaseName: cases[caseIndex].name,
        cases: [caseIndex],
      };
    }
    if (open) merged.push(open);
  }
  for (const s of merged) s.cases.sort((a, b) => a - b);
  return merged;
}

/** The envelope of HGL across the cases' profiles along one route. */
export function hglEnvelope(cases: readonly EnvelopeCase[]): Envelope {
  return { points: envelopePoints(cases), spans: envelopeSpans(cases) };
}

/**
 * SVG path of the band: along the highest HGL left to right, back along the lowest, closed.
 * `x` maps chainage (m) and `y` maps head (m) to pixels. Empty when there are no points.
 */
export function envelopePath(
  points: readonly EnvelopePoint[],
  x: (chainage: number) => number,
  y: (head: number) => number,
): string {
  if (points.length === 0) return '';
  const px = (v: number) => String(Math.round(v * 100) / 100);
  const top = points.map((p) => `${px(x(p.chainage))} ${px(y(p.high))}`);
  const bottom = [...points].reverse().map((p) => `${px(x(p.chainage))} ${px(y(p.low))}`);
  return `M${top.join('L')}L${bottom.join('L')}Z`;
}
