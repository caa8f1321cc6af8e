/**
 * Minimum-degree elimination ordering for a symmetric sparsity pattern, with the fill it
 * produces. The greedy rule (eliminate a node of least current degree; its neighbours become a
 * clique) is the minimum-degree heuristic of Tinney and Walker (1967), "Direct solutions of
 * sparse network equations by optimally ordered triangular factorization", Proc. IEEE 55(11).
 * On a tree or a series line it eliminates leaves first and produces no fill at all, so the
 * factor costs O(n); on looped networks the fill stays local.
 */

import { forestOrder } from './forestOrder';
import { KeyHeap } from './keyHeap';

/** An elimination order and, for each eliminated node, the later nodes its column touches. */
export interface EliminationOrder {
  /** perm[step] = original node index eliminated at that step. */
  perm: Int32Array;
  /** inverse[node] = step at which the original node is eliminated. */
  inverse: Int32Array;
  /** Column pointers into `rows` (length n + 1), one column per step. */
  columnStart: Int32Array;
  /** Row indices (in step numbering, ascending within a column) of the factor's below-diagonal entries. */
  rows: Int32Array;
}

/**
 * Minimum-degree ordering of the graph on `n` nodes with the given undirected edges
 * (self-loops and repeated edges are ignored), returning the factor's sparsity pattern.
 *
 * The elimination graph is kept as a quotient graph (George and Liu, 1989, "The evolution of
 * the minimum degree ordering algorithm", SIAM Review 31(1)): an eliminated node becomes an
 * "element" holding the list of its remaining neighbours (the clique it leaves behind) instead
 * of adding that clique's edges to every neighbour; elements next to the eliminated node are
 * absorbed into the new one. A node's degree is the exact size of the union of its remaining
 * neighbours and its elements' lists, so the order (least degree first, ties to the lower
 * index) and the fill are those of the explicit elimination graph.
 */
export function minimumDegreeOrder(
  n: number,
  edgeA: ArrayLike<number>,
  edgeB: ArrayLike<number>,
): EliminationOrder {
  return forestOrder(n, edgeA, edgeB) ?? quotientGraphOrder(n, edgeA, edgeB, UNBOUNDED)!;
}

/** Limits for `boundedMinimumDegreeOrder`. */
export interface OrderingBudget {
  /** Most below-diagonal entries of the factor. */
  fill: number;
  /** Most list entries visited by the degree updates (the ordering's own work). */
  work: number;
}

const UNBOUNDED: OrderingBudget = { fill: Infinity, work: Infinity };

/**
 * As `minimumDegreeOrder`, but gives up (null) as soon as the factor's below-diagonal entries
 * would exceed `budget.fill` or the degree updates would visit more than `budget.work` list
 * entries. On a forest, a series line or a ladder the work stays a small multiple of the
 * pattern's entries; on a 2-D mesh it grows with the mesh's width (about 70 per entry at 400
 * nodes, 2,600 at 50,000), so a work budget bounds the time spent finding out that a pattern
 * is too costly for a direct solve.
 */
export function boundedMinimumDegreeOrder(
  n: number,
  edgeA: ArrayLike<number>,
  edgeB: ArrayLike<number>,
  budget: OrderingBudget,
): EliminationOrder | null {
  return forestOrder(n, edgeA, edgeB) ?? quotientGraphOrder(n, edgeA, edgeB, budget);
}

/** Minimum degree on the quotient graph, for any pattern (see minimumDegreeOrder); null over the budget. */
function quotientGraphOrder(
  n: number,
  edgeA: ArrayLike<number>,
  edgeB: ArrayLike<number>,
  budget: OrderingBudget,
): EliminationOrder | null {
  const variables = distinctNeighbours(n, edgeA, edgeB);
  const elementsOf: number[][] = Array.from({ length: n }, () => []);
  /** elementVariables[e]: the live nodes next to element e (the eliminated node e). */
  const elementVariables: number[][] = new Array<number[]>(n);
  const eliminated = new Uint8Array(n);
  const absorbed = new Uint8Array(n);
  const degree = new Int32Array(n);
  const mark = new Int32Array(n);
  let stamp = 0;
  // Keys degree·n + node: least degree first, ties to the lower index; stale keys skipped.
  const heap = new KeyHeap(2 * n);
  for (let i = 0; i < n; i++) {
    degree[i] = variables[i].length;
    heap.push(degree[i] * n + i);
  }

  const perm = new Int32Array(n);
  const inverse = new Int32Array(n);
  const columns: number[][] = [];
  let entries = 0;
  let work = 0;
  let step = 0;
  while (step < n) {
    if (heap.size === 0) break;
    const key = heap.pop();
    const v = key % n;
    if (eliminated[v] || (key - v) / n !== degree[v]) continue; // stale heap entry
    eliminated[v] = 1;
    perm[step] = v;
    inverse[v] = step;
    step++;

    // The new element's list: v's live neighbours and the lists of v's elements (absorbed).
    const list: number[] = [];
    mark[v] = ++stamp;
    for (const u of variables[v]) {
      if (eliminated[u] || mark[u] === stamp) continue;
      mark[u] = stamp;
      list.push(u);
    }
    for (const e of elementsOf[v]) {
      if (absorbed[e]) continue;
      for (const u of elementVariables[e]) {
        if (eliminated[u] || mark[u] === stamp) continue;
        mark[u] = stamp;
        list.push(u);
      }
      absorbed[e] = 1;
      elementVariables[e] = [];
    }
    elementVariables[v] = list;
    columns.push(list);
    entries += list.length;
    if (entries > budget.fill) return null;
    variables[v] = [];
    elementsOf[v] = [];

    // Each neighbour drops absorbed elements and the neighbours now reached through v.
    const listed = stamp;
    for (const u of list) {
      const elements = elementsOf[u];
      let kept = 0;
      for (const e of elements) if (!absorbed[e]) elements[kept++] = e;
      elements.length = kept;
      elements.push(v);
      const neighbours = variables[u];
      kept = 0;
      for (const w of neighbours) if (!eliminated[w] && mark[w] !== listed) neighbours[kept++] = w;
      neighbours.length = kept;
    }
    for (const u of list) {
      mark[u] = ++stamp;
      let d = 0;
      for (const w of variables[u]) {
        if (mark[w] === stamp) continue;
        mark[w] = stamp;
        d++;
      }
      work += variables[u].length;
      for (const e of elementsOf[u]) {
        work += elementVariables[e].length;
        for (const w of elementVariables[e]) {
          if (mark[w] === stamp) continue;
          mark[w] = stamp;
          d++;
        }
      }
      degree[u] = d;
      heap.push(d * n + u);
    }
    if (work > budget.work) return null;
  }

  const columnStart = new Int32Array(n + 1);
  for (let j = 0; j < n; j++) columnStart[j + 1] = columnStart[j] + columns[j].length;
  const rows = new Int32Array(columnStart[n]);
  for (let j = 0; j < n; j++) {
    const column = columns[j];
    const start = columnStart[j];
    for (let p = 0; p < column.length; p++) rows[start + p] = inverse[column[p]];
    rows.subarray(start, start + column.length).sort();
  }
  return { perm, inverse, columnStart, rows };
}

/** Each node's distinct neighbours (self-loops and repeated edges dropped). */
function distinctNeighbours(
  n: number,
  edgeA: ArrayLike<number>,
  edgeB: ArrayLike<number>,
): number[][] {
  const lists: number[][] = Array.from({ length: n }, () => []);
  for (let e = 0; e < edgeA.length; e++) {
    const a = edgeA[e];
    const b = edgeB[e];
    if (a === b) continue;
    lists[a].push(b);
    lists[b].push(a);
  }
  const seen = new Int32Array(n).fill(-1);
  for (let i = 0; i < n; i++) {
    const list = lists[i];
    let kept = 0;
    for (const w of list) {
      if (seen[w] === i) continue;
      seen[w] = i;
      list[kept++] = w;
    }
    list.length = kept;
  }
  return lists;
}
