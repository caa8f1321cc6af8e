/**
 * The iterative node solve's parts: Galerkin coarse operators (sparse/symmetric.ts), pairwise
 * aggregation (sparse/aggregation.ts), the multigrid preconditioner (sparse/amg.ts) and
 * preconditioned conjugate gradients (sparse/pcg.ts), checked against dense arithmetic written
 * here and against the direct LDLᵀ (sparse/ldl.ts).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  doublePairwiseAggregates,
  pairwiseAggregates,
} from '../../src/lib/solver/sparse/aggregation';
import { AggregationAmg } from '../../src/lib/solver/sparse/amg';
import { SparseLdl } from '../../src/lib/solver/sparse/ldl';
import { pcg } from '../../src/lib/solver/sparse/pcg';
import {
  EdgePattern,
  galerkin,
  multiplyInto,
  type SymmetricMatrix,
} from '../../src/lib/solver/sparse/symmetric';

/** A weighted graph Laplacian plus a diagonal, as edge lists (the shape of the node equations). */
interface EdgeSystem {
  n: number;
  a: number[];
  b: number[];
  off: number[];
  diag: Float64Array;
}

/** A k × k grid with weights varying over two orders of magnitude, grounded at a few nodes. */
function weightedGrid(k: number): EdgeSystem {
  const n = k * k;
  const a: number[] = [];
  const b: number[] = [];
  const off: number[] = [];
  for (let i = 0; i < k; i++)
    for (let j = 0; j < k; j++) {
      const id = i * k + j;
      if (i + 1 < k) {
        a.push(id);
        b.push(id + k);
        off.push(-(0.05 + 2 * Math.abs(Math.sin(id * 1.7))));
      }
      if (j + 1 < k) {
        a.push(id);
        b.push(id + 1);
        off.push(-(0.05 + 2 * Math.abs(Math.cos(id * 0.3))));
      }
    }
  const diag = new Float64Array(n);
  off.forEach((v, e) => {
    diag[a[e]] -= v;
    diag[b[e]] -= v;
  });
  diag[0] += 5; // a link to a fixed head at one corner
  for (let m = 0; m < k; m += 4) diag[n - 1 - m] += 0.5; // and along the far edge
  return { n, a, b, off, diag };
}

function assembled(s: EdgeSystem): SymmetricMatrix {
  const pattern = new EdgePattern(s.n, s.a, s.b);
  const m = pattern.matrix();
  pattern.assemble(s.diag, s.off, m);
  return m;
}

function dense(m: SymmetricMatrix): number[][] {
  const d = Array.from({ length: m.n }, () => new Array<number>(m.n).fill(0));
  for (let i = 0; i < m.n; i++) {
    d[i][i] = m.diagonal[i];
    for (let p = m.rowStart[i]; p < m.rowStart[i + 1]; p++) d[i][m.columns[p]] += m.values[p];
  }
  return d;
}

const maxAbs = (v: ArrayLike<number>) =>
  Array.from(v).reduce((w, x) => Math.max(w, Math.abs(x)), 0);

describe('symmetric matrices from edge lists and Galerkin operators (sparse/symmetric.ts)', () => {
  it('assembles repeated and reversed edges by summing, drops self-loops (dense check)', () => {
    const m = assembled({
      n: 3,
      a: [0, 1, 2, 1],
      b: [1, 0, 2, 2],
      off: [-1, -2, -7, -3],
      diag: Float64Array.from([4, 6, 5]),
    });
    expect(dense(m)).toEqual([
      [4, -3, 0],
      [-3, 6, -3],
      [0, -3, 5],
    ]);
  });

  it('Pᵀ A P equals the dense triple product for random aggregates (property)', () => {
    const m = assembled(weightedGrid(5));
    const d = dense(m);
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: -1, max: 6 }), { minLength: 25, maxLength: 25 }),
        (raw) => {
          const aggregate = Int32Array.from(raw);
          const c = galerkin(m, aggregate, 7);
          const expected = Array.from({ length: 7 }, () => new Array<number>(7).fill(0));
          for (let i = 0; i < 25; i++)
            for (let j = 0; j < 25; j++)
              if (aggregate[i] >= 0 && aggregate[j] >= 0)
                expected[aggregate[i]][aggregate[j]] += d[i][j];
          const got = dense(c);
          for (let x = 0; x < 7; x++)
            for (let y = 0; y < 7; y++) expect(got[x][y]).toBeCloseTo(expected[x][y], 12);
        },
      ),
      { numRuns: 100 },
    );
  });
});

describe('pairwise aggregation (sparse/aggregation.ts, Notay 2010)', () => {
  it('places every unknown of a grid Laplacian in an aggregate of one to three, about halving it', () => {
    const m = assembled(weightedGrid(20));
    const { aggregate, count } = pairwiseAggregates(m);
    const sizes = new Array<number>(count).fill(0);
    for (const c of aggregate) {
      expect(c).toBeGreaterThanOrEqual(0);
      sizes[c]++;
    }
    expect(Math.max(...sizes)).toBeLessThanOrEqual(3);
    expect(Math.min(...sizes)).toBeGreaterThanOrEqual(1);
    expect(count).toBeLessThan(0.6 * m.n);
  });

  it('leaves a strongly diagonally dominant unknown to the smoother', () => {
    const m = assembled({
      n: 3,
      a: [0, 1],
      b: [1, 2],
      off: [-1, -1],
      diag: Float64Array.from([2, 2, 100]),
    });
    expect(pairwiseAggregates(m).aggregate[2]).toBe(-1);
  });

  it('two passes give aggregates of at most nine and a coarse operator equal to Pᵀ A P', () => {
    const m = assembled(weightedGrid(12));
    const { aggregates, coarse } = doublePairwiseAggregates(m);
    const sizes = new Array<number>(aggregates.count).fill(0);
    for (const c of aggregates.aggregate) if (c >= 0) sizes[c]++;
    expect(Math.max(...sizes)).toBeLessThanOrEqual(9);
    expect(aggregates.count).toBeLessThan(0.35 * m.n);
    const direct = galerkin(m, aggregates.aggregate, aggregates.count);
    const x = dense(coarse);
    const y = dense(direct);
    for (let i = 0; i < coarse.n; i++)
      for (let j = 0; j < coarse.n; j++) expect(x[i][j]).toBeCloseTo(y[i][j], 12);
  });
});

describe('AMG-preconditioned conjugate gradients (sparse/amg.ts, sparse/pcg.ts)', () => {
  it.each([
    ['V-cycle, plain CG', 1, false],
    ['K-cycle, flexible CG', 'krylov', true],
  ] as const)(
    '%s: solves a 60 × 60 weighted grid to 1e-12 absolute and agrees with LDLᵀ',
    (_, cycle, flexible) => {
      const s = weightedGrid(60);
      const m = assembled(s);
      const rhs = Float64Array.from({ length: s.n }, (_, i) => 0.01 * Math.sin(i / 13));
      rhs[0] += 5 * 40; // inflow from a 40 m fixed head through the corner link
      const amg = new AggregationAmg(cycle);
      expect(amg.setup(m)).toBe(true);
      expect(amg.levelCount).toBeGreaterThanOrEqual(3); // 3,600 → … → ≤ 100 unknowns
      const x = new Float64Array(s.n);
      const out = pcg(m, rhs, x, (r, z) => amg.apply(r, z), {
        absoluteTolerance: 1e-12,
        roundingFactor: 4,
        maxIterations: 200,
        flexible,
      });
      expect(out.converged).toBe(true);
      expect(out.residual).toBeLessThanOrEqual(1e-12);
      // The residual is recomputed here from scratch.
      const back = new Float64Array(s.n);
      multiplyInto(m, x, back);
      expect(maxAbs(back.map((v, i) => v - rhs[i]))).toBeLessThan(1e-12);
      const ldl = new SparseLdl(s.n, s.a, s.b);
      expect(ldl.factor(s.diag, s.off)).toBe(true);
      const reference = ldl.solve(rhs);
      expect(maxAbs(x.map((v, i) => v - reference[i]))).toBeLessThan(1e-9);
    },
  );

  it('the V- and W-cycle preconditioners are symmetric: uᵀ B v = vᵀ B u', () => {
    const m = assembled(weightedGrid(30));
    const u = Float64Array.from({ length: m.n }, (_, i) => Math.sin(i));
    const v = Float64Array.from({ length: m.n }, (_, i) => Math.cos(3 * i));
    for (const cycle of [1, 2] as const) {
      const amg = new AggregationAmg(cycle);
      amg.setup(m);
      const bu = new Float64Array(m.n);
      const bv = new Float64Array(m.n);
      amg.apply(u, bu);
      amg.apply(v, bv);
      const uBv = u.reduce((s, x, i) => s + x * bv[i], 0);
      const vBu = v.reduce((s, x, i) => s + x * bu[i], 0);
      expect(Math.abs(uBv - vBu)).toBeLessThan(1e-10 * Math.abs(uBv));
    }
  });

  it('a warm start already at the answer takes no step; a relative target stops early', () => {
    const s = weightedGrid(40);
    const m = assembled(s);
    const rhs = Float64Array.from({ length: s.n }, (_, i) => Math.cos(i / 7));
    const amg = new AggregationAmg();
    amg.setup(m);
    const options = { absoluteTolerance: 1e-12, roundingFactor: 4, maxIterations: 200 };
    const x = new Float64Array(s.n);
    const full = pcg(m, rhs, x, (r, z) => amg.apply(r, z), options);
    expect(full.converged).toBe(true);
    const again = pcg(m, rhs, x, (r, z) => amg.apply(r, z), options);
    expect(again.iterations).toBe(0);
    const y = new Float64Array(s.n);
    const loose = pcg(m, rhs, y, (r, z) => amg.apply(r, z), {
      ...options,
      relativeTolerance: 1e-3,
    });
    expect(loose.converged).toBe(true);
    expect(loose.iterations).toBeLessThan(full.iterations);
    expect(loose.residual).toBeLessThanOrEqual(1e-3 * maxAbs(rhs));
  });

  it('an ungrounded sheet (singular matrix, inconsistent right side) is reported as not converged, never NaN', () => {
    const s = weightedGrid(25);
    s.off.forEach((v, e) => {
      s.diag[s.a[e]] = 0;
      s.diag[s.b[e]] = 0;
    });
    s.off.forEach((v, e) => {
      s.diag[s.a[e]] -= v;
      s.diag[s.b[e]] -= v;
    });
    const m = assembled(s); // pure Laplacian: constant vectors are its null space
    const x = new Float64Array(s.n);
    const rhs = Float64Array.from({ length: s.n }, () => 1); // Σ b ≠ 0: no solution exists
    const out = pcg(m, rhs, x, (r, z) => z.set(r), {
      absoluteTolerance: 1e-12,
      roundingFactor: 4,
      maxIterations: 50,
    });
    expect(out.converged).toBe(false);
    expect(x.every(Number.isFinite)).toBe(true);
  });
});
