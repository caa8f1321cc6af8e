/**
 * Minimum-degree elimination ordering for a symmetric sparsity pattern, with the fill it
 * produces. The greedy rule (eliminate a node of least current degree; its neighbours become a
 * clique) is the minimum-degree heuristic of Tinney and Walker (1967), "Direct solutions of
 * sparse network equations by optimally ordered triangular factorization", Proc. IEEE 55(11).
 * On a tree or a series line it eliminates leaves first and produces no fill at all, so the
 * factor costs O(n); on looped networks the fill stays local.
 */

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

/** A binary min-heap of (degree, node) pairs with lazy deletion. */
class DegreeHeap {
  private keys: number[] = [];
  private nodes: number[] = [];

  push(key: number, node: number): void {
    const keys = this.keys;
    const nodes = this.nodes;
    let i = keys.length;
    keys.push(key);
    nodes.push(node);
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (!this.less(i, parent)) break;
      this.swap(i, parent);
      i = parent;
    }
  }

  /** Removes and returns the smallest entry, or null when empty. */
  pop(): { key: number; node: number } | null {
    const keys = this.keys;
    const nodes = this.nodes;
    if (keys.length === 0) return null;
    const top = { key: keys[0], node: nodes[0] };
    const lastKey = keys.pop()!;
    const lastNode = nodes.pop()!;
    if (keys.length > 0) {
      keys[0] = lastKey;
      nodes[0] = lastNode;
      let i = 0;
      for (;;) {
        const l = 2 * i + 1;
        const r = l + 1;
        let m = i;
        if (l < keys.length && this.less(l, m)) m = l;
        if (r < keys.length && this.less(r, m)) m = r;
        if (m === i) break;
        this.swap(i, m);
        i = m;
      }
    }
    return top;
  }

  private less(a: number, b: number): boolean {
    const ka = this.keys[a];
    const kb = this.keys[b];
    return ka < kb || (ka === kb && this.nodes[a] < this.nodes[b]);
  }

  private swap(a: number, b: number): void {
    const k = this.keys[a];
    this.keys[a] = this.keys[b];
    this.keys[b] = k;
    const n = this.nodes[a];
    this.nodes[a] = this.nodes[b];
    this.nodes[b] = n;
  }
}

/**
 * Minimum-degree ordering of the graph on `n` nodes with the given undirected edges
 * (self-loops and repeated edges are ignored), returning the factor's sparsity pattern.
 */
export function minimumDegreeOrder(
  n: number,
  edgeA: ArrayLike<number>,
  edgeB: ArrayLike<number>,
): EliminationOrder {
  const adjacency: Array<Set<number>> = Array.from({ length: n }, () => new Set<number>());
  for (let e = 0; e < edgeA.length; e++) {
    const a = edgeA[e];
    const b = edgeB[e];
    if (a === b) continue;
    adjacency[a].add(b);
    adjacency[b].add(a);
  }
  const heap = new DegreeHeap();
  for (let i = 0; i < n; i++) heap.push(adjacency[i].size, i);

  const eliminated = new Uint8Array(n);
  const perm = new Int32Array(n);
  const inverse = new Int32Array(n);
  const columns: number[][] = [];
  let step = 0;
  while (step < n) {
    const entry = heap.pop();
    if (entry === null) break;
    const v = entry.node;
    if (eliminated[v] || entry.key !== adjacency[v].size) continue; // stale heap entry
    eliminated[v] = 1;
    perm[step] = v;
    inverse[v] = step;
    step++;
    const neighbours = Array.from(adjacency[v]);
    columns.push(neighbours);
    // The neighbours of v form a clique once v is eliminated (the fill).
    for (const u of neighbours) {
      const set = adjacency[u];
      set.delete(v);
      for (const w of neighbours) if (w !== u) set.add(w);
    }
    for (const u of neighbours) heap.push(adjacency[u].size, u);
    adjacency[v].clear();
  }

  const columnStart = new Int32Array(n + 1);
  for (let j = 0; j < n; j++) columnStart[j + 1] = columnStart[j] + columns[j].length;
  const rows = new Int32Array(columnStart[n]);
  for (let j = 0; j < n; j++) {
    const mapped = columns[j].map((node) => inverse[node]).sort((x, y) => x - y);
    rows.set(mapped, columnStart[j]);
  }
  return { perm, inverse, columnStart, rows };
}
