/**
 * Aggregation-based algebraic multigrid as a preconditioner for conjugate gradients on the node
 * equations of the gradient method (a weighted graph Laplacian plus a non-negative diagonal:
 * a symmetric M-matrix). Method: Notay, 2010, "An aggregation-based algebraic multigrid
 * method", Electronic Transactions on Numerical Analysis 37, pp. 123–146 — double pairwise
 * aggregation (aggregation.ts), piecewise-constant prolongation, Galerkin coarse operators
 * (symmetric.ts) — with forward Gauss–Seidel before the coarse correction and backward after
 * (a V- or W-cycle is then a symmetric positive-definite operator, as plain conjugate gradients
 * need; Briggs, Henson and McCormick, 2000, "A Multigrid Tutorial", 2nd ed., ch. 3 and 8), or
 * the paper's K-cycle (see CycleIndex), and a direct LDLᵀ (ldl.ts) on the coarsest level.
 *
 * The hierarchy is rebuilt from the matrix on every `setup` (aggregates follow the current link
 * weights; the cost is a few passes over the entries), so nothing but the coarsest level's
 * ordering is carried from one setup to the next, and that reuse does not change a number.
 */
import { doublePairwiseAggregates } from './aggregation';
import { SparseLdl } from './ldl';
import { multiplyInto, residualInto, type SymmetricMatrix } from './symmetric';

/**
 * Levels with at most this many unknowns are solved directly. Small, because the coarsest
 * pattern changes with the aggregates and is then ordered again: at 400 the orderings cost a
 * tenth of the 10,000-pipe grid's solve; the levels this adds cost less.
 */
export const COARSEST_SIZE = 100;
/** Coarsening stops when a level keeps more than this fraction of the unknowns (it stalled). */
export const STALL_RATIO = 0.8;
/** At most this many levels. */
export const MAX_LEVELS = 30;

interface Level {
  a: SymmetricMatrix;
  /** Fine unknown → aggregate on the next level, or −1 (P's row is zero). */
  aggregate: Int32Array;
  r: Float64Array;
  /** Right-hand side, solution, and a second pass's residual and correction on the next level. */
  coarseB: Float64Array;
  coarseX: Float64Array;
  coarseR: Float64Array;
  coarseE: Float64Array;
  /** Products A_c v of the Krylov cycle's two coarse directions. */
  coarseW1: Float64Array;
  coarseW2: Float64Array;
}

/** The coarsest level's direct solver, reused while its pattern stays the same. */
interface Coarsest {
  a: SymmetricMatrix;
  edgeA: Int32Array;
  edgeB: Int32Array;
  edgeValue: Float64Array;
  ldl: SparseLdl;
}

/**
 * Multigrid cycles: 1 = V-cycle, 2 = W-cycle (two coarse corrections on each level), 'krylov' =
 * K-cycle (Notay and Vassilevski, 2008, "Recursive Krylov-based multigrid cycles", Numer. Linear
 * Algebra Appl. 15; as in Notay 2010, Algorithm 3.2): each coarse system is solved by up to two
 * steps of flexible conjugate gradients preconditioned by the next level's cycle; the second
 * step is skipped when the first already cut the coarse residual to KRYLOV_THRESHOLD of itself.
 * The K-cycle is not a fixed linear operator: the outer iteration must be flexible (pcg.ts).
 */
export type CycleIndex = 1 | 2 | 'krylov';
/** Residual fraction below which the K-cycle takes one step only (0.25, from memory). */
export const KRYLOV_THRESHOLD = 0.25;

/** An aggregation AMG preconditioner: `setup(A)`, then `apply(b, x)` sets x ≈ A⁻¹ b. */
export class AggregationAmg {
  private levels: Level[] = [];
  private coarsest: Coarsest | null = null;
  private readonly cycleIndex: CycleIndex;
  private readonly sweeps: number;

  /** @param cycleIndex 1 for V-cycles, 2 for W-cycles; @param sweeps Gauss–Seidel sweeps before and after each coarse correction */
  constructor(cycleIndex: CycleIndex = 1, sweeps = 1) {
    this.cycleIndex = cycleIndex;
    this.sweeps = sweeps;
  }

  /** Number of levels of the current hierarchy, the coarsest included. */
  get levelCount(): number {
    return this.levels.length + 1;
  }

  /** Unknowns on each level, finest first. */
  get sizes(): number[] {
    return [...this.levels.map((l) => l.a.n), this.coarsest?.a.n ?? 0];
  }

  /**
   * Builds the hierarchy for `a` (kept by reference: the fine level reads it on every cycle).
   * Returns false when the coarsest level cannot be factorised (not positive definite).
   */
  setup(a: SymmetricMatrix): boolean {
    this.levels = [];
    let current = a;
    while (current.n > COARSEST_SIZE && this.levels.length < MAX_LEVELS - 1) {
      const { aggregates, coarse } = doublePairwiseAggregates(current);
      if (aggregates.count > STALL_RATIO * current.n || aggregates.count === 0) break;
      const m = aggregates.count;
      this.levels.push({
        a: current,
        aggregate: aggregates.aggregate,
        r: new Float64Array(current.n),
        coarseB: new Float64Array(m),
        coarseX: new Float64Array(m),
        coarseR: new Float64Array(m),
        coarseE: new Float64Array(m),
        coarseW1: new Float64Array(m),
        coarseW2: new Float64Array(m),
      });
      current = coarse;
    }
    return this.factorCoarsest(current);
  }

  /** x = B b for the symmetric positive-definite preconditioner B ≈ A⁻¹ (one cycle from x = 0). */
  apply(b: Float64Array, x: Float64Array): void {
    this.cycle(0, b, x);
  }

  private factorCoarsest(a: SymmetricMatrix): boolean {
    const { n, rowStart, columns, values } = a;
    const edgeA: number[] = [];
    const edgeB: number[] = [];
    const edgeValue: number[] = [];
    for (let i = 0; i < n; i++)
      for (let p = rowStart[i]; p < rowStart[i + 1]; p++) {
        if (columns[p] <= i) continue;
        edgeA.push(i);
        edgeB.push(columns[p]);
        edgeValue.push(values[p]);
      }
    const previous = this.coarsest;
    const same =
      previous !== null &&
      previous.a.n === n &&
      sameInts(previous.edgeA, edgeA) &&
      sameInts(previous.edgeB, edgeB);
    const ldl = same ? previous.ldl : new SparseLdl(n, edgeA, edgeB);
    this.coarsest = {
      a,
      edgeA: Int32Array.from(edgeA),
      edgeB: Int32Array.from(edgeB),
      edgeValue: Float64Array.from(edgeValue),
      ldl,
    };
    return ldl.factor(a.diagonal, this.coarsest.edgeValue);
  }

  private cycle(l: number, b: Float64Array, x: Float64Array): void {
    if (l === this.levels.length) {
      this.coarsest!.ldl.solveInto(b, x);
      return;
    }
    const level = this.levels[l];
    const { a, aggregate, r, coarseB, coarseX } = level;
    x.fill(0);
    for (let s = 0; s < this.sweeps; s++) forwardGaussSeidel(a, b, x);
    residualInto(a, b, x, r);
    coarseB.fill(0);
    for (let i = 0; i < a.n; i++) if (aggregate[i] >= 0) coarseB[aggregate[i]] += r[i];
    if (this.cycleIndex === 'krylov' && l + 1 < this.levels.length) this.krylov(level, l + 1);
    else this.cycle(l + 1, coarseB, coarseX);
    if (this.cycleIndex === 2 && l + 1 < this.levels.length) {
      // Second coarse correction (W-cycle): the same cycle on the coarse residual.
      const coarse = this.levels[l + 1].a;
      residualInto(coarse, coarseB, coarseX, level.coarseR);
      this.cycle(l + 1, level.coarseR, level.coarseE);
      for (let c = 0; c < coarse.n; c++) coarseX[c] += level.coarseE[c];
    }
    for (let i = 0; i < a.n; i++) if (aggregate[i] >= 0) x[i] += coarseX[aggregate[i]];
    for (let s = 0; s < this.sweeps; s++) backwardGaussSeidel(a, b, x);
  }

  /** The K-cycle's coarse solve: level.coarseX ≈ A_c⁻¹ level.coarseB by ≤ 2 flexible CG steps. */
  private krylov(level: Level, next: number): void {
    const ac = this.levels[next].a;
    const n = ac.n;
    const { coarseB: rc, coarseX: x, coarseR: rt, coarseE: v2, coarseW1: w1, coarseW2: w2 } = level;
    this.cycle(next, rc, x); // v1
    multiplyInto(ac, x, w1);
    const rho1 = dot(x, w1, n);
    const alpha1 = dot(x, rc, n);
    if (!(rho1 > 0)) return; // keep the plain correction
    const c1 = alpha1 / rho1;
    let rcNorm = 0;
    let rtNorm = 0;
    for (let i = 0; i < n; i++) {
      rt[i] = rc[i] - c1 * w1[i];
      rcNorm += rc[i] * rc[i];
      rtNorm += rt[i] * rt[i];
    }
    if (rtNorm <= KRYLOV_THRESHOLD * KRYLOV_THRESHOLD * rcNorm) {
      for (let i = 0; i < n; i++) x[i] *= c1;
      return;
    }
    this.cycle(next, rt, v2);
    multiplyInto(ac, v2, w2);
    const gamma = dot(v2, w1, n);
    const beta = dot(v2, w2, n);
    const alpha2 = dot(v2, rt, n);
    const rho2 = beta - (gamma * gamma) / rho1;
    if (!(rho2 > 0)) {
      for (let i = 0; i < n; i++) x[i] *= c1;
      return;
    }
    const a1 = c1 - (gamma * alpha2) / (rho1 * rho2);
    const a2 = alpha2 / rho2;
    for (let i = 0; i < n; i++) x[i] = a1 * x[i] + a2 * v2[i];
  }
}

function dot(x: Float64Array, y: Float64Array, n: number): number {
  let s = 0;
  for (let i = 0; i < n; i++) s += x[i] * y[i];
  return s;
}

/** One Gauss–Seidel sweep in index order. */
function forwardGaussSeidel(a: SymmetricMatrix, b: Float64Array, x: Float64Array): void {
  const { n, diagonal, rowStart, columns, values } = a;
  for (let i = 0; i < n; i++) {
    let s = b[i];
    const end = rowStart[i + 1];
    for (let p = rowStart[i]; p < end; p++) s -= values[p] * x[columns[p]];
    x[i] = s / diagonal[i];
  }
}

/** One Gauss–Seidel sweep in reverse index order (the adjoint of the forward sweep). */
function backwardGaussSeidel(a: SymmetricMatrix, b: Float64Array, x: Float64Array): void {
  const { diagonal, rowStart, columns, values } = a;
  for (let i = a.n - 1; i >= 0; i--) {
    let s = b[i];
    const end = rowStart[i + 1];
    for (let p = rowStart[i]; p < end; p++) s -= values[p] * x[columns[p]];
    x[i] = s / diagonal[i];
  }
}

function sameInts(x: Int32Array, y: number[]): boolean {
  if (x.length !== y.length) return false;
  for (let i = 0; i < x.length; i++) if (x[i] !== y[i]) return false;
  return true;
}
