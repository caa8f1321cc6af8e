/**
 * Preconditioned conjugate gradients (Hestenes and Stiefel, 1952, "Methods of conjugate
 * gradients for solving linear systems", J. Res. NBS 49(6); the preconditioned form as in
 * Saad, 2003, "Iterative Methods for Sparse Linear Systems", 2nd ed., Algorithm 9.1) for a
 * symmetric positive-definite matrix, stopped on the largest absolute residual |b − A x|∞.
 * When the updated residual says it is done, the true residual is recomputed and must agree,
 * so rounding drift in the recurrence can never pass for convergence.
 */
import { multiplyInto, residualInto, type SymmetricMatrix } from './symmetric';

/** Outcome of a conjugate-gradient solve. */
export interface PcgOutcome {
  converged: boolean;
  iterations: number;
  /** Largest |b − A x| of the returned x (the true residual, recomputed). */
  residual: number;
  /** The tolerance the residual was held to. */
  tolerance: number;
}

/** Work vectors for `pcg`, reusable across solves of one size. */
export class PcgWork {
  readonly r: Float64Array;
  readonly z: Float64Array;
  readonly p: Float64Array;
  readonly q: Float64Array;
  constructor(n: number) {
    this.r = new Float64Array(n);
    this.z = new Float64Array(n);
    this.p = new Float64Array(n);
    this.q = new Float64Array(n);
  }
}

/**
 * Largest rounding-scale of a row at x: max_i (|b_i| + |a_ii x_i| + Σ_j |a_ij x_j|). Forming
 * b − A x in floating point is exact only to about machine epsilon times this.
 */
export function residualScale(a: SymmetricMatrix, b: ArrayLike<number>, x: Float64Array): number {
  const { n, diagonal, rowStart, columns, values } = a;
  let worst = 0;
  for (let i = 0; i < n; i++) {
    let s = Math.abs(b[i]) + Math.abs(diagonal[i] * x[i]);
    for (let p = rowStart[i]; p < rowStart[i + 1]; p++) s += Math.abs(values[p] * x[columns[p]]);
    if (s > worst) worst = s;
  }
  return worst;
}

/**
 * Solves A x = b from the guess in `x` (overwritten with the answer), applying the
 * preconditioner as `precondition(r, z)` (z = B r). It stops when |b − A x|∞ ≤
 * max(absoluteTolerance, relativeTolerance · |b − A x₀|∞, roundingFactor · ε · residualScale) —
 * the last term is the floor that rounding puts under any solver's residual — or after
 * `maxIterations`, or when a step finds
 * the matrix or the preconditioner not positive definite (not converged; x is then the last
 * finite iterate).
 */
export function pcg(
  a: SymmetricMatrix,
  b: Float64Array,
  x: Float64Array,
  precondition: (r: Float64Array, z: Float64Array) => void,
  options: {
    absoluteTolerance: number;
    roundingFactor: number;
    maxIterations: number;
    /** Also stop once the residual is this fraction of the starting one (0: never). */
    relativeTolerance?: number;
    /**
     * Flexible CG with one kept direction (Notay, 2000, "Flexible conjugate gradients", SIAM J.
     * Sci. Comput. 22(4)): for a preconditioner that is not a fixed linear operator (K-cycle).
     */
    flexible?: boolean;
  },
  work: PcgWork = new PcgWork(a.n),
): PcgOutcome {
  const n = a.n;
  const { r, z, p, q } = work;
  let residual = residualInto(a, b, x, r);
  const relative = (options.relativeTolerance ?? 0) * residual;
  const toleranceAt = () =>
    Math.max(
      options.absoluteTolerance,
      relative,
      options.roundingFactor * Number.EPSILON * residualScale(a, b, x),
    );
  let tolerance = toleranceAt();
  if (residual <= tolerance) return { converged: true, iterations: 0, residual, tolerance };
  if (!Number.isFinite(residual)) return { converged: false, iterations: 0, residual, tolerance };
  precondition(r, z);
  let rz = dot(r, z, n);
  p.set(z);
  for (let k = 1; k <= options.maxIterations; k++) {
    multiplyInto(a, p, q);
    const pq = dot(p, q, n);
    if (!(pq > 0) || !(rz > 0)) return { converged: false, iterations: k, residual, tolerance };
    const alpha = options.flexible ? dot(p, r, n) / pq : rz / pq;
    let updated = 0;
    for (let i = 0; i < n; i++) {
      x[i] += alpha * p[i];
      r[i] -= alpha * q[i];
      const m = Math.abs(r[i]);
      if (m > updated) updated = m;
    }
    if (updated <= tolerance) {
      residual = residualInto(a, b, x, r);
      tolerance = toleranceAt();
      if (residual <= tolerance) return { converged: true, iterations: k, residual, tolerance };
    }
    precondition(r, z);
    let beta: number;
    if (options.flexible)
      beta = -dot(z, q, n) / pq; // A-orthogonal to the last direction
    else {
      const rzNext = dot(r, z, n);
      beta = rzNext / rz;
      rz = rzNext;
    }
    for (let i = 0; i < n; i++) p[i] = z[i] + beta * p[i];
  }
  residual = residualInto(a, b, x, r);
  return {
    converged: residual <= tolerance,
    iterations: options.maxIterations,
    residual,
    tolerance,
  };
}

function dot(x: Float64Array, y: Float64Array, n: number): number {
  let s = 0;
  for (let i = 0; i < n; i++) s += x[i] * y[i];
  return s;
}
