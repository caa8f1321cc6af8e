import { describe, expect, it } from 'vitest';
import { addCase, applyCommand, deleteElements } from '../../src/lib/model/commands';
import { applyCase } from '../../src/lib/solver/applyCase';
import { solve } from '../../src/lib/solver/solve';
import { at, Sheet } from './helpers';

function sheetWithCase() {
  const s = new Sheet();
  s.vessel('A', 2);
  s.pump('P');
  s.vessel('B', 10, { nozzleZ: 10 });
  s.node('control-valve', 'CV');
  s.pipe('S', at('A', 'N1'), at('P', 'suction'), { diameter: 0.0525 });
  s.pipe('D1', at('P', 'discharge'), at('CV', 'in'), { diameter: 0.0525 });
  s.pipe('D2', at('CV', 'out'), at('B', 'N1'), { diameter: 0.0525 });
  s.doc.cases.hot = {
    id: 'hot',
    name: 'Hot, low level',
    overrides: {
      temperature: 353.15,
      atmosphericPressure: 95000,
      vessels: { A: { liquidLevel: 0.5 } },
      pumps: { P: { speed: 2500 } },
      controlValves: { CV: { opening: 0.4 } },
    },
  };
  s.doc.cases.stopped = {
    id: 'stopped',
    name: 'Pump off',
    overrides: { pumps: { P: { running: false } } },
  };
  return s;
}

describe('applyCase', () => {
  it('lays the overrides over a copy and leaves the base document unchanged', () => {
    const s = sheetWithCase();
    const before = structuredClone(s.doc);
    const doc = applyCase(s.doc, 'hot');
    expect(s.doc).toEqual(before);
    expect(doc.settings.temperature).toBe(353.15);
    expect(doc.settings.atmosphericPressureOverride).toBe(95000);
    expect(doc.nodes.A.kind === 'vessel' && doc.nodes.A.liquidLevel).toBe(0.5);
    expect(doc.nodes.P.kind === 'pump' && doc.nodes.P.speed).toBe(2500);
    expect(doc.nodes.CV.kind === 'control-valve' && doc.nodes.CV.opening).toBe(0.4);
    expect(applyCase(s.doc, null)).toBe(s.doc);
  });

  it('solve(doc, caseId) uses the case; an unknown case is a caution and solves the base', () => {
    const s = sheetWithCase();
    const base = solve(s.doc);
    const hot = solve(s.doc, 'hot');
    const stopped = solve(s.doc, 'stopped');
    expect(hot.caseId).toBe('hot');
    expect(hot.fluid.temperature).toBe(353.15);
    expect(hot.fluid.atmosphericPressure).toBe(95000);
    expect(hot.pumps.P.flow).toBeLessThan(base.pumps.P.flow);
    expect(Math.abs(stopped.pumps.P.flow)).toBeLessThan(1e-8);
    const unknown = solve(s.doc, 'nope');
    expect(unknown.findings.map((f) => f.code)).toContain('unknown-case');
    expect(unknown.pumps.P.flow).toBeCloseTo(base.pumps.P.flow, 12);
  });
});

describe('a case changes what a boundary holds', () => {
  it('a header pressure and a draw-off flow per case; deleting the boundary drops its overrides', () => {
    const s = new Sheet();
    s.vessel('T', 20, { nozzleZ: 0 });
    s.node('junction', 'J', { z: 0 });
    s.boundary('H', 0, 301_325);
    s.drawOff('D', 0, 10 / 3600);
    s.pipe('TJ', at('T', 'N1'), at('J', 'hub'), { diameter: 0.08 });
    s.pipe('JH', at('J', 'hub'), at('H', 'p'), { diameter: 0.05 });
    s.pipe('JD', at('J', 'hub'), at('D', 'p'), { diameter: 0.05 });
    const added = applyCommand(
      s.doc,
      addCase('Header up, more drawn', {
        boundaries: { H: { pressureAbs: 401_325 }, D: { outflow: 25 / 3600 } },
      }),
    );
    if (!added.ok) throw new Error(added.error.message);
    const doc = added.doc;
    const caseId = Object.keys(doc.cases)[0];
    const working = applyCase(doc, caseId);
    expect(working.nodes.H).toMatchObject({ pressureAbs: 401_325 });
    expect(working.nodes.D).toMatchObject({ holds: 'flow', outflow: 25 / 3600 });
    const base = solve(doc);
    const other = solve(doc, caseId);
    expect(base.pipes.JD.flow).toBeCloseTo(10 / 3600, 12);
    expect(other.pipes.JD.flow).toBeCloseTo(25 / 3600, 12);
    // A higher header takes less from the tank.
    expect(other.pipes.JH.flow).toBeLessThan(base.pipes.JH.flow);

    const deleted = applyCommand(doc, deleteElements(['D']));
    if (!deleted.ok) throw new Error(deleted.error.message);
    expect(deleted.doc.cases[caseId].overrides.boundaries).toEqual({ H: { pressureAbs: 401_325 } });
  });
});
