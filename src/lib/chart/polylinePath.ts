/**
 * SVG path data for a polyline in screen coordinates, with the vertices that add nothing left
 * out. A drawn segment runs from the last vertex kept to a later one only while every vertex
 * it skips lies within `tolerance` pixels of it (checked against that segment, not only the
 * segment in place when the vertex was first skipped, so small offsets cannot add up past the
 * tolerance). Along a pipe the profile's grade lines are straight between stations, so a long
 * route draws a few points per pipe instead of every station.
 *
 * The work is bounded: one segment skips at most MAX_SKIPPED vertices, so a run of n points
 * costs at most n × MAX_SKIPPED distance checks.
 *
 * Points with a non-finite coordinate break the line, as d3's line().defined() does; a run of
 * one point is drawn as "Mx,yZ" (also as d3 does). Coordinates are written to 3 decimals.
 */

const round = (v: number) => Math.round(v * 1000) / 1000;

/** Most vertices one drawn segment may skip (bounds the checks per vertex). */
export const MAX_SKIPPED = 64;

/** Distance of (px, py) from the segment (ax, ay)–(bx, by) when it projects inside it, else ∞. */
function offSegment(
  ax: number,
  ay: number,
  bx: number,
  by: number,
  px: number,
  py: number,
): number {
  const dx = bx - ax;
  const dy = by - ay;
  const len2 = dx * dx + dy * dy;
  if (len2 === 0) return px === ax && py === ay ? 0 : Infinity;
  const t = ((px - ax) * dx + (py - ay) * dy) / len2;
  if (t < 0 || t > 1) return Infinity; // a spike back along the line is kept
  return Math.abs(dx * (py - ay) - dy * (px - ax)) / Math.sqrt(len2);
}

/** Every vertex strictly between `from` and `to` lies within `tolerance` of that segment. */
function skippable(
  xs: ArrayLike<number>,
  ys: ArrayLike<number>,
  from: number,
  to: number,
  tolerance: number,
): boolean {
  for (let k = to - 1; k > from; k--)
    if (offSegment(xs[from], ys[from], xs[to], ys[to], xs[k], ys[k]) > tolerance) return false;
  return true;
}

/**
 * Path data through the points (xs[i], ys[i]). `tolerance` is in the same units (pixels);
 * 0 keeps every vertex.
 */
export function polylinePath(
  xs: ArrayLike<number>,
  ys: ArrayLike<number>,
  tolerance = 0.05,
): string {
  const n = Math.min(xs.length, ys.length);
  const ok = (i: number) => Number.isFinite(xs[i]) && Number.isFinite(ys[i]);
  let d = '';
  let i = 0;
  while (i < n) {
    if (!ok(i)) {
      i++;
      continue;
    }
    let end = i; // the run of finite points is i..end
    while (end + 1 < n && ok(end + 1)) end++;
    d += `M${round(xs[i])},${round(ys[i])}`;
    if (end === i) d += 'Z';
    let kept = i;
    for (let j = i + 1; j <= end; j++) {
      if (j < end && j - kept <= MAX_SKIPPED && skippable(xs, ys, kept, j + 1, tolerance)) continue;
      d += `L${round(xs[j])},${round(ys[j])}`;
      kept = j;
    }
    i = end + 1;
  }
  return d;
}
