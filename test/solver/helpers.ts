/**
 * Small builders for test sheets, on top of the model's defaults.
 */
import { createDocument, createNode, createPipe } from '../../src/lib/model/defaults';
import type {
  Boundary,
  Fitting,
  HeadrouteDocument,
  Id,
  Pipe,
  PortRef,
  Pump,
  SheetNode,
  Vessel,
} from '../../src/lib/model/types';
import type { SolveResult } from '../../src/lib/solver/types';
import { expect } from 'vitest';

/** A document plus helpers that add elements to it. */
export class Sheet {
  readonly doc: HeadrouteDocument = createDocument('test');

  node<T extends SheetNode>(kind: T['kind'], id: Id, props: Partial<T> = {}): T {
    const node = { ...createNode(kind, { x: 0, y: 0 }, id), ...props } as T;
    this.doc.nodes[id] = node;
    return node;
  }

  /** An open vessel with one nozzle 'N1' at `nozzleZ`. */
  vessel(
    id: Id,
    level: number,
    props: Partial<Vessel> & { nozzleZ?: number; entranceK?: number; exitK?: number } = {},
  ): Vessel {
    const { nozzleZ = 0, entranceK = 0.5, exitK = 1, ...rest } = props;
    return this.node<Vessel>('vessel', id, {
      z: Math.min(0, nozzleZ),
      liquidLevel: level,
      height: Math.max(level, nozzleZ) + 2,
      nozzles: [{ id: 'N1', z: nozzleZ, entranceK, exitK }],
      ...rest,
    });
  }

  boundary(id: Id, z: number, pressureAbs: number): Boundary {
    return this.node<Boundary>('boundary', id, { z, pressureAbs });
  }

  /** A boundary holding a flow: `outflow` m³/s leaves the sheet there (negative enters). */
  drawOff(id: Id, z: number, outflow: number): Boundary {
    return this.node<Boundary>('boundary', id, { z, holds: 'flow', outflow });
  }

  pump(id: Id, props: Partial<Pump> = {}): Pump {
    return this.node<Pump>('pump', id, props);
  }

  fitting(id: Id, props: Partial<Fitting> = {}): Fitting {
    return this.node<Fitting>('fitting', id, props);
  }

  /** A pipe with a typed bore. */
  pipe(
    id: Id,
    from: PortRef,
    to: PortRef,
    props: { length?: number; diameter?: number; roughness?: number } & Partial<Pipe> = {},
  ): Pipe {
    const { length = 10, diameter = 0.1, roughness = 4.5e-5, ...rest } = props;
    const pipe: Pipe = {
      ...createPipe(from, to, id),
      length,
      bore: { mode: 'typed', innerDiameter: diameter },
      roughness,
      ...rest,
    };
    this.doc.pipes[id] = pipe;
    return pipe;
  }
}

/** Port reference shorthand. */
export const at = (node: Id, port: string): PortRef => ({ node, port });

/** Every number anywhere in the result is finite. */
export function expectAllFinite(value: unknown, path = 'result'): void {
  if (typeof value === 'number') {
    expect(Number.isFinite(value), `${path} = ${value}`).toBe(true);
  } else if (Array.isArray(value)) {
    value.forEach((v, i) => expectAllFinite(v, `${path}[${i}]`));
  } else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) expectAllFinite(v, `${path}.${k}`);
  }
}

/**
 * Conservation checks on a converged result: continuity at every inner port to 1e-9 m³/s
 * (pipes in and out of each two-port element and junction), and the EGL bookkeeping of every
 * pipe and two-port element to 1e-6 m (EGL drop = friction + end losses, = headLoss of a node).
 */
export function expectConservation(doc: HeadrouteDocument, result: SolveResult): void {
  expect(result.converged).toBe(true);
  expect(result.massImbalance).toBeLessThan(1e-9);
  // Continuity per port, from the pipe flows and the node flows.
  const net = new Map<string, number>();
  const add = (node: Id, port: string, q: number) => {
    const n = doc.nodes[node];
    const key = n.kind === 'waypoint' ? `${node}` : `${node}/${port}`;
    net.set(key, (net.get(key) ?? 0) + q);
  };
  for (const [id, pipe] of Object.entries(doc.pipes)) {
    const r = result.pipes[id];
    if (!r) continue;
    add(pipe.from.node, pipe.from.port, -r.flow);
    add(pipe.to.node, pipe.to.port, r.flow);
  }
  for (const [id, node] of Object.entries(doc.nodes)) {
    const r = result.nodes[id];
    if (!r || r.flow === undefined) continue;
    const [a, b] = node.kind === 'pump' ? ['suction', 'discharge'] : ['in', 'out'];
    add(id, a, -r.flow);
    add(id, b, r.flow);
  }
  for (const [key, q] of net) {
    const nodeId = key.split('/')[0];
    const node = doc.nodes[nodeId];
    // A boundary holding a flow takes exactly that flow out of the sheet.
    if (node.kind === 'boundary' && node.holds === 'flow') {
      expect(Math.abs(q - (node.outflow ?? 0)), `outflow at ${key}`).toBeLessThan(1e-9);
      continue;
    }
    // A branch point with a draw-off (or supply) takes exactly that flow out of the sheet.
    if (node.kind === 'junction' && node.outflow !== undefined) {
      expect(Math.abs(q - node.outflow), `draw-off at ${key}`).toBeLessThan(1e-9);
      continue;
    }
    const kind = node.kind;
    if (kind === 'vessel' || kind === 'boundary') continue;
    expect(Math.abs(q), `continuity at ${key}`).toBeLessThan(1e-9);
  }
  // Energy: along each pipe, EGL drop = friction + the loss of the fittings it carries (signed
  // by flow; entrance and exit losses sit outside the pipe-end EGLs).
  for (const [id] of Object.entries(doc.pipes)) {
    const r = result.pipes[id];
    if (!r) continue;
    const sign = r.flow >= 0 ? 1 : -1;
    const drop = (r.totalHeadFrom! - r.totalHeadTo!) * sign;
    const losses = r.frictionLoss + (r.fittingLoss ?? 0);
    expect(Math.abs(drop - losses), `EGL along ${id}`).toBeLessThan(1e-6);
  }
}

/** A k × k grid of 50 m DN150 pipes fed from a 40 m tank at one corner, drawn off along the far edge. */
export function gridSheet(k: number): Sheet {
  const s = new Sheet();
  const id = (i: number, j: number) => `J${i}_${j}`;
  for (let i = 0; i < k; i++)
    for (let j = 0; j < k; j++) s.node('junction', id(i, j), { z: 0.01 * ((i * 7 + j * 3) % 11) });
  let n = 0;
  for (let i = 0; i < k; i++)
    for (let j = 0; j < k; j++) {
      if (i + 1 < k)
        s.pipe(`P${++n}`, at(id(i, j), 'hub'), at(id(i + 1, j), 'hub'), {
          length: 50,
          diameter: 0.15,
        });
      if (j + 1 < k)
        s.pipe(`P${++n}`, at(id(i, j), 'hub'), at(id(i, j + 1), 'hub'), {
          length: 50,
          diameter: 0.15,
        });
    }
  s.vessel('S', 40);
  s.pipe('feed', at('S', 'N1'), at(id(0, 0), 'hub'), { length: 10, diameter: 0.3 });
  for (let m = 0; m < Math.floor(k / 4); m++) {
    s.boundary(`B${m}`, 0, 101_325);
    s.pipe(`out${m}`, at(id(k - 1, 4 * m + 2), 'hub'), at(`B${m}`, 'p'), {
      length: 10,
      diameter: 0.1,
    });
  }
  return s;
}
