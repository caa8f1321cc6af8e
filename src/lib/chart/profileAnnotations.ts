/**
 * Text placed on the profile: marked-span labels above the plot, element labels under the
 * chainage axis and NPSH notes at pump suctions, each kept clear of its neighbours.
 */
import type { Id, NodeKind, SheetNode } from '../model/types';
import type { PumpResult, Station } from '../solver/types';
import { formatQuantity, type UnitSystem } from '../units';
import { estimateTextWidth, placeInLanes } from './labelLanes';
import type { MarkedSpan } from './markedSpans';
import type { NodePlace } from './profileMarks';
import { MIN_SPAN_PX } from './profileStyle';
import type { ElementLabel, NpshNote, PlacedSpan, ProfileGeometry } from './profileTypes';

/** Line height of label text, as a multiple of the font size. */
export const LINE_GAP = 1.25;

/** What span placement needs: the x mapping, units, font size, plot and visible chainages. */
export interface SpanContext {
  x: (c: number) => number;
  system: UnitSystem;
  fontSize: number;
  plot: ProfileGeometry['plot'];
  c0: number;
  c1: number;
}

/** Short text for a span: what is wrong, the smallest margin and where. */
export function spanText(span: MarkedSpan, system: UnitSystem): string {
  const what = span.kind === 'vapour' ? 'Below vapour pressure' : 'Vacuum';
  const pa = formatQuantity(span.minMarginPa, 'pressureDrop', system, { withUnit: true });
  const m = formatQuantity(span.minMargin, 'head', system, { withUnit: true });
  const at = formatQuantity(span.minChainage, 'length', system, { withUnit: true });
  return `${what}: min ${pa} (${m}) at ${at}`;
}

/** Marked spans in the visible window, with their labels placed in up to two lanes. */
export function placeSpans(
  spans: MarkedSpan[],
  ctx: SpanContext,
): Array<Omit<PlacedSpan, 'labelY'> & { lane: number }> {
  const { x, plot, fontSize } = ctx;
  const visible = spans.filter((s) => s.end >= ctx.c0 && s.start <= ctx.c1);
  const texts = visible.map((s) => spanText(s, ctx.system));
  const lanes = placeInLanes(
    visible.map((s, i) => ({
      anchor: (clampX(x(s.start), plot) + clampX(x(s.end), plot)) / 2,
      width: estimateTextWidth(texts[i], fontSize),
    })),
    { min: plot.left, max: plot.left + plot.width },
    8,
    2,
  );
  return visible.map((s, i) => ({
    ...s,
    x0: x(s.start),
    x1: x(s.end),
    ...drawnWidth(x(s.start), x(s.end)),
    markX: x(s.minChainage),
    text: texts[i],
    labelX: lanes[i].centre,
    lane: lanes[i].lane,
  }));
}

/** A span's drawn ends: its own, or MIN_SPAN_PX about its centre when it is narrower. */
export function drawnWidth(x0: number, x1: number): { drawX0: number; drawX1: number } {
  if (x1 - x0 >= MIN_SPAN_PX) return { drawX0: x0, drawX1: x1 };
  const centre = (x0 + x1) / 2;
  return { drawX0: centre - MIN_SPAN_PX / 2, drawX1: centre + MIN_SPAN_PX / 2 };
}

function clampX(px: number, plot: ProfileGeometry['plot']): number {
  return Math.min(plot.left + plot.width, Math.max(plot.left, px));
}

/** Which labels win a crowded axis: ends and machines first, then waypoints, then fittings. */
const LABEL_PRIORITY: Record<NodeKind, number> = {
  vessel: 0,
  boundary: 0,
  pump: 1,
  'control-valve': 2,
  waypoint: 3,
  fitting: 4,
  junction: 5,
};

/** Element labels under the axis, by priority; those with no free lane are left out. */
export function placeLabels(
  places: NodePlace[],
  ctx: {
    nodes?: Record<Id, SheetNode>;
    fontSize: number;
    maxLanes: number;
    x: (c: number) => number;
    plot: { left: number; width: number };
  },
): Array<Omit<ElementLabel, 'y'> & { lane: number }> {
  const named = places
    .map((p) => ({ place: p, node: ctx.nodes?.[p.elementId] }))
    .filter((e): e is { place: NodePlace; node: SheetNode } => e.node !== undefined);
  const texts = named.map((e) => e.node.name || e.node.id);
  const lanes = placeInLanes(
    named.map((e, i) => ({
      anchor: ctx.x(e.place.chainage),
      width: estimateTextWidth(texts[i], ctx.fontSize),
      priority: LABEL_PRIORITY[e.node.kind],
    })),
    { min: 0, max: ctx.plot.left + ctx.plot.width + 16 },
    8,
    ctx.maxLanes,
    'drop',
  );
  const out: Array<Omit<ElementLabel, 'y'> & { lane: number }> = [];
  named.forEach((e, i) => {
    const lane = lanes[i];
    if (!lane) return;
    out.push({
      elementId: e.place.elementId,
      kind: e.node.kind,
      text: texts[i],
      chainage: e.place.chainage,
      anchorX: ctx.x(e.place.chainage),
      x: lane.centre,
      lane: lane.lane,
    });
  });
  return out;
}

/** NPSHa and NPSHr notes at the suction of each pump in view. */
export function npshNotes(
  line: readonly Station[],
  pumps: Record<Id, PumpResult> | undefined,
  ctx: {
    x: (c: number) => number;
    y: (h: number) => number;
    system: UnitSystem;
    fontSize: number;
    plot: ProfileGeometry['plot'];
    inWindow: (c: number) => boolean;
  },
): NpshNote[] {
  if (!pumps) return [];
  const suctions = line.filter(
    (s) => s.at === 'node-in' && pumps[s.elementId] && ctx.inWindow(s.chainage),
  );
  const head = (v: number) => formatQuantity(v, 'head', ctx.system, { withUnit: true });
  const notes = suctions.map((s) => {
    const p = pumps[s.elementId];
    const lines: [string, string] = [
      `NPSHa ${head(p.npshAvailable)}`,
      `NPSHr ${head(p.npshRequired)}`,
    ];
    return { s, p, lines, width: estimateTextWidth(lines[0], ctx.fontSize) };
  });
  const lanes = placeInLanes(
    notes.map((n) => {
      // Left of the suction when there is room, else right of it (clear of the pump's step).
      const sx = ctx.x(n.s.chainage);
      const leftRoom = sx - n.width - 6 >= ctx.plot.left + 2;
      return { anchor: leftRoom ? sx - n.width / 2 - 6 : sx + n.width / 2 + 6, width: n.width };
    }),
    { min: ctx.plot.left + 2, max: ctx.plot.left + ctx.plot.width - 2 },
    6,
    3,
  );
  const lineHeight = ctx.fontSize * LINE_GAP;
  const plotBottom = ctx.plot.top + ctx.plot.height;
  return notes.map((n, i) => {
    const anchorY = ctx.y(Number.isFinite(n.s.hgl) ? n.s.hgl : n.s.elevation);
    const left = lanes[i].left;
    const stack = lanes[i].lane * 2 * lineHeight;
    // The note goes in the free gap between the lines drawn across its width that lies
    // nearest the suction (under the pipe, between pipe and HGL, ...), so no line crosses it.
    const need = NOTE_ASCENT + NOTE_DESCENT + 8 + stack;
    const gaps = freeGaps(line, ctx.x, ctx.y, left - 2, left + n.width + 2, ctx.plot);
    const fits = gaps.filter(([top, bottom]) => bottom - top >= need);
    const distance = ([top, bottom]: [number, number]) =>
      anchorY < top ? top - anchorY : anchorY > bottom ? anchorY - bottom : 0;
    const gap = fits.sort((p, q) => distance(p) - distance(q))[0];
    const lowest = Math.max(anchorY, ctx.y(n.s.elevation));
    const y = !gap
      ? Math.min(
          Math.max(ctx.plot.top + lineHeight, lowest + 16 + stack),
          plotBottom - lineHeight - 2,
        )
      : gap[0] >= anchorY - 1e-9
        ? gap[0] + 4 + NOTE_ASCENT + stack
        : gap[1] - 4 - NOTE_DESCENT - stack;
    return {
      elementId: n.s.elementId,
      anchorX: ctx.x(n.s.chainage),
      anchorY,
      x: left,
      y,
      leaderY: y - NOTE_ASCENT < anchorY ? y + NOTE_DESCENT - 2 : y - 9,
      lines: n.lines,
      short: n.p.npshAvailable < n.p.npshRequired,
    };
  });
}

/** Height of an NPSH note above its first baseline, and below it (two lines 13 px apart), px. */
const NOTE_ASCENT = 10;
const NOTE_DESCENT = 17;

/**
 * Vertical gaps [top, bottom] (px) inside the plot that none of the pipe, HGL, EGL and vapour
 * lines crosses between x0 and x1 (each line's extent over the stations inside, and the nearest
 * one either side, which bounds it across the edges).
 */
function freeGaps(
  line: readonly Station[],
  x: (c: number) => number,
  y: (h: number) => number,
  x0: number,
  x1: number,
  plot: ProfileGeometry['plot'],
): Array<[number, number]> {
  let first = line.findIndex((s) => x(s.chainage) >= x0);
  if (first < 0) first = line.length;
  let last = first;
  while (last < line.length && x(line[last].chainage) <= x1) last++;
  const near = line.slice(Math.max(0, first - 1), Math.min(line.length, last + 1));
  const values: Array<(s: Station) => number> = [
    (s) => s.elevation,
    (s) => s.hgl,
    (s) => s.egl,
    (s) => s.vapourLine,
  ];
  const used: Array<[number, number]> = [];
  for (const value of values) {
    const ys = near.map(value).filter(Number.isFinite).map(y);
    if (ys.length) used.push([Math.min(...ys), Math.max(...ys)]);
  }
  used.sort((p, q) => p[0] - q[0]);
  const gaps: Array<[number, number]> = [];
  let from = plot.top;
  for (const [top, bottom] of used) {
    if (top > from) gaps.push([from, Math.min(top, plot.top + plot.height)]);
    from = Math.max(from, bottom);
  }
  if (from < plot.top + plot.height) gaps.push([from, plot.top + plot.height]);
  return gaps.filter(([top, bottom]) => bottom > top);
}
