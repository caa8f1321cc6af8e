/**
 * Where the profile's words go: the pump NPSH note in a gap no grade line crosses, and the
 * notes above the plot (the case envelope's) in lanes of their own over the span labels.
 * Geometry only; the stations are the hand-made fixtures (no physics is checked here).
 */
import { describe, expect, it } from 'vitest';
import { profileGeometry } from '../../src/lib/chart/profileChart';
import { demoDocument, demoProfile, demoResult } from './fixtures';

const SIZES = [
  { width: 800, height: 400 },
  { width: 900, height: 260 },
  { width: 1400, height: 500 },
];

/** Pixel y of each line's value at the stations whose x lies in [x0, x1]. */
function lineYs(g: ReturnType<typeof profileGeometry>, x0: number, x1: number): number[] {
  const out: number[] = [];
  for (const s of demoProfile().stations) {
    const px = g.x(s.chainage);
    if (px < x0 || px > x1) continue;
    for (const v of [s.elevation, s.hgl, s.egl, s.vapourLine])
      if (Number.isFinite(v)) out.push(g.y(v));
  }
  return out;
}

describe('NPSH note placement', () => {
  for (const size of SIZES) {
    it(`no line crosses the note's two lines of text (${size.width}×${size.height})`, () => {
      const g = profileGeometry(demoProfile(), size, {
        system: 'SI',
        nodes: demoDocument().nodes,
        pumps: demoResult().pumps,
      });
      expect(g.npsh).toHaveLength(1);
      const n = g.npsh[0];
      // Text block: about 10 px above the first baseline to about 17 px below it (two lines).
      const width = 6.4 * Math.max(n.lines[0].length, n.lines[1].length);
      for (const y of lineYs(g, n.x, n.x + width)) {
        expect(y < n.y - 10 || y > n.y + 17, `line at y=${y} vs note at ${n.y}`).toBe(true);
      }
      expect(n.y - 10).toBeGreaterThanOrEqual(g.plot.top);
      expect(n.y + 17).toBeLessThanOrEqual(g.plot.top + g.plot.height);
    });
  }
});

describe('notes above the plot', () => {
  it('sit above the span labels and push the plot down by their lanes', () => {
    const base = profileGeometry(demoProfile(), { width: 800, height: 400 }, { system: 'SI' });
    const g = profileGeometry(
      demoProfile(),
      { width: 800, height: 400 },
      {
        system: 'SI',
        topNotes: [
          { key: 'a', text: 'worst: Hot day', start: 100, end: 130 },
          { key: 'b', text: 'least NPSH margin: Low level', start: 105 },
        ],
      },
    );
    // The two notes overlap in x, so they take two lanes.
    expect(g.topNotes.map((n) => n.lane).sort()).toEqual([0, 1]);
    const lineHeight = 11 * 1.25;
    expect(g.plot.top).toBeCloseTo(base.plot.top + 2 * lineHeight, 9);
    const spanTop = Math.min(g.plot.top, ...g.spans.map((s) => s.labelY));
    for (const n of g.topNotes) {
      expect(n.y).toBeLessThan(spanTop);
      expect(n.y - 11).toBeGreaterThanOrEqual(0);
    }
    const a = g.topNotes.find((n) => n.key === 'a')!;
    expect(a.x0).toBeCloseTo(g.x(100), 9);
    expect(a.x1).toBeCloseTo(g.x(130), 9);
  });

  it('leaves out notes outside the chainage window', () => {
    const g = profileGeometry(
      demoProfile(),
      { width: 800, height: 400 },
      {
        system: 'SI',
        chainageWindow: [0, 50],
        topNotes: [{ key: 'far', text: 'worst: Hot day', start: 150, end: 160 }],
      },
    );
    expect(g.topNotes).toHaveLength(0);
  });
});
