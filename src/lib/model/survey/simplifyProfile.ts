/**
 * Thinning a surveyed profile before it becomes waypoints: every local high and low point is
 * kept exactly (high points are where vapour pockets form and the pressure is lowest; low
 * points where a line drains and the pressure is highest), and between two of them a point is
 * dropped only while the straight line between the kept points stays within a vertical
 * tolerance of every dropped point (Douglas–Peucker on the vertical offset: Douglas and
 * Peucker, Cartographica 10(2), 1973).
 */
import type { SurveyPoint } from './parseSurvey';

/** Default vertical tolerance of the thinning, m (the order of a survey's own precision). */
export const DEFAULT_SURVEY_TOLERANCE = 0.05;

/**
 * Indices of the points to keep, ascending: the first and last, every local extreme (each end
 * of a level stretch that is a high or low), and enough others that the profile drawn through
 * the kept points is within `tolerance` metres vertically of every point. Linear in the number
 * of points for a smooth profile; at worst quadratic within one monotone stretch.
 */
export function simplifyProfile(points: readonly SurveyPoint[], tolerance: number): number[] {
  const n = points.length;
  if (n <= 2) return points.map((_, i) => i);
  const keep = new Uint8Array(n);
  keep[0] = keep[n - 1] = 1;
  for (const i of extremes(points)) keep[i] = 1;
  // Between two kept points the profile is monotone; thin it by Douglas–Peucker.
  let start = 0;
  for (let i = 1; i < n; i++) {
    if (!keep[i]) continue;
    thin(points, start, i, tolerance, keep);
    start = i;
  }
  const kept: number[] = [];
  for (let i = 0; i < n; i++) if (keep[i]) kept.push(i);
  return kept;
}

/** Local highs and lows; on a level stretch that is a high or low, both its ends. */
function extremes(points: readonly SurveyPoint[]): number[] {
  const out: number[] = [];
  const n = points.length;
  let i = 1;
  while (i < n - 1) {
    // A level stretch i..j (equal elevations), bounded by i-1 before and j+1 after.
    let j = i;
    while (j + 1 < n - 1 && points[j + 1].elevation === points[i].elevation) j++;
    const before = points[i - 1].elevation;
    const after = points[j + 1].elevation;
    const here = points[i].elevation;
    if ((here > before && here > after) || (here < before && here < after)) {
      out.push(i);
      if (j !== i) out.push(j);
    }
    i = j + 1;
  }
  return out;
}

/** Douglas–Peucker between kept points a and b on the vertical offset; marks kept points. */
function thin(
  points: readonly SurveyPoint[],
  a: number,
  b: number,
  tolerance: number,
  keep: Uint8Array,
): void {
  const stack: Array<[number, number]> = [[a, b]];
  while (stack.length > 0) {
    const [lo, hi] = stack.pop()!;
    if (hi - lo < 2) continue;
    const p = points[lo];
    const q = points[hi];
    const slope = (q.elevation - p.elevation) / (q.chainage - p.chainage);
    let worst = -1;
    let worstOffset = tolerance;
    for (let k = lo + 1; k < hi; k++) {
      const line = p.elevation + slope * (points[k].chainage - p.chainage);
      const offset = Math.abs(points[k].elevation - line);
      if (offset > worstOffset) {
        worstOffset = offset;
        worst = k;
      }
    }
    if (worst < 0) continue;
    keep[worst] = 1;
    stack.push([lo, worst], [worst, hi]);
  }
}
