/**
 * Published worked examples solved by the network solver.
 */
import { describe, expect, it } from 'vitest';
import { solve } from '../../src/lib/solver/solve';
import { at, expectAllFinite, expectConservation, Sheet } from './helpers';

const g = 9.80665;

/** The liquid of White's example: ρ = 900 kg/m³, ν = 1e-5 m²/s (μ = 0.009 Pa·s). */
function whiteOil(s: Sheet): void {
  s.doc.settings.liquid = {
    kind: 'user',
    name: 'Oil (White, Example 6.6)',
    table: [{ temperature: 293.15, density: 900, viscosity: 0.009, vapourPressure: 1000 }],
  };
  s.doc.settings.temperature = 293.15;
}

describe('F. M. White, Fluid Mechanics, Example 6.6 (4th ed.; numbering from memory)', () => {
  // Oil at 0.2 m³/s through 500 m of 200 mm cast-iron pipe (ε = 0.26 mm): V = 6.37 m/s,
  // Re = 127,000, f ≈ 0.0227, head loss h_f ≈ 117 m; with the pipe sloping down 10° in the
  // flow direction, Δp = ρg(h_f − Δz) ≈ 265 kPa. Values from memory of the book's solution.
  const length = 500;
  const diameter = 0.2;
  const roughness = 0.26e-3;

  it('117 m of head across the line drives 0.2 m³/s (the book rounds h_f to 3 figures)', () => {
    const s = new Sheet();
    whiteOil(s);
    // No entrance or exit loss, so the whole level difference is pipe friction.
    s.vessel('A', 117, { entranceK: 0, exitK: 0 });
    s.vessel('B', 0, { entranceK: 0, exitK: 0 });
    s.pipe('P', at('A', 'N1'), at('B', 'N1'), { length, diameter, roughness });
    const result = solve(s.doc);
    expectAllFinite(result);
    expectConservation(s.doc, result);
    const pipe = result.pipes.P;
    expect(Math.abs(pipe.flow - 0.2) / 0.2).toBeLessThan(0.005);
    expect(pipe.velocity).toBeCloseTo(6.37, 1);
    expect(Math.abs(pipe.reynolds - 127_000) / 127_000).toBeLessThan(0.01);
    expect(pipe.frictionFactor).toBeCloseTo(0.0227, 3);
    expect(pipe.frictionLoss).toBeCloseTo(117, 0);
  });

  it('down a 10° slope the pressure falls by ρg(h_f − Δz) ≈ 265 kPa', () => {
    const s = new Sheet();
    whiteOil(s);
    const drop = length * Math.sin((10 * Math.PI) / 180); // 86.8 m
    s.vessel('A', 117 - drop + 5, { nozzleZ: 0, entranceK: 0, exitK: 0 });
    s.vessel('B', 5 - drop, { nozzleZ: -drop, z: -drop - 1, entranceK: 0, exitK: 0 });
    s.pipe('P', at('A', 'N1'), at('B', 'N1'), { length, diameter, roughness });
    const result = solve(s.doc);
    expectConservation(s.doc, result);
    expect(Math.abs(result.pipes.P.flow - 0.2) / 0.2).toBeLessThan(0.005);
    const dp = result.nodes.A.ports.N1.pressureAbs - result.nodes.B.ports.N1.pressureAbs;
    // Independent: ρ g (h_f − Δz) with h_f from the solved friction loss.
    const expected = 900 * g * (result.pipes.P.frictionLoss - drop);
    expect(dp).toBeCloseTo(expected, 3);
    expect(Math.abs(dp - 265e3) / 265e3).toBeLessThan(0.015);
  });
});
