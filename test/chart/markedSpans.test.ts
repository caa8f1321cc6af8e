import { describe, expect, it } from 'vitest';
import { crossing, markedSpans } from '../../src/lib/chart/markedSpans';
import { demoProfile, P_ATM, P_VAPOUR, RHO_G, station } from './fixtures';

// Vapour-line offset (p_v − p_atm)/ρg for the fixture liquid: DESIGN.md's definition.
const VAPOUR_OFFSET = (P_VAPOUR - P_ATM) / RHO_G;

describe('markedSpans', () => {
  it('finds a stop span that begins and ends between stations, by interpolation', () => {
    const spans = markedSpans(demoProfile().stations);
    const stop = spans.filter((s) => s.kind === 'vapour');
    expect(stop).toHaveLength(1);
    const [span] = stop;
    expect(span.level).toBe('stop');
    // Along P2 (chainage 20 → 120) the HGL runs 34.5 → 20 and the vapour line 0.5+o → 30+o.
    // They meet where 34.5 − 14.5 t = 0.5 + o + 29.5 t, i.e. t = (34 − o)/44.
    const tStart = (34 - VAPOUR_OFFSET) / 44;
    expect(span.start).toBeCloseTo(20 + 100 * tStart, 9);
    // Along P3 (120 → 220): HGL 20 → 9, vapour line 30+o → 8+o; meet at t = (10 + o)/11.
    const tEnd = (10 + VAPOUR_OFFSET) / 11;
    expect(span.end).toBeCloseTo(120 + 100 * tEnd, 9);
    // The span's ends are not stations.
    const chainages = demoProfile().stations.map((s) => s.chainage);
    expect(chainages).not.toContain(span.start);
    expect(chainages).not.toContain(span.end);
    // Smallest margin at the high point: HGL 20 against vapour line 30 + o.
    expect(span.minChainage).toBe(120);
    expect(span.minMargin).toBeCloseTo(20 - (30 + VAPOUR_OFFSET), 9);
    expect(span.minMarginPa).toBeCloseTo(RHO_G * (20 - 30) + P_ATM - P_VAPOUR, 6);
    expect(span.elements).toEqual(['P2', 'P3']);
  });

  it('finds the caution span where the HGL is under the pipe (vacuum)', () => {
    const caution = markedSpans(demoProfile().stations).filter((s) => s.kind === 'vacuum');
    expect(caution).toHaveLength(1);
    const [span] = caution;
    expect(span.level).toBe('caution');
    // HGL − z along P2: 34 → −10, zero at t = 34/44; along P3: −10 → 1, zero at t = 10/11.
    expect(span.start).toBeCloseTo(20 + (100 * 34) / 44, 9);
    expect(span.end).toBeCloseTo(120 + (100 * 10) / 11, 9);
    expect(span.minMargin).toBeCloseTo(-10, 9);
    expect(span.minMarginPa).toBeCloseTo(-10 * RHO_G, 6);
    expect(span.minChainage).toBe(120);
  });

  it('ignores vessel liquid surfaces and marks nothing on a healthy line', () => {
    const healthy = [
      station(0, 5, 5, 'T1', 'level'),
      station(0, 1, 4.8, 'T1', 'node-out'),
      station(50, 1, 4.0),
      station(50, 1, 4.0, 'T2', 'node-in'),
      // A closed vessel under vacuum: its surface is not the pipe.
      station(50, 3, 1, 'T2', 'level'),
    ];
    expect(markedSpans(healthy)).toEqual([]);
  });

  it('starts a span at the chainage of a step when the HGL drops through the line at a node', () => {
    const stations = [
      station(0, 0, 5, 'P1'),
      station(10, 0, 4, 'P1'),
      station(10, 0, 4, 'RO', 'node-in'),
      station(10, 0, -2, 'RO', 'node-out'),
      station(10, 0, -2, 'P2'),
      station(30, 0, -1, 'P2'),
      station(40, 0, 1, 'P2'),
    ];
    const [vacuum] = markedSpans(stations).filter((s) => s.kind === 'vacuum');
    expect(vacuum.start).toBe(10);
    // −1 at 30 → 1 at 40: zero halfway.
    expect(vacuum.end).toBeCloseTo(35, 12);
    expect(vacuum.elements).toEqual(['RO', 'P2']);
    expect(vacuum.minMargin).toBeCloseTo(-2, 12);
  });

  it('closes a span at a gap (non-finite HGL) and reopens after it', () => {
    const stations = [
      station(0, 0, -1),
      station(10, 0, -1),
      { ...station(20, 0, 0), hgl: Number.NaN },
      station(30, 0, -1),
      station(40, 0, 1),
    ];
    const vacuum = markedSpans(stations).filter((s) => s.kind === 'vacuum');
    expect(vacuum.map((s) => [s.start, s.end])).toEqual([
      [0, 10],
      [30, 35],
    ]);
  });

  it('keeps a span open to the end of the route', () => {
    const vacuum = markedSpans([station(0, 0, 1), station(10, 0, -1)]).filter(
      (s) => s.kind === 'vacuum',
    );
    expect(vacuum).toHaveLength(1);
    expect(vacuum[0].start).toBeCloseTo(5, 12);
    expect(vacuum[0].end).toBe(10);
  });
});

describe('crossing', () => {
  it('interpolates linearly and puts a vertical step at its own chainage', () => {
    expect(crossing(0, 3, 10, -1)).toBeCloseTo(7.5, 12);
    expect(crossing(4, 3, 4, -1)).toBe(4);
  });
});
