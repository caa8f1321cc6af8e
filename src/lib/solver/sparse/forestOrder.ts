/**
 * Minimum-degree ordering of a forest (no cycles: series lines, branched networks). Every
 * forest has a node of degree 0 or 1, and eliminating one joins no neighbours, so the greedy
 * rule of Tinney and Walker (1967) — least degree first, ties to the lower index — peels
 * leaves and never fills in. This finds exactly the order and pattern the general quotient-
 * graph code (ordering.ts) finds, with flat typed arrays and no element lists, so that the
 * first solve of a branched sheet (before the code is optimised by the engine) stays cheap.
 */
import { KeyHeap } from './keyHeap';
import type { EliminationOrder } from './ordering';

/**
 * The minimum-degree order of the graph on `n` nodes with the given undirected edges
 * (self-loops and repeated edges ignored) when it is a forest, or null when it has a cycle.
 */
export function forestOrder(
  n: number,
  edgeA: ArrayLike<number>,
  edgeB: ArrayLike<number>,
): EliminationOrder | null {
  const adjacency = distinctAdjacency(n, edgeA, edgeB);
  if (adjacency === null) return null;
  const { start, end, list, degree } = adjacency;

  // Heap of keys degree·n + node (exact in a double for any size this solver meets): the least
  // key is the least degree, ties to the lower index. Stale keys are skipped when popped.
  const heap = new KeyHeap(2 * n + 1);
  for (let i = 0; i < n; i++) heap.push(degree[i] * n + i);
  const eliminated = new Uint8Array(n);
  const perm = new Int32Array(n);
  const inverse = new Int32Array(n);
  /** The one later node each eliminated node's column touches, or −1 (original numbering). */
  const parent = new Int32Array(n).fill(-1);
  let step = 0;
  while (step < n && heap.size > 0) {
    const key = heap.pop();
    const v = key % n;
    if (eliminated[v] || (key - v) / n !== degree[v]) continue; // stale entry
    eliminated[v] = 1;
    perm[step] = v;
    inverse[v] = step;
    step++;
    for (let p = start[v]; p < end[v]; p++) {
      const u = list[p];
      if (eliminated[u]) continue;
      parent[v] = u; // degree ≤ 1: at most one live neighbour
      degree[u]--;
      heap.push(degree[u] * n + u);
    }
  }
  const columnStart = new Int32Array(n + 1);
  for (let j = 0; j < n; j++) columnStart[j + 1] = columnStart[j] + (parent[perm[j]] >= 0 ? 1 : 0);
  const rows = new Int32Array(columnStart[n]);
  for (let j = 0; j < n; j++) {
    const u = parent[perm[j]];
    if (u >= 0) rows[columnStart[j]] = inverse[u];
  }
  return { perm, inverse, columnStart, rows };
}

/**
 * Each node's distinct neighbours, list[start[i]] … list[end[i] − 1], and their counts; null when the graph
 * has a cycle (checked by union–find over the distinct edges).
 */
function distinctAdjacency(
  n: number,
  edgeA: ArrayLike<number>,
  edgeB: ArrayLike<number>,
): { start: Int32Array; end: Int32Array; list: Int32Array; degree: Int32Array } | null {
  const start = new Int32Array(n + 1);
  for (let e = 0; e < edgeA.length; e++) {
    if (edgeA[e] === edgeB[e]) continue;
    start[edgeA[e] + 1]++;
    start[edgeB[e] + 1]++;
  }
  for (let i = 0; i < n; i++) start[i + 1] += start[i];
  const list = new Int32Array(start[n]);
  const fill = start.slice(0, n);
  for (let e = 0; e < edgeA.length; e++) {
    const a = edgeA[e];
    const b = edgeB[e];
    if (a === b) continue;
    list[fill[a]++] = b;
    list[fill[b]++] = a;
  }
  // Drop repeated neighbours in place (each list keeps its first occurrences, in order).
  const seen = new Int32Array(n).fill(-1);
  const degree = new Int32Array(n);
  const end = new Int32Array(n);
  const parent = new Int32Array(n);
  for (let i = 0; i < n; i++) parent[i] = i;
  for (let i = 0; i < n; i++) {
    let kept = start[i];
    for (let p = start[i]; p < start[i + 1]; p++) {
      const w = list[p];
      if (seen[w] === i) continue;
      seen[w] = i;
      list[kept++] = w;
      if (w > i) {
        // A distinct edge i–w: a cycle when both ends are already joined.
        const ri = root(parent, i);
        const rw = root(parent, w);
        if (ri === rw) return null;
        parent[ri] = rw;
      }
    }
    degree[i] = kept - start[i];
    end[i] = kept;
  }
  return { start, end, list, degree };
}

function root(parent: Int32Array, i: number): number {
  while (parent[i] !== i) {
    parent[i] = parent[parent[i]];
    i = parent[i];
  }
  return i;
}
