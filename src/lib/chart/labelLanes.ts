/**
 * Collision-avoiding placement of text labels along one axis: each label wants to sit centred
 * on its anchor; labels that would overlap go to the next lane (row). Greedy, in anchor order,
 * which keeps labels near their anchors and is stable as the chart pans.
 */

/** A label to place: where it points to and how wide its text is, in pixels. */
export interface LaneRequest {
  anchor: number;
  width: number;
}

/** Where a label ended up: its left edge, its centre and its lane (0 is nearest the axis). */
export interface LanePlacement {
  left: number;
  centre: number;
  lane: number;
}

/** Rough advance width of proportional text, as a fraction of the font size (common practice). */
const AVERAGE_CHAR_WIDTH = 0.58;

/** Width in pixels of a line of text in a proportional font, estimated without a DOM. */
export function estimateTextWidth(text: string, fontSize: number): number {
  return text.length * fontSize * AVERAGE_CHAR_WIDTH;
}

/**
 * Places labels in lanes so no two in the same lane overlap (with `gap` pixels between them),
 * keeping each inside [min, max] where it fits. Results are in the order of the requests.
 * Labels that would need more than `maxLanes` lanes share the last lane.
 */
export function placeInLanes(
  requests: readonly LaneRequest[],
  bounds: { min: number; max: number },
  gap = 6,
  maxLanes = 4,
): LanePlacement[] {
  const order = requests.map((_, i) => i).sort((a, b) => requests[a].anchor - requests[b].anchor);
  const laneEnds: number[] = [];
  const placed: LanePlacement[] = new Array(requests.length);
  for (const i of order) {
    const { anchor, width } = requests[i];
    let left = anchor - width / 2;
    if (left + width > bounds.max) left = bounds.max - width;
    if (left < bounds.min) left = bounds.min;
    let lane = laneEnds.findIndex((end) => end + gap <= left);
    if (lane < 0) {
      if (laneEnds.length < maxLanes) {
        lane = laneEnds.length;
      } else {
        // Every lane is taken: use the one that frees up soonest and push the label right.
        lane = laneEnds.indexOf(Math.min(...laneEnds));
        left = Math.max(left, laneEnds[lane] + gap);
      }
    }
    laneEnds[lane] = left + width;
    placed[i] = { left, centre: left + width / 2, lane };
  }
  return placed;
}
