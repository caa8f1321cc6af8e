/**
 * Symmetric sparse matrices in compressed rows (both triangles stored, diagonal apart), the
 * form the iterative solver works on: products, residuals, assembly from the node equations'
 * edge lists, and Galerkin coarse operators Pᵀ A P for a piecewise-constant prolongation P
 * (each fine unknown belongs to at most one aggregate; Vaněk, Mandel and Brezina, 1996,
 * "Algebraic multigrid by smoothed aggregation for second and fourth order elliptic problems",
 * Computing 56, §2, with the tentative prolongator unsmoothed).
 */

/** A symmetric matrix: `diagonal` plus the off-diagonal entries of each row. */
export interface SymmetricMatrix {
  /** Number of unknowns. */
  n: number;
  /** a_ii. */
  diagonal: Float64Array;
  /** Row i's off-diagonal entries are columns/values[rowStart[i] … rowStart[i + 1] − 1]. */
  rowStart: Int32Array;
  columns: Int32Array;
  values: Float64Array;
}

/** y = A x (y must not be x). */
export function multiplyInto(a: SymmetricMatrix, x: Float64Array, y: Float64Array): void {
  const { n, diagonal, rowStart, columns, values } = a;
  for (let i = 0; i < n; i++) {
    let s = diagonal[i] * x[i];
    const end = rowStart[i + 1];
    for (let p = rowStart[i]; p < end; p++) s += values[p] * x[columns[p]];
    y[i] = s;
  }
}

/** r = b − A x; returns max |r_i|. */
export function residualInto(
  a: SymmetricMatrix,
  b: ArrayLike<number>,
  x: Float64Array,
  r: Float64Array,
): number {
  const { n, diagonal, rowStart, columns, values } = a;
  let worst = 0;
  for (let i = 0; i < n; i++) {
    let s = b[i] - diagonal[i] * x[i];
    const end = rowStart[i + 1];
    for (let p = rowStart[i]; p < end; p++) s -= values[p] * x[columns[p]];
    r[i] = s;
    const m = Math.abs(s);
    if (!(m <= worst)) worst = m; // a NaN stays NaN
  }
  return worst;
}

/**
 * The compressed-row pattern of the matrix with a diagonal and one off-diagonal pair per edge
 * (self-loops dropped, repeated pairs summed), and where each edge's two entries go.
 */
export class EdgePattern {
  readonly n: number;
  readonly rowStart: Int32Array;
  readonly columns: Int32Array;
  /** Slot of edge e's entry in row edgeA[e] and in row edgeB[e] (−1 for a self-loop). */
  private readonly slotA: Int32Array;
  private readonly slotB: Int32Array;

  constructor(n: number, edgeA: ArrayLike<number>, edgeB: ArrayLike<number>) {
    this.n = n;
    const m = edgeA.length;
    const start = new Int32Array(n + 1);
    for (let e = 0; e < m; e++) {
      if (edgeA[e] === edgeB[e]) continue;
      start[edgeA[e] + 1]++;
      start[edgeB[e] + 1]++;
    }
    for (let i = 0; i < n; i++) start[i + 1] += start[i];
    // Raw rows with repeats, then each row compacted to its distinct columns.
    const raw = new Int32Array(start[n]);
    const rawEdge = new Int32Array(start[n]);
    const fill = start.slice(0, n);
    for (let e = 0; e < m; e++) {
      const a = edgeA[e];
      const b = edgeB[e];
      if (a === b) continue;
      rawEdge[fill[a]] = e;
      raw[fill[a]++] = b;
      rawEdge[fill[b]] = e;
      raw[fill[b]++] = a;
    }
    this.slotA = new Int32Array(m).fill(-1);
    this.slotB = new Int32Array(m).fill(-1);
    const rowStart = new Int32Array(n + 1);
    const columns: number[] = [];
    const where = new Int32Array(n).fill(-1);
    for (let i = 0; i < n; i++) {
      rowStart[i] = columns.length;
      for (let p = start[i]; p < start[i + 1]; p++) {
        const j = raw[p];
        if (where[j] < rowStart[i]) {
          where[j] = columns.length;
          columns.push(j);
        }
        const e = rawEdge[p];
        if (edgeA[e] === i) this.slotA[e] = where[j];
        else this.slotB[e] = where[j];
      }
    }
    rowStart[n] = columns.length;
    this.rowStart = rowStart;
    this.columns = Int32Array.from(columns);
  }

  /** A matrix of this pattern with its values zeroed. */
  matrix(): SymmetricMatrix {
    return {
      n: this.n,
      diagonal: new Float64Array(this.n),
      rowStart: this.rowStart,
      columns: this.columns,
      values: new Float64Array(this.columns.length),
    };
  }

  /** Loads `diagonal` and each edge's off-diagonal value `edgeValue[e]` into `into`. */
  assemble(diagonal: ArrayLike<number>, edgeValue: ArrayLike<number>, into: SymmetricMatrix): void {
    for (let i = 0; i < this.n; i++) into.diagonal[i] = diagonal[i];
    const values = into.values;
    values.fill(0);
    for (let e = 0; e < this.slotA.length; e++) {
      const s = this.slotA[e];
      if (s < 0) continue;
      values[s] += edgeValue[e];
      values[this.slotB[e]] += edgeValue[e];
    }
  }
}

/**
 * The Galerkin operator Pᵀ A P for aggregates `aggregate[i]` ∈ [0, coarseSize) (or −1: the
 * unknown is left to the smoother, P's row is zero): a_IJ = Σ a_ij over i ∈ I, j ∈ J, and the
 * entries inside an aggregate add to its diagonal.
 */
export function galerkin(
  a: SymmetricMatrix,
  aggregate: Int32Array,
  coarseSize: number,
): SymmetricMatrix {
  const { n, diagonal, rowStart, columns, values } = a;
  const memberStart = new Int32Array(coarseSize + 1);
  for (let i = 0; i < n; i++) if (aggregate[i] >= 0) memberStart[aggregate[i] + 1]++;
  for (let c = 0; c < coarseSize; c++) memberStart[c + 1] += memberStart[c];
  const members = new Int32Array(memberStart[coarseSize]);
  const fill = memberStart.slice(0, coarseSize);
  for (let i = 0; i < n; i++) if (aggregate[i] >= 0) members[fill[aggregate[i]]++] = i;

  const coarseDiagonal = new Float64Array(coarseSize);
  const coarseStart = new Int32Array(coarseSize + 1);
  // A coarse row has at most its members' entries: the fine count bounds the coarse one.
  const coarseColumns = new Int32Array(columns.length);
  const coarseValues = new Float64Array(columns.length);
  let used = 0;
  const where = new Int32Array(coarseSize).fill(-1);
  for (let c = 0; c < coarseSize; c++) {
    const rowBegin = used;
    coarseStart[c] = rowBegin;
    let d = 0;
    for (let m = memberStart[c]; m < memberStart[c + 1]; m++) {
      const i = members[m];
      d += diagonal[i];
      for (let p = rowStart[i]; p < rowStart[i + 1]; p++) {
        const cj = aggregate[columns[p]];
        if (cj < 0) continue;
        if (cj === c) {
          d += values[p];
          continue;
        }
        if (where[cj] < rowBegin) {
          where[cj] = used;
          coarseColumns[used] = cj;
          coarseValues[used++] = values[p];
        } else coarseValues[where[cj]] += values[p];
      }
    }
    coarseDiagonal[c] = d;
  }
  coarseStart[coarseSize] = used;
  return {
    n: coarseSize,
    diagonal: coarseDiagonal,
    rowStart: coarseStart,
    columns: coarseColumns.slice(0, used),
    values: coarseValues.slice(0, used),
  };
}
