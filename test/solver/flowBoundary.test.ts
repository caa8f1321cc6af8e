/**
 * Boundaries that hold a flow (a draw-off to a consumer not drawn, or a supply of known flow):
 * a node demand in the global gradient method (Todini and Pilati, 1988). Checked against the
 * energy equation written out here and against continuity; the heads of a branched draw-off are
 * also checked against the same sheet with the draw-off replaced by the pressure it solved to.
 */
import { describe, expect, it } from 'vitest';
import { solve } from '../../src/lib/solver/solve';
import { at, expectAllFinite, expectConservation, Sheet } from './helpers';

const g = 9.80665;
const M3H = 1 / 3600;

describe('a boundary that holds a flow', () => {
  function tankToDrawOff(outflow: number, drawOffZ = 0) {
    const s = new Sheet();
    s.doc.settings.atmosphericPressureOverride = 101_325;
    s.vessel('T', 20, { nozzleZ: 0, entranceK: 0.5 });
    s.drawOff('D', drawOffZ, outflow);
    s.pipe('L', at('T', 'N1'), at('D', 'p'), { length: 200, diameter: 0.08 });
    return s;
  }

  it('takes exactly its flow, and its pressure follows from the energy equation', () => {
    const s = tankToDrawOff(30 * M3H);
    const r = solve(s.doc);
    expectAllFinite(r);
    expectConservation(s.doc, r);
    const pipe = r.pipes.L;
    expect(pipe.flow).toBeCloseTo(30 * M3H, 12);
    // Extended Bernoulli from the tank surface (at rest, 20 m) to the draw-off point (z = 0):
    // 20 = p/ρg + V²/2g + K_entrance V²/2g + f (L/D) V²/2g, no exit loss at a draw-off.
    const vh = (pipe.velocity * pipe.velocity) / (2 * g);
    const hgl = 20 - vh - 0.5 * vh - pipe.frictionLoss;
    const port = r.nodes.D.ports.p;
    expect(port.head).toBeCloseTo(hgl, 6);
    expect(port.pressureAbs).toBeCloseTo(101_325 + r.fluid.density * g * hgl, 2);
    expect(pipe.endLosses).toBeCloseTo(0.5 * vh, 9);
  });

  it('a negative outflow is a supply: the flow runs into the tank', () => {
    const s = tankToDrawOff(-10 * M3H);
    const r = solve(s.doc);
    expectConservation(s.doc, r);
    expect(r.pipes.L.flow).toBeCloseTo(-10 * M3H, 12);
    expect(r.nodes.D.ports.p.head).toBeGreaterThan(20);
  });

  it('asking more than the line can pass drives the draw-off below vapour pressure (stop)', () => {
    const s = tankToDrawOff(120 * M3H, 5);
    const r = solve(s.doc);
    expectAllFinite(r);
    expect(r.converged).toBe(true);
    const stop = r.findings.filter((f) => f.code === 'below-vapour-pressure');
    expect(stop.map((f) => f.elements[0])).toContain('D');
  });

  it('two draw-offs on a branch share one supply; the heads match the pressure-held sheet', () => {
    const s = new Sheet();
    s.doc.settings.atmosphericPressureOverride = 101_325;
    s.vessel('T', 25, { nozzleZ: 0 });
    s.node('junction', 'J', { z: 2 });
    s.drawOff('D1', 3, 18 * M3H);
    s.drawOff('D2', 6, 7 * M3H);
    s.pipe('M', at('T', 'N1'), at('J', 'hub'), { length: 150, diameter: 0.1 });
    s.pipe('B1', at('J', 'hub'), at('D1', 'p'), { length: 60, diameter: 0.065 });
    s.pipe('B2', at('J', 'hub'), at('D2', 'p'), { length: 90, diameter: 0.05 });
    const r = solve(s.doc);
    expectConservation(s.doc, r);
    expect(r.pipes.M.flow).toBeCloseTo(25 * M3H, 12);

    // Hold the pressure each draw-off solved to: the flows must come back. (A pressure
    // boundary takes the arriving velocity head as exit loss, so the HGL at the pipe end is its
    // head: the same HGL the draw-off had.)
    const held = structuredClone(s.doc);
    for (const id of ['D1', 'D2'])
      held.nodes[id] = {
        ...held.nodes[id],
        holds: 'pressure',
        pressureAbs: r.nodes[id].ports.p.pressureAbs,
      } as (typeof held.nodes)[string];
    const back = solve(held);
    expect(back.converged).toBe(true);
    expect(back.pipes.B1.flow).toBeCloseTo(18 * M3H, 8);
    expect(back.pipes.B2.flow).toBeCloseTo(7 * M3H, 8);
  });

  it('a draw-off with no vessel or pressure boundary behind it is cut off, not solved', () => {
    const s = new Sheet();
    s.drawOff('D', 0, 5 * M3H);
    s.node('junction', 'J', { z: 0 });
    s.pipe('L', at('J', 'hub'), at('D', 'p'));
    const r = solve(s.doc);
    expectAllFinite(r);
    expect(r.findings.some((f) => f.code === 'no-fixed-head' || f.code === 'cut-off')).toBe(true);
  });

  it('a flow that is not a number is refused by name and leaves the rest solved', () => {
    const s = tankToDrawOff(Number.NaN);
    s.vessel('U', 5, { nozzleZ: 0 });
    s.pipe('TU', at('T', 'N1'), at('U', 'N1'));
    const r = solve(s.doc);
    expectAllFinite(r);
    const bad = r.findings.find((f) => f.code === 'invalid-input' && f.elements[0] === 'D');
    expect(bad?.message).toMatch(/flow is not a number/);
    expect(r.pipes.TU.flow).toBeGreaterThan(0);
  });
});
