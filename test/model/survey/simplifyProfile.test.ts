import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { SurveyPoint } from '../../../src/lib/model/survey/parseSurvey';
import { simplifyProfile } from '../../../src/lib/model/survey/simplifyProfile';

const SEED = Number(process.env.FC_SEED ?? 20261202);

/** Vertical distance from point k to the polyline through the kept points. */
function offset(points: SurveyPoint[], kept: number[], k: number): number {
  const j = kept.findIndex((i) => i >= k);
  if (kept[j] === k) return 0;
  const p = points[kept[j - 1]];
  const q = points[kept[j]];
  const line =
    p.elevation +
    ((q.elevation - p.elevation) * (points[k].chainage - p.chainage)) / (q.chainage - p.chainage);
  return Math.abs(points[k].elevation - line);
}

/** True when point k is a local high or low (or an end of a level high or low). */
function isExtreme(points: SurveyPoint[], k: number): boolean {
  if (k === 0 || k === points.length - 1) return true;
  let a = k;
  let b = k;
  while (a > 0 && points[a - 1].elevation === points[k].elevation) a--;
  while (b < points.length - 1 && points[b + 1].elevation === points[k].elevation) b++;
  if (a === 0 || b === points.length - 1) return false;
  if (k !== a && k !== b) return false;
  const z = points[k].elevation;
  const before = points[a - 1].elevation;
  const after = points[b + 1].elevation;
  return (z > before && z > after) || (z < before && z < after);
}

const profiles = fc
  .array(
    fc.tuple(fc.double({ min: 0.01, max: 50, noNaN: true }), fc.integer({ min: -400, max: 400 })),
    {
      minLength: 2,
      maxLength: 300,
    },
  )
  .map((steps) => {
    let chainage = 0;
    return steps.map(([dc, z]) => ({ chainage: (chainage += dc), elevation: z / 20 }));
  });

describe('simplifyProfile', () => {
  it('keeps every high and low point and stays within the tolerance of every point', () => {
    fc.assert(
      fc.property(profiles, fc.double({ min: 0, max: 2, noNaN: true }), (points, tolerance) => {
        const kept = simplifyProfile(points, tolerance);
        expect(kept[0]).toBe(0);
        expect(kept[kept.length - 1]).toBe(points.length - 1);
        for (let i = 1; i < kept.length; i++) expect(kept[i]).toBeGreaterThan(kept[i - 1]);
        const keptSet = new Set(kept);
        for (let k = 0; k < points.length; k++) {
          if (isExtreme(points, k)) expect(keptSet.has(k), `extreme ${k}`).toBe(true);
          expect(offset(points, kept, k)).toBeLessThanOrEqual(tolerance + 1e-9);
        }
      }),
      { seed: SEED, numRuns: 300 },
    );
  });

  it('thins a smooth 5,000-point survey to a few points and keeps its crest exactly', () => {
    const points = Array.from({ length: 5000 }, (_, i) => ({
      chainage: i * 0.2,
      elevation: 10 + 8 * Math.sin((i / 4999) * Math.PI),
    }));
    const kept = simplifyProfile(points, 0.05);
    expect(kept).toContain(2499);
    expect(kept).toContain(2500); // the level crest pair (sin is symmetric about 2499.5)
    expect(kept.length).toBeLessThan(60);
  });
});
