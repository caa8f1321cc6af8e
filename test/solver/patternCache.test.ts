import { describe, expect, it } from 'vitest';
import type { HeadrouteDocument, PumpPoint } from '../../src/lib/model/types';
import { clearPatternCache } from '../../src/lib/solver/sparse/ldl';
import { solve } from '../../src/lib/solver/solve';
import { at, expectConservation, Sheet } from './helpers';

/**
 * The solver keeps the ordering and symbolic factorisation of the last few matrix patterns
 * (sparse/ldl.ts sparseLdlFor), keyed on the exact edge lists of the node equations. A solve
 * after an edit must give exactly what a solve with nothing kept gives: a changed pattern must
 * never reuse a stale factorisation, and an unchanged one must not change a number.
 */

/** Test pump: H = 40 − 10⁴·Q² m; four points on it, so the quadratic fit is exact. */
const curve: PumpPoint[] = [0, 0.02, 0.04, 0.06].map((q) => ({ flow: q, value: 40 - 1e4 * q * q }));

/**
 * Tank T (level 30 m) → pump P → a looped ring of junctions J1…J4 with a cross pipe and a gate
 * valve V on one side → boundary B at atmospheric pressure.
 */
function ring(): HeadrouteDocument {
  const s = new Sheet();
  s.vessel('T', 30);
  s.pump('P', { headCurve: curve, z: 0 });
  for (const id of ['J1', 'J2', 'J3', 'J4', 'J5']) s.node('junction', id);
  s.fitting('V', { fittingType: 'gate-valve' });
  s.boundary('B', 0, 101_325);
  s.pipe('S', at('T', 'N1'), at('P', 'suction'), { length: 5 });
  s.pipe('D', at('P', 'discharge'), at('J1', 'hub'), { length: 20 });
  s.pipe('a', at('J1', 'hub'), at('J2', 'hub'), { length: 50 });
  s.pipe('b', at('J2', 'hub'), at('J3', 'hub'), { length: 60 });
  s.pipe('c', at('J3', 'hub'), at('V', 'in'), { length: 40 });
  s.pipe('c2', at('V', 'out'), at('J4', 'hub'), { length: 30 });
  s.pipe('d', at('J4', 'hub'), at('J1', 'hub'), { length: 70 });
  s.pipe('x', at('J2', 'hub'), at('J4', 'hub'), { length: 80, diameter: 0.05 });
  s.pipe('o', at('J3', 'hub'), at('B', 'p'), { length: 15 });
  s.pipe('e', at('J4', 'hub'), at('J5', 'hub'), { length: 25 });
  return s.doc;
}

/** The result with no pattern kept, then the same sheet again (now reusing its own pattern). */
function coldAndWarm(doc: HeadrouteDocument) {
  clearPatternCache();
  const cold = solve(doc);
  return { cold, warm: solve(structuredClone(doc)) };
}

/** Solves `before`, then `after` with what `before` left kept, and compares with a cold solve of `after`. */
function expectSameAsCold(before: HeadrouteDocument, after: HeadrouteDocument): void {
  clearPatternCache();
  solve(before);
  const warm = solve(after);
  clearPatternCache();
  const cold = solve(after);
  expect(warm).toEqual(cold);
  expect(warm.findings.map((f) => f.code)).not.toContain('no-convergence');
  expectConservation(after, warm);
}

describe('kept matrix patterns and sheet edits (sparse/ldl.ts pattern cache)', () => {
  it('a re-solve of the same sheet reuses its pattern and gives identical results', () => {
    const { cold, warm } = coldAndWarm(ring());
    expect(warm).toEqual(cold);
    expectConservation(ring(), cold);
  });

  it('adding a pipe (a new loop) gets its own pattern', () => {
    const after = ring();
    after.pipes.y = structuredClone(after.pipes.a);
    Object.assign(after.pipes.y, {
      id: 'y',
      name: 'y',
      from: at('J1', 'hub'),
      to: at('J3', 'hub'),
    });
    expectSameAsCold(ring(), after);
  });

  it('removing a pipe gets its own pattern, and so does putting it back', () => {
    const after = ring();
    delete after.pipes.x;
    expectSameAsCold(ring(), after);
    expectSameAsCold(after, ring());
  });

  it('reconnecting a pipe end to another junction gets its own pattern', () => {
    const after = ring();
    after.pipes.e.to = at('J2', 'hub');
    after.pipes.x.to = at('J5', 'hub');
    expectSameAsCold(ring(), after);
  });

  it('closing the valve keeps the pattern (a shut valve is a stiff link) and matches a cold solve', () => {
    const after = ring();
    after.nodes.V = { ...after.nodes.V, closed: true } as typeof after.nodes.V;
    expectSameAsCold(ring(), after);
    const open = solve(ring());
    const shut = solve(after);
    expect(Math.abs(shut.pipes.c.flow)).toBeLessThan(1e-6);
    expect(Math.abs(open.pipes.c.flow)).toBeGreaterThan(1e-3);
  });

  it('a pump switched to duty (a fixed flow, no head law) drops its link from the pattern', () => {
    const after = ring();
    after.nodes.P = { ...after.nodes.P, mode: 'duty', dutyFlow: 0.02 } as typeof after.nodes.P;
    expectSameAsCold(ring(), after);
    expect(solve(after).pumps.P.flow).toBeCloseTo(0.02, 12);
  });

  it('moving nodes (a drag: positions and elevations) keeps the pattern and matches a cold solve', () => {
    const after = ring();
    for (const [k, z] of [
      ['J2', 4],
      ['J5', -2],
    ] as const)
      after.nodes[k] = { ...after.nodes[k], x: 300, y: 120, z };
    expectSameAsCold(ring(), after);
  });
});
