/**
 * Pure geometry of the profile chart: scales, path strings, marked spans, labels and ticks for
 * a profile drawn in a box of a given size. No DOM: the Svelte panel binds these to SVG
 * attributes and profileSvg writes them into a standalone SVG string.
 *
 * Scales work in display units (the project's unit system); the helpers `x`, `y` and
 * `chainageAt` take and give SI metres so callers never convert by hand.
 */
import { scaleLinear, type ScaleLinear } from 'd3';
import type { Id, NodeKind } from '../model/types';
import type { Station } from '../solver/types';
import { displayConverter, displayUnit, fromDisplay } from '../units';
import { isPipeStation, markedSpans } from './markedSpans';
import { polylinePath } from './polylinePath';
import { LINE_GAP, npshNotes, placeLabels, placeSpans } from './profileAnnotations';
import { groupRuns, levelMarks, nodePlaces, nodeSteps } from './profileMarks';
import { placeTopNotes } from './topNotes';
import type {
  ChartSize,
  ElementLabel,
  NodeMark,
  PlacedSpan,
  ProfileChartOptions,
  ProfileGeometry,
  Tick,
} from './profileTypes';

export type * from './profileTypes';
export { spanText } from './profileAnnotations';

/** Side margins, px; top and bottom default to what the labels above and below need. */
const DEFAULT_MARGIN = { right: 20, left: 64 };

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
  const len = displayConverter('length', system);
  const elev = displayConverter('elevation', system);
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
  const noteDraft = placeTopNotes(options.topNotes ?? [], { x, plot, fontSize, c0, c1 });
  const noteLanes = Math.max(0, ...noteDraft.map((n) => n.lane + 1));
  const labelLanes = Math.max(0, ...labelDraft.map((l) => l.lane + 1));
  plot.top = options.margin?.top ?? 12 + (spanLanes + noteLanes) * lineHeight;
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

  // Straight runs are drawn by their ends (polylinePath): a long route has many stations.
  const pathOf = (points: readonly Station[], value: (s: Station) => number) =>
    polylinePath(
      points.map((s) => x(s.chainage)),
      points.map((s) => y(value(s))),
    );

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
  // Vacuum spans first, so each span below vapour pressure is drawn over them, not mixed in.
  const spans: PlacedSpan[] = spanDraft
    .map(({ lane, ...s }) => ({ ...s, labelY: plot.top - 6 - lane * lineHeight }))
    .sort((a, b) => (a.level === 'stop' ? 1 : 0) - (b.level === 'stop' ? 1 : 0));
  const topNotes = noteDraft.map((n) => ({
    ...n,
    y: plot.top - 6 - (spanLanes + n.lane) * lineHeight,
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
    topNotes,
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

function axisTicks(scale: ScaleLinear<number, number>, count: number): Tick[] {
  const format = scale.tickFormat(count);
  return scale.ticks(count).map((value) => ({ value, px: scale(value), text: format(value) }));
}
