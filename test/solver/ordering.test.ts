import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { minimumDegreeOrder } from '../../src/lib/solver/sparse/ordering';
import { sparseLdlFor } from '../../src/lib/solver/sparse/ldl';
import { forestOrder } from '../../src/lib/solver/sparse/forestOrder';

/**
 * Reference minimum-degree elimination on the explicit elimination graph (Tinney and Walker,
 * 1967): eliminate the node of least degree (ties to the lower index), then join its
 * neighbours into a clique. Written here independently of the quotient-graph implementation,
 * as a plain O(n²) scan, to check that both give the same order and the same fill.
 */
function referenceOrder(n: number, a: number[], b: number[]) {
  const adj = Array.from({ length: n }, () => new Set<number>());
  a.forEach((x, e) => {
    if (x !== b[e]) {
      adj[x].add(b[e]);
      adj[b[e]].add(x);
    }
  });
  const done = new Array<boolean>(n).fill(false);
  const perm: number[] = [];
  const columns: number[][] = [];
  for (let step = 0; step < n; step++) {
    let v = -1;
    for (let i = 0; i < n; i++) if (!done[i] && (v < 0 || adj[i].size < adj[v].size)) v = i;
    done[v] = true;
    perm.push(v);
    const nb = [...adj[v]];
    columns.push(nb);
    for (const u of nb) {
      adj[u].delete(v);
      for (const w of nb) if (w !== u) adj[u].add(w);
    }
    adj[v].clear();
  }
  const inverse = new Array<number>(n);
  perm.forEach((v, s) => (inverse[v] = s));
  const rows = columns.map((c) => c.map((v) => inverse[v]).sort((x, y) => x - y));
  return { perm, rows };
}

function gridEdges(k: number) {
  const a: number[] = [];
  const b: number[] = [];
  const edge = (p: number, q: number) => {
    a.push(p);
    b.push(q);
  };
  for (let i = 0; i < k; i++)
    for (let j = 0; j < k; j++) {
      if (i + 1 < k) edge(i * k + j, (i + 1) * k + j);
      if (j + 1 < k) edge(i * k + j, i * k + j + 1);
    }
  return { a, b };
}

function expectSameAsReference(n: number, a: number[], b: number[]) {
  const ref = referenceOrder(n, a, b);
  const got = minimumDegreeOrder(n, a, b);
  expect(Array.from(got.perm)).toEqual(ref.perm);
  for (let j = 0; j < n; j++) {
    const column = Array.from(got.rows.subarray(got.columnStart[j], got.columnStart[j + 1]));
    expect(column).toEqual(ref.rows[j]);
  }
}

describe('minimum-degree ordering on the quotient graph', () => {
  it('gives the order and fill of explicit elimination on a 15 × 15 grid', () => {
    const { a, b } = gridEdges(15);
    expectSameAsReference(225, a, b);
  });

  it('gives the order and fill of explicit elimination on random graphs (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 40 }),
        fc.array(fc.tuple(fc.nat(), fc.nat()), { maxLength: 120 }),
        (n, edges) => {
          const a = edges.map(([i]) => i % n);
          const b = edges.map(([, j]) => j % n);
          expectSameAsReference(n, a, b);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('a reused pattern factorises and solves exactly as a new one, also after a failed factorisation', () => {
    const { a, b } = gridEdges(6);
    const n = 36;
    const first = sparseLdlFor(n, a, b);
    const again = sparseLdlFor(n, a.slice(), b.slice());
    expect(again).toBe(first); // same pattern: the symbolic work is reused
    const off = a.map((_, e) => -1 - (e % 3));
    const diag = new Float64Array(n);
    a.forEach((x, e) => {
      diag[x] -= off[e];
      diag[b[e]] -= off[e];
    });
    diag[0] += 1; // grounded: positive definite
    const rhs = Array.from({ length: n }, (_, i) => Math.sin(i));
    expect(first.factor(diag, off)).toBe(true);
    const x1 = first.solve(rhs);
    // An indefinite matrix fails part-way through; the next factorisation must not notice.
    const bad = diag.map((d, i) => (i === 20 ? -d : d));
    expect(again.factor(bad, off)).toBe(false);
    expect(again.factor(diag, off)).toBe(true);
    const x2 = again.solve(rhs);
    expect(Array.from(x2)).toEqual(Array.from(x1));
  });
});

describe('minimum-degree ordering of forests (leaf peeling, sparse/forestOrder.ts)', () => {
  it('gives the order and pattern of explicit elimination on random forests (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 60 }),
        fc.array(fc.tuple(fc.nat(), fc.nat(), fc.boolean()), { maxLength: 80 }),
        (n, picks) => {
          // Each node i > 0 may hang on an earlier node (a forest); some edges are repeated,
          // reversed or self-loops, which the ordering must ignore.
          const a: number[] = [];
          const b: number[] = [];
          const parentOf = new Map<number, number>();
          picks.forEach(([i, j, flip]) => {
            const child = 1 + (i % Math.max(1, n - 1));
            if (child >= n) return;
            // One parent per node keeps it a forest; picking the same one again repeats the edge.
            const parent = parentOf.get(child) ?? j % child;
            parentOf.set(child, parent);
            a.push(flip ? parent : child);
            b.push(flip ? child : parent);
            if (j % 7 === 0) {
              a.push(child);
              b.push(child);
            }
          });
          expect(forestOrder(n, a, b)).not.toBeNull();
          expectSameAsReference(n, a, b);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('answers null for a graph with a cycle, which the quotient-graph code then orders', () => {
    expect(forestOrder(3, [0, 1, 2], [1, 2, 0])).toBeNull();
    expect(forestOrder(4, [0, 1, 1], [1, 0, 2])).not.toBeNull(); // a repeated edge is no cycle
  });

  it('a 2,000-node series line and a binary tree: order of explicit elimination, no fill', () => {
    const line = { a: [] as number[], b: [] as number[] };
    // Numbered from the middle out, so ties and leaf order are not just the index order.
    for (let i = 1; i < 2000; i++) {
      line.a.push((i * 7919) % 2000);
      line.b.push(((i - 1) * 7919) % 2000);
    }
    expectSameAsReference(2000, line.a, line.b);
    const tree = { a: [] as number[], b: [] as number[] };
    for (let i = 1; i < 1023; i++) {
      tree.a.push(i);
      tree.b.push((i - 1) >> 1);
    }
    expectSameAsReference(1023, tree.a, tree.b);
    expect(minimumDegreeOrder(1023, tree.a, tree.b).rows.length).toBe(1022);
  });
});
