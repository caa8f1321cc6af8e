/**
 * The node equations of the gradient method, solved directly or iteratively by the pattern.
 *
 * Rule (decided once per pattern, the decision kept with the pattern):
 * - fewer than ITERATIVE_MIN_SIZE unknowns: direct LDLᵀ (ldl.ts) with the minimum-degree order;
 *   the factor of a few thousand unknowns costs a few milliseconds whatever the shape;
 * - otherwise the minimum-degree order is sought within a budget (ordering.ts
 *   boundedMinimumDegreeOrder): at most FILL_RATIO times the matrix's entries (unknowns plus
 *   distinct links between them) in the factor, and at most WORK_RATIO times as many list
 *   entries visited by the ordering. Within the budget — a forest (no fill at all), a series
 *   line, a branched sheet with a few loops, a ladder — the factor's cost is a small multiple of
 *   a matrix product: direct LDLᵀ with that order;
 * - over the budget (a meshed sheet: on a k × k grid direct elimination fills in like n log n
 *   and costs about n^1.5 per factorisation whatever the ordering; George, 1973, "Nested
 *   dissection of a regular finite element mesh", SIAM J. Numer. Anal. 10(2)): flexible
 *   conjugate gradients (pcg.ts) preconditioned by aggregation algebraic multigrid with
 *   K-cycles (amg.ts), whose cost per solve grows about linearly with the size. The budget check costs a bounded multiple of
 *   the entries, on the first solve of a pattern only.
 *
 * The iterative solve starts from the previous solution (`x` on entry: the heads of the last
 * gradient iteration) and stops at |b − A x|∞ ≤ max(CG_ABSOLUTE_TOLERANCE, 4 ε · row scale),
 * b − A x being the mass imbalance in m³/s the next flows will carry. If it does not get there
 * within CG_MAX_ITERATIONS, or the multigrid setup fails, the same system is solved by the
 * direct factor instead (ordered then, without a budget): never a loose answer, never NaN.
 */
import { AggregationAmg, type CycleIndex } from './amg';
import { SparseLdl } from './ldl';
import { boundedMinimumDegreeOrder, minimumDegreeOrder } from './ordering';
import { PatternCache } from './patternCache';
import { pcg, PcgWork } from './pcg';
import { EdgePattern, type SymmetricMatrix } from './symmetric';

/** Below this many unknowns the node equations are always factorised directly. */
export const ITERATIVE_MIN_SIZE = 3000;
/** Direct when the factor has at most this many times the matrix's entries. */
export const FILL_RATIO = 6;
/** Direct only when minimum degree orders the pattern visiting at most this many list entries per matrix entry. */
export const WORK_RATIO = 24;
/** Mass-imbalance target of the iterative solve, m³/s (well below the 1e-9 m³/s promised per node). */
export const CG_ABSOLUTE_TOLERANCE = 1e-12;
/** Multiple of ε times the largest row scale accepted when rounding sets the floor (pcg.ts). */
export const CG_ROUNDING_FACTOR = 4;
/**
 * Multigrid cycle of the preconditioner: the K-cycle, with flexible conjugate gradients outside.
 * Measured on the bench grids (CPU, shared 2-core machine, median of 3–9 solves), K-cycle
 * against V-cycle: 100,000 pipes 61 against 159 CG steps over 11 against 13 gradient
 * iterations, 2.0 s against 2.6 s; 30,000 pipes 55 against 97 steps, 0.40 against 0.50 s;
 * 10,000 pipes 38 against 66 steps, about the same time. W-cycles cost more than either.
 */
export const AMG_CYCLE: CycleIndex = 'krylov';
/** Conjugate-gradient steps before falling back to the direct factor. */
export const CG_MAX_ITERATIONS = 200;

/** How a pattern's equations are solved. */
export type LinearMethod = 'direct' | 'iterative';

/** `method`: 'auto' applies the rule above; 'direct' or 'iterative' force one (for tests and benchmarks). */
export interface NodeSolverOptions {
  method?: 'auto' | LinearMethod;
  /** Conjugate-gradient steps before the direct fallback (default CG_MAX_ITERATIONS; for tests). */
  cgMaxIterations?: number;
}

/** Counters of the solves made with one solver (for benchmarks). */
export interface LinearStats {
  solves: number;
  cgIterations: number;
  /** Iterative solves that ended in the direct factor. */
  fallbacks: number;
}

/** A solver of A x = b for one pattern: diagonal plus one off-diagonal value per edge. */
export interface NodeSolver {
  readonly method: LinearMethod;
  readonly stats: LinearStats;
  /**
   * Whether the last solve met the absolute target (|b − A x|∞ ≤ CG_ABSOLUTE_TOLERANCE or the
   * rounding floor); always true after a direct solve.
   */
  readonly lastTight: boolean;
  /**
   * Solves with diagonal `diagonal` and off-diagonal `edgeValue[e]` per edge (repeats add up),
   * `x` holding a starting guess on entry and the answer on return. An iterative solve may stop
   * early once |b − A x|∞ ≤ relativeTolerance · |b − A x₀|∞ (an inexact Newton step; see
   * `lastTight`). False when the matrix is not positive definite to working precision (x is
   * then not meaningful).
   */
  solve(
    diagonal: Float64Array,
    edgeValue: Float64Array,
    b: Float64Array,
    x: Float64Array,
    relativeTolerance?: number,
  ): boolean;
}

const solvers = new PatternCache<NodeSolver>(4);

/** The solver for this pattern (kept per pattern under 'auto'; a new one when a method is forced). */
export function nodeSolverFor(
  size: number,
  edgeA: ArrayLike<number>,
  edgeB: ArrayLike<number>,
  options: NodeSolverOptions = {},
): NodeSolver {
  const method = options.method ?? 'auto';
  if (method === 'direct') return new DirectSolver(new SparseLdl(size, edgeA, edgeB));
  if (method === 'iterative')
    return new IterativeSolver(size, edgeA, edgeB, options.cgMaxIterations ?? CG_MAX_ITERATIONS);
  return solvers.get(size, edgeA, edgeB, () => chooseSolver(size, edgeA, edgeB));
}

function chooseSolver(size: number, edgeA: ArrayLike<number>, edgeB: ArrayLike<number>) {
  if (size < ITERATIVE_MIN_SIZE) return new DirectSolver(new SparseLdl(size, edgeA, edgeB));
  const entries = size + new EdgePattern(size, edgeA, edgeB).columns.length / 2;
  const order = boundedMinimumDegreeOrder(size, edgeA, edgeB, {
    fill: FILL_RATIO * entries,
    work: WORK_RATIO * entries,
  });
  if (order !== null) return new DirectSolver(new SparseLdl(size, edgeA, edgeB, order));
  return new IterativeSolver(size, edgeA, edgeB, CG_MAX_ITERATIONS);
}

class DirectSolver implements NodeSolver {
  readonly method = 'direct';
  readonly lastTight = true;
  readonly stats: LinearStats = { solves: 0, cgIterations: 0, fallbacks: 0 };
  private readonly ldl: SparseLdl;

  constructor(ldl: SparseLdl) {
    this.ldl = ldl;
  }

  solve(diagonal: Float64Array, edgeValue: Float64Array, b: Float64Array, x: Float64Array) {
    this.stats.solves++;
    if (!this.ldl.factor(diagonal, edgeValue)) return false;
    this.ldl.solveInto(b, x);
    return true;
  }
}

class IterativeSolver implements NodeSolver {
  readonly method = 'iterative';
  lastTight = true;
  readonly stats: LinearStats = { solves: 0, cgIterations: 0, fallbacks: 0 };
  private readonly pattern: EdgePattern;
  private readonly matrix: SymmetricMatrix;
  private readonly amg = new AggregationAmg(AMG_CYCLE);
  private readonly work: PcgWork;
  private readonly edgeA: Int32Array;
  private readonly edgeB: Int32Array;
  private direct: SparseLdl | null = null;
  private readonly maxIterations: number;

  constructor(
    size: number,
    edgeA: ArrayLike<number>,
    edgeB: ArrayLike<number>,
    maxIterations: number,
  ) {
    this.maxIterations = maxIterations;
    this.pattern = new EdgePattern(size, edgeA, edgeB);
    this.matrix = this.pattern.matrix();
    this.work = new PcgWork(size);
    this.edgeA = Int32Array.from(edgeA);
    this.edgeB = Int32Array.from(edgeB);
  }

  solve(
    diagonal: Float64Array,
    edgeValue: Float64Array,
    b: Float64Array,
    x: Float64Array,
    relativeTolerance = 0,
  ) {
    this.stats.solves++;
    this.lastTight = true;
    this.pattern.assemble(diagonal, edgeValue, this.matrix);
    if (!x.every(Number.isFinite)) x.fill(0);
    if (this.amg.setup(this.matrix)) {
      const outcome = pcg(
        this.matrix,
        b,
        x,
        (r, z) => this.amg.apply(r, z),
        {
          absoluteTolerance: CG_ABSOLUTE_TOLERANCE,
          roundingFactor: CG_ROUNDING_FACTOR,
          maxIterations: this.maxIterations,
          relativeTolerance,
          flexible: AMG_CYCLE === 'krylov',
        },
        this.work,
      );
      this.stats.cgIterations += outcome.iterations;
      if (outcome.converged) {
        this.lastTight = relativeTolerance === 0 || outcome.residual <= CG_ABSOLUTE_TOLERANCE;
        return true;
      }
    }
    this.stats.fallbacks++;
    this.direct ??= new SparseLdl(
      this.matrix.n,
      this.edgeA,
      this.edgeB,
      minimumDegreeOrder(this.matrix.n, this.edgeA, this.edgeB),
    );
    if (!this.direct.factor(diagonal, edgeValue)) return false;
    this.direct.solveInto(b, x);
    return true;
  }
}
