/**
 * Collision-avoiding placement of text labels along one axis: each label wants to sit centred
 * on its anchor; labels that would overlap go to the next lane (row). Greedy, in priority and
 * then anchor order, which keeps labels near their anchors and is stable as the chart pans.
 */

/** A label to place: where it points to and how wide its text is, in pixels. */
export interface LaneRequest {
  anchor: number;
  width: number;
  /** Lower places first (and so wins a crowded spot); 0 when absent. */
  priority?: number;
}

/** Where a label ended up: its left edge, its centre and its lane (0 is nearest the axis). */
export interface LanePlacement {
  left: number;
  centre: number;
  lane: number;
}

/** What to do with a label that fits in no lane: push it into the last lane, or leave it out. */
export type LaneOverflow = 'push' | 'drop';

/** Rough advance width of proportional text, as a fraction of the font size (common practice). */
const AVERAGE_CHAR_WIDTH = 0.58;

/** Width in pixels of a line of text in a proportional font, estimated without a DOM. */
export function estimateTextWidth(text: string, fontSize: number): number {
  return text.length * fontSize * AVERAGE_CHAR_WIDTH;
}

/**
 * Places labels in lanes so no two in the same lane overlap (with `gap` pixels between them),
 * keeping each inside [min, max] where it fits. Results are in the order of the requests.
 * A label that fits in none of `maxLanes` lanes is pushed into the last lane (overlapping) or,
 * with overflow 'drop', left out (null).
 */
export function placeInLanes(
  requests: readonly LaneRequest[],
  bounds: { min: number; max: number },
  gap?: number,
  maxLanes?: number,
  overflow?: 'push',
): LanePlacement[];
export function placeInLanes(
  requests: readonly LaneRequest[],
  bounds: { min: number; max: number },
  gap: number,
  maxLanes: number,
  overflow: LaneOverflow,
): Array<LanePlacement | null>;
export function placeInLanes(
  requests: readonly LaneRequest[],
  bounds: { min: number; max: number },
  gap = 6,
  maxLanes = 4,
  overflow: LaneOverflow = 'push',
): Array<LanePlacement | null> {
  const order = requests
    .map((_, i) => i)
    .sort(
      (a, b) =>
        (requests[a].priority ?? 0) - (requests[b].priority ?? 0) ||
        requests[a].anchor - requests[b].anchor,
    );
  const lanes: Array<Array<[number, number]>> = [];
  const placed: Array<LanePlacement | null> = new Array(requests.length).fill(null);
  for (const i of order) {
    const { anchor, width } = requests[i];
    let left = anchor - width / 2;
    if (left + width > bounds.max) left = bounds.max - width;
    if (left < bounds.min) left = bounds.min;
    const right = left + width;
    const free = (lane: Array<[number, number]>) =>
      lane.every(([a, b]) => right + gap <= a || left >= b + gap);
    let lane = lanes.findIndex(free);
    if (lane < 0 && lanes.length < maxLanes) {
      lanes.push([]);
      lane = lanes.length - 1;
    }
    if (lane < 0) {
      if (overflow === 'drop') continue;
      lane = lanes.length - 1;
    }
    lanes[lane].push([left, right]);
    placed[i] = { left, centre: left + width / 2, lane };
  }
  return placed;
}
