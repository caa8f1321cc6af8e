/**
 * Hand-built lines for the method-of-characteristics tests: reservoir – pipe – valve – short
 * pipe – reservoir, with every number chosen for the test (no document, no steady solve).
 */
import type { Line, LinePipe } from '../../../src/lib/solver/surge/line';
import { linearTau } from '../../../src/lib/solver/surge/line';

export const G = 9.80665;

export function linePipe(
  id: string,
  length: number,
  diameter: number,
  waveSpeed: number,
  flow: number,
  headIn: number,
  headOut: number,
  chainage: number,
  friction = 0,
  z = 0,
): LinePipe {
  return {
    id,
    name: id,
    length,
    diameter,
    area: (Math.PI * diameter * diameter) / 4,
    wave: { value: waveSpeed, method: 'korteweg', source: 'test' },
    friction,
    flow,
    headIn,
    headOut,
    zIn: z,
    zOut: z,
    chainage,
    designPressureGauge: null,
  };
}

/**
 * A reservoir at head `h0` feeding pipe P1 (length L, diameter D, wave speed a, velocity v0,
 * friction f) to a valve closing in `closeTime` s, then a short wide pipe P2 to a reservoir.
 */
export function reservoirPipeValve(opts: {
  L: number;
  D: number;
  a: number;
  v0: number;
  h0: number;
  closeTime: number;
  friction?: number;
  valveDrop?: number;
}): Line {
  const { L, D, a, v0, h0, closeTime, friction = 0, valveDrop = 1 } = opts;
  const area = (Math.PI * D * D) / 4;
  const q0 = v0 * area;
  const hf = (friction * L * v0 * v0) / (D * 2 * G);
  const hA = h0 - hf;
  const hB = hA - valveDrop;
  const p1 = linePipe('P1', L, D, a, q0, h0, hA, 0, friction);
  const p2 = linePipe('P2', 2, 3 * D, a, q0, hB, hB, L, 0);
  return {
    nodes: ['R1', 'V', 'R2'],
    pipes: [p1, p2],
    links: [
      {
        nodeId: 'V',
        law: { kind: 'valve', k0: valveDrop / (q0 * q0), tau: linearTau(closeTime) },
        offtake: 0,
      },
    ],
    start: { kind: 'head', head: h0 },
    end: { kind: 'head', head: hB },
  };
}
