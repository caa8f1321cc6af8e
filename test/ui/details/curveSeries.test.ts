import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseProjectFile } from '../../../src/lib/model/file';
import type { HeadrouteDocument, Pump } from '../../../src/lib/model/types';
import { curveSeries, flowSteps } from '../../../src/lib/ui/details/pumpCurves';

function demoPump(): Pump {
  const parsed = parseProjectFile(
    readFileSync('static/examples/pump-over-rack.headroute.json', 'utf8'),
  );
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  const doc: HeadrouteDocument = parsed.document;
  return Object.values(doc.nodes).find((n): n is Pump => n.kind === 'pump')!;
}

describe('pump chart: each curve of its own, extrapolation split off', () => {
  it('head, NPSHr and efficiency give different curves, each through its own points', () => {
    const pump = { ...demoPump(), speed: demoPump().ratedSpeed };
    const last = Math.max(...pump.headCurve.map((p) => p.flow));
    const flows = flowSteps(1.2 * last, 24);
    const head = curveSeries(pump, 'head', flows);
    const npshr = curveSeries(pump, 'npshr', flows);
    const eff = curveSeries(pump, 'efficiency', flows);
    // Each series' given points are the pump's own points of that curve (rated speed).
    expect(head.points.map((p) => p.value)).toEqual(pump.headCurve.map((p) => p.value));
    expect(npshr.points.map((p) => p.value)).toEqual(pump.npshrCurve.map((p) => p.value));
    expect(eff.points.map((p) => p.value)).toEqual(pump.efficiencyCurve.map((p) => p.value));
    // The three curves differ at mid flow (the chart once drew the head curve for every tab).
    const mid = (s: typeof head) => s.within[Math.floor(s.within.length / 2)].value;
    expect(mid(head)).not.toBeCloseTo(mid(npshr), 3);
    expect(mid(npshr)).not.toBeCloseTo(mid(eff), 3);
    expect(mid(eff)).toBeLessThanOrEqual(1);
  });

  it('flows beyond the last given point fall in the extrapolated piece, joined at that point', () => {
    const pump = { ...demoPump(), speed: demoPump().ratedSpeed };
    const last = Math.max(...pump.headCurve.map((p) => p.flow));
    const s = curveSeries(pump, 'head', flowSteps(1.2 * last, 24));
    expect(s.lastFlow).toBeCloseTo(last, 12);
    expect(s.beyond.length).toBeGreaterThan(1);
    expect(s.beyond.every((p) => p.flow >= last - 1e-15)).toBe(true);
    expect(s.within.every((p) => p.flow <= last + 1e-15)).toBe(true);
    expect(s.beyond[0].flow).toBe(s.within[s.within.length - 1].flow);
    expect(s.beyond[0].value).toBe(s.within[s.within.length - 1].value);
  });

  it('at reduced speed the points and the split move by the affinity laws (Q ∝ N, H ∝ N²)', () => {
    const base = demoPump();
    const pump = { ...base, speed: base.ratedSpeed * 0.8 };
    const last = Math.max(...pump.headCurve.map((p) => p.flow));
    const s = curveSeries(pump, 'head', flowSteps(last, 10));
    expect(s.lastFlow).toBeCloseTo(0.8 * last, 12);
    expect(s.points[0].value).toBeCloseTo(0.64 * pump.headCurve[0].value, 9);
  });

  it('a curve with no points draws nothing', () => {
    const pump = { ...demoPump(), npshrCurve: [] };
    const s = curveSeries(pump, 'npshr', flowSteps(0.01, 4));
    expect(s.within).toEqual([]);
    expect(s.beyond).toEqual([]);
    expect(s.lastFlow).toBeNull();
  });
});
