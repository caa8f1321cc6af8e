/**
 * The shapes profileGeometry returns: scales, paths, marks and placed labels, all in pixels
 * of the box the chart is drawn in.
 */
import type { ScaleLinear } from 'd3';
import type { Id, NodeKind, SheetNode } from '../model/types';
import type { PumpResult } from '../solver/types';
import type { UnitSystem } from '../units';
import type { MarkedSpan } from './markedSpans';
import type { PlacedTopNote, TopNote } from './topNotes';

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
  /** Notes to place in lanes of their own above the span labels (e.g. the case envelope's). */
  topNotes?: readonly TopNote[];
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
  /**
   * The span as drawn, px: at least MIN_SPAN_PX wide, centred on the span, so a 2 m span on a
   * long route still shows.
   */
  drawX0: number;
  drawX1: number;
  /** Where the smallest margin is, px (the marker's position). */
  markX: number;
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
  /** Where the leader from the suction meets the note, px: its top, or its foot when above. */
  leaderY: number;
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
  /** The `topNotes` asked for, placed above the plot clear of the grade lines (empty if none). */
  topNotes: PlacedTopNote[];
  ticks: { x: Tick[]; y: Tick[] };
  axisTitles: { x: string; y: string };
  /** Full chainage range of the route, m. */
  chainageRange: [number, number];
  /** Elevation range shown, m (pass back as elevationWindow to hold the scale still). */
  elevationRange: [number, number];
}
