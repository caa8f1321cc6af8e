import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { MAX_SKIPPED, polylinePath } from '../../src/lib/chart/polylinePath';

/** Vertices of "Mx,yLx,y…" path data, one array per sub-path. */
function vertices(d: string): Array<Array<[number, number]>> {
  return d
    .split('M')
    .filter(Boolean)
    .map((part) =>
      part
        .replace('Z', '')
        .split('L')
        .map((p) => p.split(',').map(Number) as [number, number]),
    );
}

/** Distance from a point to a polyline. */
function distanceTo(poly: Array<[number, number]>, [px, py]: [number, number]): number {
  if (poly.length === 1) return Math.hypot(px - poly[0][0], py - poly[0][1]);
  let best = Infinity;
  for (let k = 1; k < poly.length; k++) {
    const [ax, ay] = poly[k - 1];
    const [bx, by] = poly[k];
    const dx = bx - ax;
    const dy = by - ay;
    const len2 = dx * dx + dy * dy;
    const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / len2));
    best = Math.min(best, Math.hypot(px - (ax + t * dx), py - (ay + t * dy)));
  }
  return best;
}

describe('polylinePath', () => {
  it('drops the interior points of a straight run and keeps the corners', () => {
    const xs = [0, 10, 20, 30, 30, 40, 50];
    const ys = [0, 5, 10, 15, 40, 40, 40];
    expect(polylinePath(xs, ys)).toBe('M0,0L30,15L30,40L50,40');
  });

  it('keeps every vertex with a tolerance of 0 unless exactly on the line', () => {
    expect(polylinePath([0, 1, 2], [0, 1.5, 2], 0)).toBe('M0,0L1,1.5L2,2');
  });

  it('keeps a spike that doubles back along the same line', () => {
    expect(polylinePath([0, 10, 5], [0, 0, 0])).toBe('M0,0L10,0L5,0');
  });

  it('breaks the line at non-finite points; a lone point is a closed dot', () => {
    expect(polylinePath([0, 1, 2, 3, NaN, 5], [0, 1, 2, NaN, 0, 5])).toBe('M0,0L2,2M5,5Z');
    expect(polylinePath([], [])).toBe('');
  });

  it('skipped vertices cannot drift past the tolerance on a slow curve', () => {
    // A gentle arc: each point is within 0.05 of the chord to its next neighbour, but far
    // from a chord across many of them.
    const xs = Array.from({ length: 200 }, (_, k) => k);
    const ys = xs.map((x) => 0.0004 * x * x);
    const [poly] = vertices(polylinePath(xs, ys));
    for (let k = 0; k < xs.length; k++)
      expect(distanceTo(poly, [xs[k], ys[k]])).toBeLessThanOrEqual(0.05 + 1e-3);
  });

  it('one drawn segment skips at most MAX_SKIPPED collinear points', () => {
    const xs = Array.from({ length: 1000 }, (_, k) => k);
    const [poly] = vertices(polylinePath(xs, xs));
    expect(poly.length).toBe(1 + Math.ceil(999 / (MAX_SKIPPED + 1)));
    for (let k = 1; k < poly.length; k++)
      expect(poly[k][0] - poly[k - 1][0]).toBeLessThanOrEqual(MAX_SKIPPED + 1);
  });

  it('every input point lies on the drawn line within the tolerance (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: 0, max: 800 }), fc.integer({ min: 0, max: 400 })), {
          minLength: 1,
          maxLength: 60,
        }),
        fc.boolean(),
        (points, straightRuns) => {
          // Optionally interleave collinear midpoints, as a pipe's interior stations are.
          const pts: Array<[number, number]> = [];
          points.forEach((p, k) => {
            if (straightRuns && k > 0) {
              const q = points[k - 1];
              pts.push([(p[0] + q[0]) / 2, (p[1] + q[1]) / 2]);
            }
            pts.push(p);
          });
          const [poly] = vertices(
            polylinePath(
              pts.map((p) => p[0]),
              pts.map((p) => p[1]),
            ),
          );
          // Every skipped point is within 0.05 px of the segment drawn; rounding adds 1e-3.
          for (const p of pts) expect(distanceTo(poly, p)).toBeLessThanOrEqual(0.05 + 1e-3);
          expect(poly[0]).toEqual(pts[0]);
          expect(poly[poly.length - 1]).toEqual(pts[pts.length - 1]);
        },
      ),
      // Fixed seed; FC_SEED and FC_RUNS run others (fast-check prints the seed on failure).
      { seed: Number(process.env.FC_SEED ?? 13_2026), numRuns: Number(process.env.FC_RUNS ?? 300) },
    );
  });
});
