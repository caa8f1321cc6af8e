import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseProjectFile } from '../../src/lib/model/file';
import type { HeadrouteDocument, Pump } from '../../src/lib/model/types';
import { solve } from '../../src/lib/solver/solve';
import {
  chartFlowMax,
  flowSteps,
  pumpCurve,
  systemCurve,
  withDutyFlow,
} from '../../src/lib/ui/details/pumpCurves';

function demo(): HeadrouteDocument {
  const parsed = parseProjectFile(
    readFileSync('static/examples/pump-over-rack.headroute.json', 'utf8'),
  );
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
  return parsed.document;
}

function firstPump(doc: HeadrouteDocument): Pump {
  return Object.values(doc.nodes).find((n): n is Pump => n.kind === 'pump')!;
}

describe('pump chart curves', () => {
  it('flowSteps spans 0 to max evenly', () => {
    expect(flowSteps(1, 4)).toEqual([0, 0.25, 0.5, 0.75, 1]);
  });

  it('chart flow range reaches beyond the last curve point and the operating flow', () => {
    const pump = firstPump(demo());
    const last = Math.max(...pump.headCurve.map((p) => p.flow));
    expect(chartFlowMax(pump, null)).toBeCloseTo(1.2 * last, 12);
    expect(chartFlowMax(pump, 2 * last)).toBeCloseTo(2.4 * last, 12);
  });

  it('the pump curve at rated speed passes close to the typed points', () => {
    const pump = { ...firstPump(demo()) };
    pump.speed = pump.ratedSpeed;
    const pts = pumpCurve(
      pump,
      pump.headCurve.map((p) => p.flow),
    );
    // a least-squares quadratic through the points: within 2 % of each typed head
    pts.forEach((p, i) => {
      expect(Math.abs(p.head - pump.headCurve[i].value)).toBeLessThan(
        0.02 * pump.headCurve[i].value,
      );
    });
  });

  it('withDutyFlow leaves the document untouched', () => {
    const doc = demo();
    const pump = firstPump(doc);
    const copy = withDutyFlow(doc, pump.id, 0.001);
    expect(doc.nodes[pump.id]).toBe(pump);
    expect((copy.nodes[pump.id] as Pump).mode).toBe('duty');
    expect((copy.nodes[pump.id] as Pump).dutyFlow).toBe(0.001);
  });

  it('the system curve meets the pump curve at the solved operating point (invariant)', () => {
    const doc = demo();
    const pump = firstPump(doc);
    const rated = solve(doc);
    const op = rated.pumps[pump.id];
    const [atOp] = systemCurve(doc, pump.id, [op.flow], solve);
    // the head the system asks at the operating flow is the head the pump gives there
    expect(Math.abs(atOp.head - op.head)).toBeLessThan(1e-3 * op.head);
    // and it rises with flow
    const curve = systemCurve(doc, pump.id, flowSteps(op.flow * 1.5, 6), solve);
    expect(curve.length).toBeGreaterThan(4);
    for (let i = 1; i < curve.length; i++) expect(curve[i].head).toBeGreaterThan(curve[i - 1].head);
  });
});
