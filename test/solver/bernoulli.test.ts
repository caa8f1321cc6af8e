import { describe, expect, it } from 'vitest';
import { solve } from '../../src/lib/solver/solve';
import { at, expectAllFinite, expectConservation, Sheet } from './helpers';

const g = 9.80665;

/**
 * Bernoulli's equation for steady, incompressible, frictionless flow along a streamline
 * (z + p/ρg + v²/2g constant; a fact of the trade): with zero-length pipes, no fittings' loss
 * and no entrance loss, the EGL stays at the tank level everywhere, and across a reducer the
 * HGL drops by exactly the change in velocity head.
 */
describe('frictionless limit (Bernoulli)', () => {
  function line(dIn: number, dOut: number) {
    const s = new Sheet();
    s.vessel('T', 10, { nozzleZ: 0, entranceK: 0 });
    s.node('waypoint', 'W', { z: 2 });
    s.fitting('R', {
      fittingType: dOut < dIn ? 'reducer' : 'expander',
      lossMethod: 'fixed',
      fixedK: 0,
      inletDiameter: dIn,
      outletDiameter: dOut,
      z: 1,
    });
    s.boundary('B', 0, 101325);
    s.doc.settings.atmosphericPressureOverride = 101325;
    s.pipe('P1', at('T', 'N1'), at('W', 'in'), { length: 0, diameter: dIn });
    s.pipe('P2', at('W', 'out'), at('R', 'in'), { length: 0, diameter: dIn });
    s.pipe('P3', at('R', 'out'), at('B', 'p'), { length: 0, diameter: dOut });
    return s;
  }

  for (const [dIn, dOut] of [
    [0.1, 0.05],
    [0.05, 0.1],
  ]) {
    it(`EGL level and HGL step through a ${dIn} → ${dOut} m change`, () => {
      const s = line(dIn, dOut);
      const result = solve(s.doc);
      expectAllFinite(result);
      expectConservation(s.doc, result);
      // Outlet velocity from Bernoulli between the tank surface (EGL 10 m) and the boundary (HGL 0 m): v²/2g = 10.
      const vOut = Math.sqrt(2 * g * 10);
      expect(result.pipes.P3.velocity).toBeCloseTo(vOut, 6);
      for (const id of ['P1', 'P2', 'P3']) {
        expect(result.pipes[id].totalHeadFrom!).toBeCloseTo(10, 6);
        expect(result.pipes[id].totalHeadTo!).toBeCloseTo(10, 6);
      }
      const r = result.nodes.R.ports;
      const v1 = result.pipes.P2.velocity;
      const v2 = result.pipes.P3.velocity;
      expect(r.in.head - r.out.head).toBeCloseTo((v2 * v2 - v1 * v1) / (2 * g), 9);
      expect(r.in.totalHead - r.out.totalHead).toBeCloseTo(0, 9);
      expect(result.nodes.R.headLoss!).toBeCloseTo(0, 9);
      // HGL at the waypoint = EGL − v²/2g; its pressure from HGL − z.
      const w = result.nodes.W.ports.in;
      expect(w.head).toBeCloseTo(10 - (v1 * v1) / (2 * g), 6);
      expect(w.pressureGauge).toBeCloseTo(result.fluid.density * g * (w.head - 2), 6);
    });
  }
});
