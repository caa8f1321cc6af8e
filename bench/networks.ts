/**
 * Generated sheets for the benchmark: one long series route, a branching tree and a looped
 * grid, each with about the asked number of pipes. Invented plant, water at 20 °C.
 */
import { createDocument, createNode, createPipe } from '../src/lib/model/defaults';
import type { Boundary, HeadrouteDocument, Id, PortRef, SheetNode } from '../src/lib/model/types';

/** The shapes the benchmark solves. */
export type Shape = 'series' | 'tree' | 'grid';

function builder(name: string) {
  const doc = createDocument(name);
  const node = <T extends SheetNode>(kind: T['kind'], id: Id, props: Partial<T> = {}): T => {
    const n = { ...createNode(kind, { x: 0, y: 0 }, id), ...props } as T;
    doc.nodes[id] = n;
    return n;
  };
  let pipes = 0;
  const pipe = (from: PortRef, to: PortRef, length: number, diameter: number) => {
    const id = `L${++pipes}`;
    doc.pipes[id] = {
      ...createPipe(from, to, id),
      name: id,
      length,
      bore: { mode: 'typed', innerDiameter: diameter },
    };
  };
  return { doc, node, pipe, count: () => pipes };
}

/** An open tank with one nozzle 'N1' at its bottom. */
function tankProps(level: number, nozzleZ: number) {
  return {
    z: nozzleZ,
    liquidLevel: level,
    height: level - nozzleZ + 2,
    nozzles: [{ id: 'N1', z: nozzleZ, entranceK: 0.5, exitK: 1 }],
  };
}

/** Tank → n pipes through n − 1 waypoints that rise and fall → tank; 10 m pipes, 100 mm bore. */
function series(n: number): HeadrouteDocument {
  const b = builder(`series ${n}`);
  const length = 10;
  // Head enough for about 1 % of hydraulic gradient over the whole line.
  b.node('vessel', 'S', tankProps(10 + 0.01 * n * length, 0));
  b.node('vessel', 'T', tankProps(2, 0));
  let prev: PortRef = { node: 'S', port: 'N1' };
  for (let i = 1; i < n; i++) {
    const id = `W${i}`;
    b.node('waypoint', id, { z: 3 * Math.sin(i / 7) });
    b.pipe(prev, { node: id, port: 'in' }, length, 0.1);
    prev = { node: id, port: 'out' };
  }
  b.pipe(prev, { node: 'T', port: 'N1' }, length, 0.1);
  return b.doc;
}

/** Tank → a binary tree of junctions; its leaves are boundaries at atmospheric pressure. */
function tree(n: number): HeadrouteDocument {
  const b = builder(`tree ${n}`);
  b.node('vessel', 'S', tankProps(60, 0));
  b.node('junction', 'J0', { z: 0 });
  b.pipe({ node: 'S', port: 'N1' }, { node: 'J0', port: 'hub' }, 20, 0.3);
  const queue: Array<{ id: Id; depth: number }> = [{ id: 'J0', depth: 0 }];
  const parents = new Set<Id>();
  /** The pipe that feeds each junction, so a leaf's pipe can be moved onto its boundary port. */
  const feed = new Map<Id, Id>();
  let next = 1;
  for (let head = 0; b.count() < n && head < queue.length; head++) {
    const parent = queue[head];
    for (let c = 0; c < 2 && b.count() < n; c++) {
      const id = `J${next++}`;
      b.node('junction', id, { z: 0 });
      const diameter = Math.max(0.025, 0.3 * Math.pow(0.8, parent.depth + 1));
      b.pipe({ node: parent.id, port: 'hub' }, { node: id, port: 'hub' }, 30, diameter);
      feed.set(id, `L${b.count()}`);
      parents.add(parent.id);
      queue.push({ id, depth: parent.depth + 1 });
    }
  }
  // Leaves become boundaries at atmospheric pressure: the liquid leaves the sheet there.
  for (const [id, pipeId] of feed) {
    if (parents.has(id)) continue;
    const boundary = createNode('boundary', { x: 0, y: 0 }, id) as Boundary;
    b.doc.nodes[id] = { ...boundary, z: 0, pressureAbs: 101_325 };
    b.doc.pipes[pipeId].to.port = 'p';
  }
  return b.doc;
}

/** A k × k grid of junctions (2k(k − 1) pipes of 50 m): tank at one corner, boundaries along the far edge. */
function grid(n: number): HeadrouteDocument {
  const k = Math.max(2, Math.round(Math.sqrt(n / 2)));
  const b = builder(`grid ${k}x${k}`);
  const id = (i: number, j: number) => `J${i}_${j}`;
  for (let i = 0; i < k; i++)
    for (let j = 0; j < k; j++) b.node('junction', id(i, j), { z: 0.01 * ((i * 7 + j * 3) % 11) });
  for (let i = 0; i < k; i++)
    for (let j = 0; j < k; j++) {
      if (i + 1 < k)
        b.pipe({ node: id(i, j), port: 'hub' }, { node: id(i + 1, j), port: 'hub' }, 50, 0.15);
      if (j + 1 < k)
        b.pipe({ node: id(i, j), port: 'hub' }, { node: id(i, j + 1), port: 'hub' }, 50, 0.15);
    }
  b.node('vessel', 'S', tankProps(40, 0));
  b.pipe({ node: 'S', port: 'N1' }, { node: id(0, 0), port: 'hub' }, 10, 0.3);
  const outlets = Math.max(1, Math.floor(k / 4));
  for (let m = 0; m < outlets; m++) {
    const j = Math.min(k - 1, Math.round(((m + 1) * (k - 1)) / outlets));
    const bid = `B${m}`;
    b.node('boundary', bid, { z: 0, pressureAbs: 101_325 });
    b.pipe({ node: id(k - 1, j), port: 'hub' }, { node: bid, port: 'p' }, 10, 0.1);
  }
  return b.doc;
}

/** A generated sheet of the given shape with about `pipes` pipes. */
export function network(shape: Shape, pipes: number): HeadrouteDocument {
  return shape === 'series' ? series(pipes) : shape === 'tree' ? tree(pipes) : grid(pipes);
}
