/**
 * Pure geometry of the profile chart: scales, path strings, marked spans, labels and ticks for
 * a profile drawn in a box of a given size. No DOM: the Svelte panel binds these to SVG
 * attributes and profileSvg writes them into a standalone SVG string.
 *
 * Scales work in display units (the project's unit system); the helpers `x`, `y` and
 * `chainageAt` take and give SI metres so callers never convert by hand.
 */
import { line, scaleLinear, type ScaleLinear } from 'd3';
import type { Id, NodeKind, SheetNode } from '../model/types';
import type { PumpResult, Station } from '../solver/types';
import { displayUnit, formatQuantity, fromDisplay, toDisplay, type UnitSystem } from '../units';
import { estimateTextWidth, placeInLanes } from './labelLanes';
import { isPipeStation, markedSpans, type MarkedSpan } from './markedSpans';

/** Box the chart is drawn in, px. */
export interface ChartSize {
  width: number;
  height: number;
}

/** Space around the plot area, px. */
export interface ChartMargin {
  top: number;
  right: number;
  bottom: number;
  left: number;
}

/** What the geometry needs besides the stations. */
export interface ProfileChartOptions {
  system: UnitSystem;
  /** Document nodes, for element names and kinds in labels (and vessel levels as a fallback). */
  nodes?: Record<Id, SheetNode>;
  /** Pump results, for NPSHa/NPSHr annotations at suctions. */
  pumps?: Record<Id, PumpResult>;
  /** Visible chainage window, m (zoom and pan); the whole route when absent. */
  chainageWindow?: [number, number];
  /** Fixed elevation range, m (kept while a waypoint is dragged); fitted to the profile when absent. */
  elevationWindow?: [number, number];
  margin?: Partial<ChartMargin>;
  /** Font size of labels, px. */
  fontSize?: number;
}

/** A tick on an axis: its value in display units, pixel position and text. */
export interface Tick {
  value: number;
  px: number;
  text: string;
}

/** A marked span placed on the chart. */
export interface PlacedSpan extends MarkedSpan {
  x0: number;
  x1: number;
  /** Label text: what is wrong, the smallest margin and its chainage. */
  text: string;
  labelX: number;
  labelY: number;
}

/** An element label under the chainage axis. */
export interface ElementLabel {
  elementId: Id;
  kind: NodeKind;
  text: string;
  /** Chainage of the element, m, and its pixel position on the axis. */
  chainage: number;
  anchorX: number;
  /** Centre of the label text and the baseline it sits on, px. */
  x: number;
  y: number;
}

/** NPSH annotation at a pump suction. */
export interface NpshNote {
  elementId: Id;
  /** Suction point on the HGL, px. */
  anchorX: number;
  anchorY: number;
  /** Left edge and baseline of the first line of text, px. */
  x: number;
  y: number;
  lines: [string, string];
  /** NPSHa below NPSHr. */
  short: boolean;
}

/** A vertical step of the grade lines at a node: up at a pump, down at a fitting or valve. */
export interface Step {
  elementId: Id;
  x: number;
  /** HGL just before and just after the node, px. */
  yIn: number;
  yOut: number;
  direction: 'rise' | 'drop';
}

/** A vessel's liquid surface at a route end. */
export interface LevelMark {
  elementId: Id;
  x1: number;
  x2: number;
  y: number;
}

/** A node on the route, with the pipe point where it sits (for handles and highlights). */
export interface NodeMark {
  elementId: Id;
  kind: NodeKind | null;
  chainage: number;
  x: number;
  y: number;
}

/** Everything the chart draws, in pixels of the given box. */
export interface ProfileGeometry {
  size: ChartSize;
  /** The plot area (inside the axes). */
  plot: { left: number; top: number; width: number; height: number };
  /** Chainage (display units) → px. */
  xScale: ScaleLinear<number, number>;
  /** Elevation and head (display units) → px. */
  yScale: ScaleLinear<number, number>;
  /** SI chainage, m → px. */
  x(chainage: number): number;
  /** SI elevation or head, m → px. */
  y(head: number): number;
  /** px → SI chainage, m. */
  chainageAt(px: number): number;
  /** px → SI elevation, m. */
  elevationAt(py: number): number;
  paths: { pipe: string; hgl: string; egl: string; vapour: string };
  /** Pipe elevation path of each pipe on the route (for highlighting). */
  pipeSegments: Array<{ elementId: Id; d: string }>;
  steps: Step[];
  levels: LevelMark[];
  nodes: NodeMark[];
  spans: PlacedSpan[];
  labels: ElementLabel[];
  npsh: NpshNote[];
  ticks: { x: Tick[]; y: Tick[] };
  axisTitles: { x: string; y: string };
  /** Full chainage range of the route, m. */
  chainageRange: [number, number];
  /** Elevation range shown, m (pass back as elevationWindow to hold the scale still). */
  elevationRange: [number, number];
}

/** Side margins, px; top and bottom default to what the labels above and below need. */
const DEFAULT_MARGIN = { right: 20, left: 64 };
const LINE_GAP = 1.25;

/**
 * Lays out a profile in a box: scales fitted to the route (or to the chainage window), path
 * strings for the pipe, HGL, EGL and vapour line (gaps where values are not finite), steps at
 * nodes, vessel levels, marked spans with labels, element labels placed without collisions,
 * NPSH notes at pump suctions and axis ticks.
 */
export function profileGeometry(
  profile: { route?: readonly Id[]; stations: readonly Station[] },
  size: ChartSize,
  options: ProfileChartOptions,
): ProfileGeometry {
  const { system } = options;
  const fontSize = options.fontSize ?? 11;
  const lineHeight = fontSize * LINE_GAP;
  const stations = profile.stations;
  const pipeLine = stations.filter(isPipeStation);
  const left = options.margin?.left ?? DEFAULT_MARGIN.left;
  const right = options.margin?.right ?? DEFAULT_MARGIN.right;
  // Top and bottom are set once the labels above and below the plot are placed (they depend
  // on the x scale only), so a short chart gives its height to the plot, not to empty lanes.
  const plot = { left, top: 0, width: Math.max(10, size.width - left - right), height: 0 };

  const chainageRange = finiteExtent(stations.map((s) => s.chainage)) ?? [0, 1];
  const shown = options.chainageWindow ?? chainageRange;
  const [c0, c1] = shown[1] > shown[0] ? shown : [shown[0], shown[0] + 1];
  const len = (v: number) => toDisplay(v, 'length', system);
  const elev = (v: number) => toDisplay(v, 'elevation', system);
  const xScale = scaleLinear()
    .domain([len(c0), len(c1)])
    .range([plot.left, plot.left + plot.width]);
  const x = (c: number) => xScale(len(c));
  const chainageAt = (px: number) => fromDisplay(xScale.invert(px), 'length', system);
  const inWindow = (c: number) => c >= c0 - 1e-9 && c <= c1 + 1e-9;

  const kindOf = (id: Id): NodeKind | null => options.nodes?.[id]?.kind ?? null;
  const places = nodePlaces(profile.route ?? [], pipeLine, kindOf);
  const labelDraft = placeLabels(
    places.filter((n) => inWindow(n.chainage)),
    // A short chart keeps fewer label lanes; labels that do not fit are left out.
    { nodes: options.nodes, fontSize, x, plot, maxLanes: size.height < 320 ? 2 : 4 },
  );
  const spanDraft = placeSpans(markedSpans(stations), { x, system, fontSize, plot, c0, c1 });
  const spanLanes = Math.max(0, ...spanDraft.map((s) => s.lane + 1));
  const labelLanes = Math.max(0, ...labelDraft.map((l) => l.lane + 1));
  plot.top = options.margin?.top ?? 12 + spanLanes * lineHeight;
  const bottom = options.margin?.bottom ?? (labelLanes ? 40 + labelLanes * lineHeight : 38);
  plot.height = Math.max(10, size.height - plot.top - bottom);
  const axisY = plot.top + plot.height;

  const heads = stations.flatMap((s) => [s.elevation, s.hgl, s.egl, s.vapourLine]);
  const [h0, h1] = finiteExtent(heads) ?? [0, 1];
  const pad = Math.max((h1 - h0) * 0.08, 0.5);
  const yScale = scaleLinear().range([axisY, plot.top]);
  if (options.elevationWindow) {
    yScale.domain(options.elevationWindow.map(elev));
  } else {
    yScale.domain([elev(h0 - pad), elev(h1 + pad)]).nice();
  }
  const y = (h: number) => yScale(elev(h));
  const elevationAt = (py: number) => fromDisplay(yScale.invert(py), 'elevation', system);

  const pathOf = (points: readonly Station[], value: (s: Station) => number) =>
    line<Station>()
      .digits(3)
      .defined((s) => Number.isFinite(value(s)) && Number.isFinite(s.chainage))
      .x((s) => x(s.chainage))
      .y((s) => y(value(s)))(points) ?? '';

  const paths = {
    pipe: pathOf(pipeLine, (s) => s.elevation),
    hgl: pathOf(stations, (s) => s.hgl),
    egl: pathOf(stations, (s) => s.egl),
    vapour: pathOf(pipeLine, (s) => s.vapourLine),
  };

  const pipeSegments = groupRuns(pipeLine.filter((s) => s.at === 'pipe')).map((run) => ({
    elementId: run[0].elementId,
    d: pathOf(run, (s) => s.elevation),
  }));

  const nodes: NodeMark[] = places.map((p) => ({
    elementId: p.elementId,
    kind: p.kind,
    chainage: p.chainage,
    x: x(p.chainage),
    y: y(p.elevation),
  }));
  const steps = nodeSteps(pipeLine, x, y);
  const levels = levelMarks(stations, options.nodes, x, y, plot);
  const labels: ElementLabel[] = labelDraft.map(({ lane, ...l }) => ({
    ...l,
    y: axisY + 44 + lane * lineHeight,
  }));
  const spans: PlacedSpan[] = spanDraft.map(({ lane, ...s }) => ({
    ...s,
    labelY: plot.top - 6 - lane * lineHeight,
  }));
  const npsh = npshNotes(pipeLine, options.pumps, { x, y, system, fontSize, plot, inWindow });

  const ticks = {
    x: axisTicks(xScale, Math.max(2, Math.round(plot.width / 90))),
    y: axisTicks(yScale, Math.max(2, Math.round(plot.height / 48))),
  };
  const axisTitles = {
    x: `Chainage (${displayUnit('length', system)})`,
    y: `Elevation and head (${displayUnit('elevation', system)})`,
  };

  return {
    size,
    plot,
    xScale,
    yScale,
    x,
    y,
    chainageAt,
    elevationAt,
    paths,
    pipeSegments,
    steps,
    levels,
    nodes,
    spans,
    labels,
    npsh,
    ticks,
    axisTitles,
    chainageRange,
    elevationRange: [elevationAt(plot.top + plot.height), elevationAt(plot.top)],
  };
}

function finiteExtent(values: readonly number[]): [number, number] | null {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return lo <= hi ? (hi > lo ? [lo, hi] : [lo - 0.5, hi + 0.5]) : null;
}

/** Consecutive stations on the same element. */
function groupRuns(stations: readonly Station[]): Station[][] {
  const runs: Station[][] = [];
  for (const s of stations) {
    const run = runs[runs.length - 1];
    if (run && run[0].elementId === s.elementId) run.push(s);
    else runs.push([s]);
  }
  return runs;
}

/** Where a node of the route sits: its chainage and the pipe elevation there, m. */
interface NodePlace {
  elementId: Id;
  kind: NodeKind | null;
  chainage: number;
  elevation: number;
}

/**
 * Where each node of the route sits. Pipe runs k and k + 1 meet at route node k + 1, so nodes
 * without stations of their own (waypoints, junctions; vessels, which only have a level
 * station) are found at the pipe ends. Without a matching route, nodes with stations are used.
 */
function nodePlaces(
  route: readonly Id[],
  line: readonly Station[],
  kindOf: (id: Id) => NodeKind | null,
): NodePlace[] {
  const place = (elementId: Id, s: Station): NodePlace => ({
    elementId,
    kind: kindOf(elementId),
    chainage: s.chainage,
    elevation: s.elevation,
  });
  const runs = groupRuns(line.filter((s) => s.at === 'pipe'));
  if (route.length >= 2 && runs.length === route.length - 1) {
    return route.map((id, k) => {
      const own = line.find((s) => s.elementId === id && s.at !== 'pipe');
      if (own) return place(id, own);
      return place(id, k < runs.length ? runs[k][0] : runs[k - 1][runs[k - 1].length - 1]);
    });
  }
  const places: NodePlace[] = [];
  for (const s of line) {
    if (s.at === 'pipe' || places.some((m) => m.elementId === s.elementId)) continue;
    places.push(place(s.elementId, s));
  }
  return places;
}

function nodeSteps(
  line: readonly Station[],
  x: (c: number) => number,
  y: (h: number) => number,
): Step[] {
  const steps: Step[] = [];
  for (let i = 0; i + 1 < line.length; i++) {
    const a = line[i];
    const b = line[i + 1];
    if (a.at !== 'node-in' || b.at !== 'node-out' || a.elementId !== b.elementId) continue;
    if (!Number.isFinite(a.hgl) || !Number.isFinite(b.hgl) || a.hgl === b.hgl) continue;
    steps.push({
      elementId: a.elementId,
      x: x(a.chainage),
      yIn: y(a.hgl),
      yOut: y(b.hgl),
      direction: b.hgl > a.hgl ? 'rise' : 'drop',
    });
  }
  return steps;
}

const LEVEL_MARK_LENGTH = 28;

function levelMarks(
  stations: readonly Station[],
  nodes: Record<Id, SheetNode> | undefined,
  x: (c: number) => number,
  y: (h: number) => number,
  plot: ProfileGeometry['plot'],
): LevelMark[] {
  const ends = [stations[0], stations[stations.length - 1]].filter(Boolean);
  const marks: LevelMark[] = [];
  const mid = plot.left + plot.width / 2;
  for (const s of stations) {
    if (s.at !== 'level' || !Number.isFinite(s.elevation)) continue;
    marks.push(levelMark(s.elementId, x(s.chainage), y(s.elevation), mid));
  }
  // A vessel at a route end without a level station: draw its level from the document.
  for (const s of ends) {
    const node = nodes?.[s.elementId];
    if (node?.kind !== 'vessel' || marks.some((m) => m.elementId === s.elementId)) continue;
    marks.push(levelMark(s.elementId, x(s.chainage), y(node.liquidLevel), mid));
  }
  return marks;
}

function levelMark(elementId: Id, px: number, py: number, mid: number): LevelMark {
  // Drawn inside the plot, next to the route end the vessel sits at.
  return px <= mid
    ? { elementId, x1: px, x2: px + LEVEL_MARK_LENGTH, y: py }
    : { elementId, x1: px - LEVEL_MARK_LENGTH, x2: px, y: py };
}

interface SpanContext {
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

function placeSpans(
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
    text: texts[i],
    labelX: lanes[i].centre,
    lane: lanes[i].lane,
  }));
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

function placeLabels(
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

function npshNotes(
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
  return notes.map((n, i) => {
    const anchorY = ctx.y(Number.isFinite(n.s.hgl) ? n.s.hgl : n.s.elevation);
    // Below both the HGL and the pipe at the suction, where the chart is usually clear.
    const below = Math.max(anchorY, ctx.y(n.s.elevation));
    const top = Math.max(ctx.plot.top + lineHeight, below + 16 + lanes[i].lane * 2 * lineHeight);
    return {
      elementId: n.s.elementId,
      anchorX: ctx.x(n.s.chainage),
      anchorY,
      x: lanes[i].left,
      y: Math.min(top, ctx.plot.top + ctx.plot.height - lineHeight - 2),
      lines: n.lines,
      short: n.p.npshAvailable < n.p.npshRequired,
    };
  });
}

function axisTicks(scale: ScaleLinear<number, number>, count: number): Tick[] {
  const format = scale.tickFormat(count);
  return scale.ticks(count).map((value) => ({ value, px: scale(value), text: format(value) }));
}
