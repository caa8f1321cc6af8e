/**
 * The HGL envelope across cases. Profiles are hand-made with the fixture's self-consistent
 * stations (invented round numbers, not property data); expected values are worked by hand
 * from linear interpolation between stations.
 */
import { describe, expect, it } from 'vitest';
import {
  envelopePath,
  envelopePoints,
  envelopeSpans,
  hglEnvelope,
} from '../../src/lib/chart/envelope';
import { markedSpans } from '../../src/lib/chart/markedSpans';
import type { Profile } from '../../src/lib/solver/types';
import { demoProfile, station } from './fixtures';

/** A straight pipe with HGL falling linearly: stations at the given chainages. */
function straight(chainages: number[], hgl0: number, slope: number, elevation = 0): Profile {
  return {
    route: ['A', 'P1', 'B'],
    stations: chainages.map((c) => station(c, elevation, hgl0 - slope * c)),
  };
}

describe('envelopePoints', () => {
  it('merges stations at different chainages and interpolates each case onto the grid', () => {
    const a = straight([0, 50, 100], 20, 0.1); // 20 → 10
    const b = straight([0, 30, 100], 18, 0.05); // 18 → 13
    const points = envelopePoints([
      { name: 'A', profile: a },
      { name: 'B', profile: b },
    ]);
    expect(points.map((p) => p.chainage)).toEqual([0, 30, 50, 100]);
    // At 30 m: case A interpolated between 0 and 50 → 20 − 3 = 17; case B station = 16.5.
    const at30 = points[1];
    expect(at30.high).toBeCloseTo(17, 12);
    expect(at30.highCase).toBe(0);
    expect(at30.low).toBeCloseTo(16.5, 12);
    expect(at30.lowCase).toBe(1);
    // At 50 m: A = 15 (station); B interpolated between 30 and 100 → 18 − 2.5 = 15.5.
    expect(points[2].low).toBeCloseTo(15, 12);
    expect(points[2].lowCase).toBe(0);
    expect(points[2].high).toBeCloseTo(15.5, 12);
    // At 100 m: A = 10 (lowest), B = 13.
    expect(points[3]).toMatchObject({ low: 10, high: 13, lowCase: 0, highCase: 1 });
  });

  it('keeps both sides of a step (pump) so the band steps at its chainage', () => {
    const steps: Profile = {
      route: ['T1', 'P1', 'PU', 'P2', 'T2'],
      stations: [
        station(0, 0, 5, 'P1'),
        station(10, 0, 4, 'P1'),
        station(10, 0, 4, 'PU', 'node-in'),
        station(10, 0, 34, 'PU', 'node-out'),
        station(100, 0, 20, 'P2'),
      ],
    };
    const flat = straight([0, 100], 10, 0);
    const points = envelopePoints([
      { name: 'pumped', profile: steps },
      { name: 'flat', profile: flat },
    ]);
    const at10 = points.filter((p) => p.chainage === 10);
    expect(at10).toHaveLength(2);
    // Before the pump the pumped case is lowest (4 < 10); after it, highest (34 > 10).
    expect(at10[0]).toMatchObject({ low: 4, high: 10, lowCase: 0, highCase: 1 });
    expect(at10[1]).toMatchObject({ low: 10, high: 34, lowCase: 1, highCase: 0 });
  });

  it('uses only the cases that reach a chainage, and ignores vessel-level stations', () => {
    const long = straight([0, 200], 10, 0);
    const short: Profile = {
      route: ['A'],
      stations: [station(0, 0, 30, 'T', 'level', 0), station(0, 0, 6), station(100, 0, 6)],
    };
    const points = envelopePoints([
      { name: 'long', profile: long },
      { name: 'short', profile: short },
    ]);
    expect(points.map((p) => p.chainage)).toEqual([0, 100, 200]);
    expect(points[0]).toMatchObject({ low: 6, high: 10 }); // level station (30) not used
    expect(points[2]).toMatchObject({ low: 10, high: 10, lowCase: 0, highCase: 0 });
  });

  it('is the profile itself for a single case', () => {
    const p = demoProfile();
    const points = envelopePoints([{ name: 'Base', profile: p }]);
    const line = p.stations.filter((s) => s.at !== 'level');
    for (const point of points) {
      expect(point.low).toBe(point.high);
      expect(line.some((s) => s.chainage === point.chainage && s.hgl === point.low)).toBe(true);
    }
  });
});

describe('envelopeSpans', () => {
  it('merges overlapping vapour spans and names the case with the smallest margin', () => {
    const base = demoProfile(); // dips under the vapour line over the high point
    const hot: Profile = {
      route: base.route,
      // The same line with the HGL 2 m lower along the discharge: a longer, deeper span.
      stations: base.stations.map((s) =>
        s.chainage > 20 && s.at !== 'level'
          ? station(s.chainage, s.elevation, s.hgl - 2, s.elementId, s.at)
          : s,
      ),
    };
    const cases = [
      { name: 'Base case', profile: base },
      { name: 'Hot day', profile: hot },
    ];
    const spans = envelopeSpans(cases).filter((s) => s.kind === 'vapour');
    const baseSpans = markedSpans(base.stations).filter((s) => s.kind === 'vapour');
    const hotSpans = markedSpans(hot.stations).filter((s) => s.kind === 'vapour');
    expect(baseSpans.length).toBeGreaterThan(0);
    expect(spans).toHaveLength(1);
    expect(spans[0].worstCaseName).toBe('Hot day');
    expect(spans[0].worstCase).toBe(1);
    expect(spans[0].cases).toEqual([0, 1]);
    expect(spans[0].minMargin).toBeCloseTo(hotSpans[0].minMargin, 12);
    expect(spans[0].minMargin).toBeLessThan(baseSpans[0].minMargin);
    // The union runs from the earliest start to the latest end.
    expect(spans[0].start).toBeCloseTo(Math.min(baseSpans[0].start, hotSpans[0].start), 12);
    expect(spans[0].end).toBeCloseTo(Math.max(baseSpans[0].end, hotSpans[0].end), 12);
  });

  it('keeps spans apart when they do not overlap', () => {
    // Case A under vacuum over 0–40 m, case B over 60–100 m (pipe at 10 m elevation).
    const a: Profile = {
      route: ['X'],
      stations: [station(0, 10, 8), station(40, 10, 10), station(100, 10, 14)],
    };
    const b: Profile = {
      route: ['X'],
      stations: [station(0, 10, 14), station(60, 10, 10), station(100, 10, 9)],
    };
    const spans = envelopeSpans([
      { name: 'A', profile: a },
      { name: 'B', profile: b },
    ]).filter((s) => s.kind === 'vacuum');
    expect(spans).toHaveLength(2);
    expect(spans[0]).toMatchObject({ start: 0, worstCaseName: 'A', cases: [0] });
    expect(spans[0].end).toBeCloseTo(40, 12);
    expect(spans[1]).toMatchObject({ end: 100, worstCaseName: 'B', cases: [1] });
    expect(spans[1].start).toBeCloseTo(60, 12);
  });
});

describe('envelopePath', () => {
  it('runs along the high line, back along the low line, and closes', () => {
    const env = hglEnvelope([
      { name: 'A', profile: straight([0, 100], 20, 0.1) },
      { name: 'B', profile: straight([0, 100], 18, 0.05) },
    ]);
    const path = envelopePath(
      env.points,
      (c) => c * 2,
      (h) => 100 - h,
    );
    // High: 20 at 0, 13 at 100; low: 18 at 0, 10 at 100.
    expect(path).toBe('M0 80L200 87L200 90L0 82Z');
  });

  it('is empty with no points', () => {
    expect(
      envelopePath(
        [],
        (c) => c,
        (h) => h,
      ),
    ).toBe('');
  });
});
