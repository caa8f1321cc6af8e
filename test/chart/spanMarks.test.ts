import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { drawnWidth } from '../../src/lib/chart/profileAnnotations';
import { profileGeometry } from '../../src/lib/chart/profileChart';
import { markedSpans } from '../../src/lib/chart/markedSpans';
import { MIN_SPAN_PX } from '../../src/lib/chart/profileStyle';
import { parseProjectFile } from '../../src/lib/model/file';
import { profile } from '../../src/lib/solver/profile';
import { solve } from '../../src/lib/solver/solve';

function demoAt(celsius: number) {
  const parsed = parseProjectFile(
    readFileSync('static/examples/pump-over-rack.headroute.json', 'utf8'),
  );
  if (!parsed.ok) throw new Error('demo 1 does not parse');
  const base = parsed.document;
  return { ...base, settings: { ...base.settings, temperature: 273.15 + celsius } };
}

describe('marked spans are drawn so they cannot be missed', () => {
  it('a narrow span is widened about its centre; a wide one keeps its ends', () => {
    expect(drawnWidth(100, 102)).toEqual({
      drawX0: 101 - MIN_SPAN_PX / 2,
      drawX1: 101 + MIN_SPAN_PX / 2,
    });
    expect(drawnWidth(100, 150)).toEqual({ drawX0: 100, drawX1: 150 });
  });

  it('demo 1 at 91.4 °C: a ~2 m vapour span, drawn over the vacuum span, marker at its minimum', () => {
    const doc = demoAt(91.4);
    const result = solve(doc);
    const p = profile(doc, result, doc.routes.R1.nodes);
    const vapour = markedSpans(p.stations).filter((s) => s.kind === 'vapour');
    // The span the browser test relies on: 1.5–3 m long on the ~105 m route.
    expect(vapour).toHaveLength(1);
    expect(vapour[0].end - vapour[0].start).toBeGreaterThan(1.5);
    expect(vapour[0].end - vapour[0].start).toBeLessThan(3);
    const g = profileGeometry(p, { width: 300, height: 200 }, { system: 'SI', nodes: doc.nodes });
    const drawn = g.spans.find((s) => s.kind === 'vapour')!;
    expect(drawn.drawX1 - drawn.drawX0).toBeGreaterThanOrEqual(MIN_SPAN_PX - 1e-9);
    expect(drawn.markX).toBeCloseTo(g.x(drawn.minChainage), 9);
    expect(drawn.markX).toBeGreaterThanOrEqual(drawn.x0 - 1e-9);
    expect(drawn.markX).toBeLessThanOrEqual(drawn.x1 + 1e-9);
    // vacuum spans first, so the vapour span is painted over them
    const levels = g.spans.map((s) => s.level);
    expect(levels.lastIndexOf('caution')).toBeLessThan(levels.indexOf('stop'));
  });
});
