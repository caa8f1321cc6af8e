import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { SparseLdl } from '../../src/lib/solver/sparse/ldl';

/** Dense reference: y = A x for a Laplacian-plus-diagonal matrix given by edges. */
function multiply(
  n: number,
  diag: number[],
  a: number[],
  b: number[],
  w: number[],
  x: Float64Array,
) {
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) y[i] = diag[i] * x[i];
  for (let e = 0; e < a.length; e++) {
    y[a[e]] += w[e] * x[b[e]];
    y[b[e]] += w[e] * x[a[e]];
  }
  return y;
}

describe('SparseLdl', () => {
  it('solves a small SPD system exactly (checked by multiplying back)', () => {
    // Path 0-1-2-3 with weights, grounded at node 0 (an extra 1 on its diagonal).
    const a = [0, 1, 2];
    const b = [1, 2, 3];
    const weights = [2, 3, 4];
    const diag = [1 + 2, 2 + 3, 3 + 4, 4];
    const ldl = new SparseLdl(4, a, b);
    expect(
      ldl.factor(
        diag,
        weights.map((w) => -w),
      ),
    ).toBe(true);
    const rhs = [1, 2, 3, 4];
    const x = ldl.solve(rhs);
    const back = multiply(
      4,
      diag,
      a,
      b,
      weights.map((w) => -w),
      x,
    );
    for (let i = 0; i < 4; i++) expect(back[i]).toBeCloseTo(rhs[i], 12);
    expect(ldl.factorEntries).toBe(3); // a series line factors without fill
  });

  it('a tree factors without fill (minimum-degree ordering)', () => {
    const n = 200;
    const a: number[] = [];
    const b: number[] = [];
    for (let i = 1; i < n; i++) {
      a.push(i);
      b.push(Math.floor((i - 1) / 3));
    }
    const ldl = new SparseLdl(n, a, b);
    expect(ldl.factorEntries).toBe(n - 1);
  });

  it('random grounded weighted graphs: A x = b to 1e-10 relative (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 30 }),
        fc.array(fc.tuple(fc.nat(), fc.nat(), fc.double({ min: 1e-3, max: 1e3, noNaN: true })), {
          maxLength: 80,
        }),
        fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { minLength: 30, maxLength: 30 }),
        (n, rawEdges, rhsAll) => {
          const a: number[] = [];
          const b: number[] = [];
          const w: number[] = [];
          const diag = new Array(n).fill(0.5); // grounded: positive definite
          for (const [i, j, weight] of rawEdges) {
            const p = i % n;
            const q = j % n;
            if (p === q) continue;
            a.push(p);
            b.push(q);
            w.push(-weight);
            diag[p] += weight;
            diag[q] += weight;
          }
          const ldl = new SparseLdl(n, a, b);
          expect(ldl.factor(diag, w)).toBe(true);
          const rhs = rhsAll.slice(0, n);
          const x = ldl.solve(rhs);
          const back = multiply(n, diag, a, b, w, x);
          const scale = Math.max(1, ...diag);
          for (let i = 0; i < n; i++)
            expect(Math.abs(back[i] - rhs[i])).toBeLessThan(1e-10 * scale);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('reports a singular (ungrounded) matrix instead of returning garbage', () => {
    const ldl = new SparseLdl(2, [0], [1]);
    expect(ldl.factor([1, 1], [-1])).toBe(false);
  });
});
