/**
 * Sparse LDLᵀ factorisation of a symmetric positive-definite matrix with a fixed sparsity
 * pattern, for the node equations of the global gradient method (chosen, or not, by
 * linearSolver.ts) and the coarsest level of the multigrid preconditioner (amg.ts). The pattern
 * and its minimum-degree ordering are worked out once; each iteration only refactors the numbers.
 *
 * Numeric factorisation: left-looking column LDLᵀ (George and Liu, 1981, "Computer Solution of
 * Large Sparse Positive Definite Systems", ch. 2 and 5): column j gathers the updates of every
 * earlier column k with L[j][k] ≠ 0, then is scaled by its pivot. Cost is the flop count of the
 * factor, which is O(n) for trees and series lines.
 */
import { minimumDegreeOrder, type EliminationOrder } from './ordering';
import { clearPatternCaches, PatternCache } from './patternCache';

/** Patterns kept for reuse across solves (most recent last). */
const PATTERN_CACHE_SIZE = 4;
const patternCache = new PatternCache<SparseLdl>(PATTERN_CACHE_SIZE);

/**
 * A factoriser for this pattern, reusing the ordering and symbolic factorisation of an earlier
 * call with the same size and edge lists (the last few patterns are kept). Re-solving a sheet
 * whose connections did not change (a value edited, another case) skips the ordering; the
 * numbers are the same as with a new `SparseLdl`: each column of `factor` loads its entries
 * before use, so no state of an earlier factorisation is read.
 */
export function sparseLdlFor(
  size: number,
  edgeA: ArrayLike<number>,
  edgeB: ArrayLike<number>,
): SparseLdl {
  return patternCache.get(size, edgeA, edgeB, () => new SparseLdl(size, edgeA, edgeB));
}

/**
 * Forgets every kept pattern (this module's and the node-equation solvers' of linearSolver.ts),
 * so the next solve of any sheet orders its matrix afresh (for tests).
 */
export function clearPatternCache(): void {
  clearPatternCaches();
}

/** A symmetric sparse matrix pattern (diagonal plus the given off-diagonal pairs), factorised numerically on demand. */
export class SparseLdl {
  /** Number of unknowns. */
  readonly size: number;
  private readonly order: EliminationOrder;
  /** For each edge, the index into `values` of its below-diagonal entry, or −1 for a self-loop. */
  private readonly edgeSlot: Int32Array;
  /** Row-wise lists of the earlier columns that have an entry in each row (CSR over steps). */
  private readonly rowStart: Int32Array;
  private readonly rowColumns: Int32Array;
  private readonly values: Float64Array;
  private readonly pivots: Float64Array;
  private readonly work: Float64Array;
  private readonly next: Int32Array;

  /**
   * @param size number of unknowns
   * @param edgeA first end of each off-diagonal pair (original indices)
   * @param edgeB second end of each off-diagonal pair
   * @param order the pattern's elimination order when already worked out (by default, its
   *   minimum-degree order)
   */
  constructor(
    size: number,
    edgeA: ArrayLike<number>,
    edgeB: ArrayLike<number>,
    order: EliminationOrder = minimumDegreeOrder(size, edgeA, edgeB),
  ) {
    this.size = size;
    this.order = order;
    const { columnStart, rows, inverse } = this.order;
    this.values = new Float64Array(rows.length);
    this.pivots = new Float64Array(size);
    this.work = new Float64Array(size);
    this.next = new Int32Array(size);

    this.edgeSlot = new Int32Array(edgeA.length);
    for (let e = 0; e < edgeA.length; e++) {
      const i = inverse[edgeA[e]];
      const j = inverse[edgeB[e]];
      if (i === j) {
        this.edgeSlot[e] = -1;
        continue;
      }
      const column = Math.min(i, j);
      const row = Math.max(i, j);
      this.edgeSlot[e] = findSorted(rows, columnStart[column], columnStart[column + 1], row);
    }

    const counts = new Int32Array(size + 1);
    for (let p = 0; p < rows.length; p++) counts[rows[p] + 1]++;
    for (let i = 0; i < size; i++) counts[i + 1] += counts[i];
    this.rowStart = counts.slice();
    this.rowColumns = new Int32Array(rows.length);
    const fill = counts.slice(0, size);
    for (let k = 0; k < size; k++) {
      for (let p = columnStart[k]; p < columnStart[k + 1]; p++)
        this.rowColumns[fill[rows[p]]++] = k;
    }
  }

  /**
   * Factorises the matrix with diagonal `diagonal` (original indexing) and off-diagonal value
   * `edgeValue[e]` for each edge (repeated pairs add up). Returns false when a pivot is not
   * positive (the matrix is not positive definite to working precision).
   */
  factor(diagonal: ArrayLike<number>, edgeValue: ArrayLike<number>): boolean {
    const { perm, columnStart, rows } = this.order;
    const values = this.values;
    const pivots = this.pivots;
    const x = this.work;
    const next = this.next;
    const rowStart = this.rowStart;
    const rowColumns = this.rowColumns;
    values.fill(0);
    for (let e = 0; e < this.edgeSlot.length; e++) {
      const slot = this.edgeSlot[e];
      if (slot >= 0) values[slot] += edgeValue[e];
    }
    for (let k = 0; k < this.size; k++) next[k] = columnStart[k];

    for (let j = 0; j < this.size; j++) {
      let d = diagonal[perm[j]];
      const start = columnStart[j];
      const end = columnStart[j + 1];
      for (let p = start; p < end; p++) x[rows[p]] = values[p];
      const rowEnd = rowStart[j + 1];
      for (let r = rowStart[j]; r < rowEnd; r++) {
        const k = rowColumns[r];
        const p = next[k]; // position of row j in column k (rows ascend, j ascends)
        const ljk = values[p];
        const t = ljk * pivots[k];
        d -= ljk * t;
        const kEnd = columnStart[k + 1];
        for (let q = p + 1; q < kEnd; q++) x[rows[q]] -= values[q] * t;
        next[k] = p + 1;
      }
      if (!(d > 0) || !Number.isFinite(d)) {
        // Each column loads its own entries before use, so this only keeps the state tidy.
        for (let p = start; p < end; p++) x[rows[p]] = 0;
        return false;
      }
      pivots[j] = d;
      for (let p = start; p < end; p++) {
        const row = rows[p];
        values[p] = x[row] / d;
        x[row] = 0;
      }
    }
    return true;
  }

  /** Solves A x = b with the last factorisation; `b` and the result use original indexing. */
  solve(b: ArrayLike<number>): Float64Array {
    return this.solveInto(b, new Float64Array(this.size));
  }

  /** As `solve`, writing x into `result` (length `size`, not `b`) and returning it. */
  solveInto(b: ArrayLike<number>, result: Float64Array): Float64Array {
    const { perm, columnStart, rows } = this.order;
    const n = this.size;
    const y = this.work;
    const values = this.values;
    const pivots = this.pivots;
    for (let j = 0; j < n; j++) y[j] = b[perm[j]];
    for (let j = 0; j < n; j++) {
      const yj = y[j];
      const end = columnStart[j + 1];
      if (yj !== 0) for (let p = columnStart[j]; p < end; p++) y[rows[p]] -= values[p] * yj;
    }
    for (let j = 0; j < n; j++) y[j] /= pivots[j];
    for (let j = n - 1; j >= 0; j--) {
      let s = y[j];
      const end = columnStart[j + 1];
      for (let p = columnStart[j]; p < end; p++) s -= values[p] * y[rows[p]];
      y[j] = s;
    }
    for (let j = 0; j < n; j++) {
      result[perm[j]] = y[j];
      y[j] = 0; // `factor` expects its work vector clear
    }
    return result;
  }

  /** Number of stored below-diagonal entries of the factor (fill included). */
  get factorEntries(): number {
    return this.order.rows.length;
  }
}

function findSorted(rows: Int32Array, from: number, to: number, value: number): number {
  let lo = from;
  let hi = to - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const v = rows[mid];
    if (v === value) return mid;
    if (v < value) lo = mid + 1;
    else hi = mid - 1;
  }
  throw new Error('Sparse pattern is missing an entry of the matrix');
}
