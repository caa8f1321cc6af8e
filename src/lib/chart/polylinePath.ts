/**
 * SVG path data for a polyline in screen coordinates, with the vertices that add nothing left
 * out: a vertex lying on the straight segment between the last vertex kept and the next one
 * (within `tolerance` pixels) is dropped. Along a pipe the profile's grade lines are straight
 * between stations, so a long route draws a few points per pipe instead of every station; a
 * dropped vertex was within `tolerance` of the segment that replaced it when it was dropped
 * (exactly collinear stations, the usual case, stay exactly on the line).
 *
 * Points with a non-finite coordinate break the line, as d3's line().defined() does; a run of
 * one point is drawn as "Mx,yZ" (also as d3 does). Coordinates are written to 3 decimals.
 */

const round = (v: number) => Math.round(v * 1000) / 1000;

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
      const last = j === end;
      if (!last && offSegment(xs[kept], ys[kept], xs[j + 1], ys[j + 1], xs[j], ys[j]) <= tolerance)
        continue;
      d += `L${round(xs[j])},${round(ys[j])}`;
      kept = j;
    }
    i = end + 1;
  }
  return d;
}
