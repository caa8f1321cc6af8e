/**
 * Pairwise aggregation of the unknowns of a symmetric M-matrix, applied twice for aggregates of
 * up to four ("double pairwise aggregation": Notay, 2010, "An aggregation-based algebraic
 * multigrid method", Electronic Transactions on Numerical Analysis 37, pp. 123–146, §4).
 *
 * One pass: unknowns whose row is strongly diagonally dominant (a_ii ≥ 5 Σ_{j≠i} |a_ij|, the
 * paper's set G; factor 5 from memory) are left out of every aggregate, the smoother alone
 * treats them. Every other unknown, in index order, is paired with its strongest remaining
 * neighbour j (largest −a_ij) among the strong ones (−a_ij ≥ β max_k −a_ik, β = 0.25 from
 * memory). Our own departure from the paper: an unknown with no strong neighbour left joins the
 * pair of its strongest strong neighbour (making a triple) instead of staying alone, and stays
 * alone only when there is none. Without it the coarsest levels kept ~70 % of their unknowns
 * (singletons) on the benchmark grids and coarsening stalled.
 */
import { galerkin, type SymmetricMatrix } from './symmetric';

/** Strength threshold β of the pairing. */
export const STRENGTH = 0.25;
/** Diagonal dominance above which an unknown is left out of the aggregates. */
export const DOMINANCE = 5;

/** Aggregates of the unknowns: `aggregate[i]` ∈ [0, count), or −1 for an unknown left out. */
export interface Aggregates {
  aggregate: Int32Array;
  count: number;
}

/** One pass of pairwise aggregation (see the module comment). */
export function pairwiseAggregates(a: SymmetricMatrix): Aggregates {
  const { n, diagonal, rowStart, columns, values } = a;
  const aggregate = new Int32Array(n).fill(-2); // −2: not yet placed
  const size = new Int32Array(n);
  let count = 0;
  for (let i = 0; i < n; i++) {
    let absSum = 0;
    for (let p = rowStart[i]; p < rowStart[i + 1]; p++) absSum += Math.abs(values[p]);
    if (diagonal[i] >= DOMINANCE * absSum) aggregate[i] = -1;
  }
  for (let i = 0; i < n; i++) {
    if (aggregate[i] !== -2) continue;
    const start = rowStart[i];
    const end = rowStart[i + 1];
    let strongest = 0;
    for (let p = start; p < end; p++) strongest = Math.max(strongest, -values[p]);
    const threshold = STRENGTH * strongest;
    let best = -1;
    let bestValue = 0;
    for (let p = start; p < end; p++) {
      const j = columns[p];
      const s = -values[p];
      if (aggregate[j] !== -2 || j === i || s <= 0 || s < threshold) continue;
      if (best < 0 || s > bestValue) {
        best = j;
        bestValue = s;
      }
    }
    if (best >= 0) {
      aggregate[i] = count;
      aggregate[best] = count;
      size[count++] = 2;
      continue;
    }
    // No free strong neighbour: join the pair of the strongest already-placed neighbour.
    let host = -1;
    let hostValue = 0;
    for (let p = start; p < end; p++) {
      const c = aggregate[columns[p]];
      const s = -values[p];
      if (c < 0 || size[c] >= 3 || s <= 0 || s < threshold) continue;
      if (host < 0 || s > hostValue) {
        host = c;
        hostValue = s;
      }
    }
    if (host >= 0) {
      aggregate[i] = host;
      size[host]++;
    } else {
      aggregate[i] = count;
      size[count++] = 1;
    }
  }
  return { aggregate, count };
}

/**
 * Two passes of pairwise aggregation (the second on the Galerkin operator of the first), composed
 * into aggregates of mostly four fine unknowns (at most nine), and the coarse operator Pᵀ A P.
 */
export function doublePairwiseAggregates(a: SymmetricMatrix): {
  aggregates: Aggregates;
  coarse: SymmetricMatrix;
} {
  const first = pairwiseAggregates(a);
  const middle = galerkin(a, first.aggregate, first.count);
  const second = pairwiseAggregates(middle);
  const aggregate = new Int32Array(a.n);
  for (let i = 0; i < a.n; i++) {
    const m = first.aggregate[i];
    aggregate[i] = m < 0 ? -1 : second.aggregate[m];
  }
  return {
    aggregates: { aggregate, count: second.count },
    coarse: galerkin(middle, second.aggregate, second.count),
  };
}
