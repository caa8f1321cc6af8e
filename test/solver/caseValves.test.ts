/**
 * Cases that open or shut a manual valve, and branch points that take a fixed draw-off or
 * supply. A shut valve is a stiff resistance (laws.ts CLOSED_RESISTANCE): its branch carries
 * no flow to 1e-8 m³/s, continuity holds at every node and every figure stays finite.
 */
import { describe, expect, it } from 'vitest';
import { applyCase } from '../../src/lib/solver/applyCase';
import { solve } from '../../src/lib/solver/solve';
import { at, expectAllFinite, expectConservation, Sheet } from './helpers';

/** A head tank feeding two receivers through a branch point; a gate valve on branch B. */
function twoBranches(): Sheet {
  const s = new Sheet();
  s.vessel('T', 25);
  s.node('junction', 'J', { z: 0 });
  s.vessel('A', 3, { nozzleZ: 1 });
  s.vessel('B', 5, { nozzleZ: 1 });
  s.fitting('V', { fittingType: 'gate-valve', lossMethod: '2K', closed: false });
  s.pipe('main', at('T', 'N1'), at('J', 'hub'), { length: 100, diameter: 0.1 });
  s.pipe('toA', at('J', 'hub'), at('A', 'N1'), { length: 50, diameter: 0.08 });
  s.pipe('toV', at('J', 'hub'), at('V', 'in'), { length: 20, diameter: 0.08 });
  s.pipe('toB', at('V', 'out'), at('B', 'N1'), { length: 30, diameter: 0.08 });
  return s;
}

describe('a case that shuts a manual valve', () => {
  it('stops its branch; conservation holds and nothing is NaN', () => {
    const s = twoBranches();
    s.doc.cases.C1 = {
      id: 'C1',
      name: 'B isolated',
      overrides: { valves: { V: { closed: true } } },
    };
    const base = solve(s.doc);
    expect(base.pipes.toB.flow).toBeGreaterThan(0.005);
    const shut = solve(s.doc, 'C1');
    expectAllFinite(shut);
    expectConservation(applyCase(s.doc, 'C1'), shut);
    expect(Math.abs(shut.pipes.toB.flow)).toBeLessThan(1e-8);
    expect(Math.abs(shut.pipes.toV.flow)).toBeLessThan(1e-8);
    // All of the tank's flow (but the shut valve's ≤ 1e-8 m³/s) now goes to A, and more than
    // before (less head lost in `main`).
    expect(Math.abs(shut.pipes.main.flow - shut.pipes.toA.flow)).toBeLessThan(1e-8);
    expect(shut.pipes.toA.flow).toBeGreaterThan(base.pipes.toA.flow);
    // The base document is untouched.
    expect(s.doc.nodes.V.kind === 'fitting' && s.doc.nodes.V.closed).toBe(false);
  });

  it('opens a valve the base keeps shut', () => {
    const s = twoBranches();
    if (s.doc.nodes.V.kind === 'fitting') s.doc.nodes.V.closed = true;
    s.doc.cases.C1 = { id: 'C1', name: 'open', overrides: { valves: { V: { closed: false } } } };
    expect(Math.abs(solve(s.doc).pipes.toB.flow)).toBeLessThan(1e-8);
    const open = solve(s.doc, 'C1');
    expectConservation(applyCase(s.doc, 'C1'), open);
    expect(open.pipes.toB.flow).toBeGreaterThan(0.005);
  });
});

describe('a branch point with a draw-off', () => {
  it('takes exactly its flow; the rest goes on', () => {
    const s = twoBranches();
    if (s.doc.nodes.J.kind === 'junction') s.doc.nodes.J.outflow = 0.004;
    const r = solve(s.doc);
    expectAllFinite(r);
    expectConservation(s.doc, r);
    const q = r.pipes.main.flow - r.pipes.toA.flow - r.pipes.toV.flow;
    expect(q).toBeCloseTo(0.004, 12);
  });

  it('a negative draw-off is a supply, and a case can change it', () => {
    const s = twoBranches();
    s.doc.cases.C1 = {
      id: 'C1',
      name: 'supply',
      overrides: { junctions: { J: { outflow: -0.01 } } },
    };
    const base = solve(s.doc);
    const r = solve(s.doc, 'C1');
    expectConservation(applyCase(s.doc, 'C1'), r);
    const q = r.pipes.main.flow - r.pipes.toA.flow - r.pipes.toV.flow;
    expect(q).toBeCloseTo(-0.01, 12);
    // With 10 L/s supplied at the branch, less comes from the tank.
    expect(r.pipes.main.flow).toBeLessThan(base.pipes.main.flow);
  });
});
