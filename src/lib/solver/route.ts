/**
 * Routes along the sheet: a list of node ids in order of flow, the pipes between them, and how
 * to find one. A route passes two-port nodes (fittings, control valves, pumps) from one port to
 * the other, waypoints in one side and out the other, junctions by any other pipe; vessels and
 * boundaries end a search (a stored route may still pass through a vessel).
 */
import type { HeadrouteDocument, Id, Pipe, SheetNode } from '../model/types';
import type { SolveResult } from './types';

/** Flow below which a pipe counts as carrying none, m³/s (then its drawn direction is followed). */
export const NEGLIGIBLE_FLOW = 1e-9;

/** One pipe of a route and the way the route runs along it. */
export interface RouteLeg {
  pipe: Pipe;
  /** True when the route runs from the pipe's `from` end to its `to` end. */
  forward: boolean;
  fromNode: Id;
  fromPort: string;
  toNode: Id;
  toPort: string;
}

/** A route found between two nodes. */
export interface RouteSearch {
  /** Node ids in order along the route, both ends included. */
  route: Id[];
  legs: RouteLeg[];
  /** False when no route follows the flow and this one ignores its direction. */
  followsFlow: boolean;
  /** Plain-words note when the route had to ignore the flow direction. */
  note: string | null;
}

/** A route the profile cannot follow (unknown node, or two nodes with no pipe path between). */
export class RouteError extends Error {}

type Mode = 'flow' | 'any';

interface Edge {
  leg: RouteLeg;
  length: number;
}

/** True for nodes passed from one port to the other: pumps, fittings, control valves, waypoints. */
function passesPortToPort(node: SheetNode): boolean {
  return (
    node.kind === 'pump' ||
    node.kind === 'fitting' ||
    node.kind === 'control-valve' ||
    node.kind === 'waypoint'
  );
}

function has(doc: HeadrouteDocument, id: Id): boolean {
  return Object.hasOwn(doc.nodes, id);
}

function nameOf(doc: HeadrouteDocument, id: Id): string {
  return (has(doc, id) && doc.nodes[id].name) || id;
}

/** Pipes leaving each node, as legs in both directions. */
function adjacency(doc: HeadrouteDocument): Map<Id, Edge[]> {
  const out = new Map<Id, Edge[]>();
  const add = (node: Id, edge: Edge) => {
    const list = out.get(node);
    if (list) list.push(edge);
    else out.set(node, [edge]);
  };
  for (const pipe of Object.values(doc.pipes)) {
    if (!has(doc, pipe.from.node) || !has(doc, pipe.to.node)) continue;
    if (pipe.from.node === pipe.to.node) continue;
    const length = Number.isFinite(pipe.length) && pipe.length > 0 ? pipe.length : 0;
    const [a, b] = [pipe.from, pipe.to];
    add(a.node, {
      length,
      leg: {
        pipe,
        forward: true,
        fromNode: a.node,
        fromPort: a.port,
        toNode: b.node,
        toPort: b.port,
      },
    });
    add(b.node, {
      length,
      leg: {
        pipe,
        forward: false,
        fromNode: b.node,
        fromPort: b.port,
        toNode: a.node,
        toPort: a.port,
      },
    });
  }
  return out;
}

/** True when the leg runs with the pipe's flow (or along its drawn direction when it has none). */
export function legFollowsFlow(leg: RouteLeg, result: SolveResult): boolean {
  const q = result.pipes[leg.pipe.id]?.flow ?? 0;
  if (Math.abs(q) <= NEGLIGIBLE_FLOW) return leg.forward;
  return leg.forward ? q > 0 : q < 0;
}

/**
 * May the route leave `node` by `edge`, having arrived by `arrived` (null at the start)?
 * Two-port nodes and waypoints are passed port to port; in 'flow' mode pumps only from suction
 * to discharge and pipes only with their flow.
 */
function mayLeave(
  doc: HeadrouteDocument,
  result: SolveResult,
  mode: Mode,
  node: SheetNode,
  arrived: RouteLeg | null,
  edge: Edge,
): boolean {
  const leg = edge.leg;
  if (arrived && arrived.pipe.id === leg.pipe.id) return false;
  if (mode === 'flow' && !legFollowsFlow(leg, result)) return false;
  switch (node.kind) {
    case 'pump':
    case 'fitting':
    case 'control-valve':
    case 'waypoint':
      if (arrived && arrived.toPort === leg.fromPort) return false;
      if (mode === 'flow' && node.kind === 'pump' && leg.fromPort !== 'discharge') return false;
      return true;
    case 'junction':
      return true;
    case 'vessel':
    case 'boundary':
      return arrived === null;
  }
}

/** A small binary min-heap of [priority, value]. */
class MinHeap<T> {
  private items: Array<[number, T]> = [];
  get size(): number {
    return this.items.length;
  }
  push(priority: number, value: T): void {
    const a = this.items;
    a.push([priority, value]);
    let i = a.length - 1;
    while (i > 0) {
      const p = (i - 1) >> 1;
      if (a[p][0] <= a[i][0]) break;
      [a[p], a[i]] = [a[i], a[p]];
      i = p;
    }
  }
  pop(): [number, T] {
    const a = this.items;
    const top = a[0];
    const last = a.pop()!;
    if (a.length > 0) {
      a[0] = last;
      let i = 0;
      for (;;) {
        const l = 2 * i + 1;
        const r = l + 1;
        let m = i;
        if (l < a.length && a[l][0] < a[m][0]) m = l;
        if (r < a.length && a[r][0] < a[m][0]) m = r;
        if (m === i) break;
        [a[m], a[i]] = [a[i], a[m]];
        i = m;
      }
    }
    return top;
  }
}

interface Reached {
  distance: number;
  /** The leg that arrived here, null at the start. */
  leg: RouteLeg | null;
  previous: string | null;
}

/** Key of a search state: a node and the port the route arrived on. */
function stateKey(node: Id, port: string | null): string {
  return `${node}\u0000${port ?? ''}`;
}

/**
 * Shortest paths by developed length from `start` (Dijkstra), states being (node, arrival
 * port). Vessels and boundaries other than the start are reached but not passed.
 */
function shortestPaths(
  doc: HeadrouteDocument,
  result: SolveResult,
  mode: Mode,
  start: Id,
  edges: Map<Id, Edge[]>,
  stopAt?: Id,
): Map<string, Reached> {
  const reached = new Map<string, Reached>();
  const done = new Set<string>();
  const startKey = stateKey(start, null);
  reached.set(startKey, { distance: 0, leg: null, previous: null });
  const heap = new MinHeap<string>();
  heap.push(0, startKey);
  while (heap.size > 0) {
    const [distance, key] = heap.pop();
    if (done.has(key)) continue;
    done.add(key);
    const here = reached.get(key)!;
    const nodeId = here.leg ? here.leg.toNode : start;
    if (stopAt !== undefined && nodeId === stopAt) break;
    if (here.leg && nodeId === start) continue;
    const node = doc.nodes[nodeId];
    for (const edge of edges.get(nodeId) ?? []) {
      if (!mayLeave(doc, result, mode, node, here.leg, edge)) continue;
      // A tiny charge per leg prefers fewer legs among routes of equal length.
      const next = distance + edge.length + 1e-9;
      const nextKey = stateKey(edge.leg.toNode, edge.leg.toPort);
      const known = reached.get(nextKey);
      if (known && known.distance <= next) continue;
      reached.set(nextKey, { distance: next, leg: edge.leg, previous: key });
      heap.push(next, nextKey);
    }
  }
  return reached;
}

function trace(reached: Map<string, Reached>, key: string): RouteLeg[] {
  const legs: RouteLeg[] = [];
  let at: string | null = key;
  while (at !== null) {
    const r: Reached = reached.get(at)!;
    if (r.leg) legs.push(r.leg);
    at = r.previous;
  }
  return legs.reverse();
}

function bestArrival(reached: Map<string, Reached>, node: Id, start: Id): string | null {
  let best: string | null = null;
  let distance = Infinity;
  for (const [key, r] of reached) {
    if (!r.leg || r.leg.toNode !== node || node === start) continue;
    if (r.distance < distance) [best, distance] = [key, r.distance];
  }
  return best;
}

function nodesOf(start: Id, legs: RouteLeg[]): Id[] {
  return [start, ...legs.map((l) => l.toNode)];
}

/**
 * The shortest route (by developed length) from `from` to `to` that follows the flow of
 * `result`: pipes with their flow (drawn direction where there is none), pumps from suction to
 * discharge. When none exists, the shortest route ignoring the flow direction, with a note.
 * Null when the nodes are unknown, the same, or not joined by pipes.
 */
export function searchRoute(
  doc: HeadrouteDocument,
  result: SolveResult,
  from: Id,
  to: Id,
): RouteSearch | null {
  if (!has(doc, from) || !has(doc, to) || from === to) return null;
  const edges = adjacency(doc);
  for (const mode of ['flow', 'any'] as const) {
    const reached = shortestPaths(doc, result, mode, from, edges, to);
    const key = bestArrival(reached, to, from);
    if (key === null) continue;
    const legs = trace(reached, key);
    const followsFlow = mode === 'flow';
    return {
      route: nodesOf(from, legs),
      legs,
      followsFlow,
      note: followsFlow
        ? null
        : `No route follows the flow from “${nameOf(doc, from)}” to “${nameOf(doc, to)}”; this one ignores the flow direction, so parts of it run against the flow.`,
    };
  }
  return null;
}

/** `searchRoute`'s node list: the shortest route along the flow (or, failing that, any). */
export function findRoute(
  doc: HeadrouteDocument,
  result: SolveResult,
  fromNode: Id,
  toNode: Id,
): Id[] | null {
  return searchRoute(doc, result, fromNode, toNode)?.route ?? null;
}

/** Most search starts `defaultRoute` tries, so a huge sheet stays quick. */
const MAX_DEFAULT_SOURCES = 64;

/**
 * A sensible route to show first: from a vessel or boundary the flow leaves, along the flow to
 * another vessel or boundary, preferring routes through the most pumps and then the longest.
 * Falls back to the drawn directions of the pipes when nothing flows. Null when no two
 * vessels or boundaries are joined by pipes.
 */
export function defaultRoute(doc: HeadrouteDocument, result: SolveResult): Id[] | null {
  const edges = adjacency(doc);
  const ends = Object.values(doc.nodes)
    .filter((n) => n.kind === 'vessel' || n.kind === 'boundary')
    .map((n) => n.id)
    .sort();
  const outflow = (id: Id) =>
    (edges.get(id) ?? []).reduce((sum, e) => {
      const q = result.pipes[e.leg.pipe.id]?.flow ?? 0;
      return sum + Math.max(0, e.leg.forward ? q : -q);
    }, 0);
  const sources = [...ends].sort((a, b) => outflow(b) - outflow(a)).slice(0, MAX_DEFAULT_SOURCES);
  let best: { legs: RouteLeg[]; start: Id; pumps: number; length: number } | null = null;
  for (const start of sources) {
    const reached = shortestPaths(doc, result, 'flow', start, edges);
    for (const end of ends) {
      if (end === start) continue;
      const key = bestArrival(reached, end, start);
      if (key === null) continue;
      const legs = trace(reached, key);
      const nodes = nodesOf(start, legs);
      const pumps = nodes.filter((id) => doc.nodes[id].kind === 'pump').length;
      const length = reached.get(key)!.distance;
      if (!best || pumps > best.pumps || (pumps === best.pumps && length > best.length + 1e-9)) {
        best = { legs, start, pumps, length };
      }
    }
  }
  return best ? nodesOf(best.start, best.legs) : null;
}

/** Picks the pipe between two consecutive route nodes. */
function directLeg(
  doc: HeadrouteDocument,
  result: SolveResult,
  edges: Map<Id, Edge[]>,
  a: Id,
  b: Id,
  arrived: RouteLeg | null,
): RouteLeg | null {
  const node = doc.nodes[a];
  const candidates = (edges.get(a) ?? []).filter((e) => {
    if (e.leg.toNode !== b) return false;
    if (arrived && arrived.pipe.id === e.leg.pipe.id) return false;
    return !(passesPortToPort(node) && arrived && arrived.toPort === e.leg.fromPort);
  });
  candidates.sort(
    (x, y) =>
      Number(legFollowsFlow(y.leg, result)) - Number(legFollowsFlow(x.leg, result)) ||
      x.length - y.length,
  );
  return candidates[0]?.leg ?? null;
}

/**
 * The pipes of a route given as node ids. Consecutive nodes joined by a pipe take that pipe
 * (the one with the flow, then the shortest); nodes not joined directly are bridged by
 * `searchRoute`. Throws RouteError naming the node at fault when the route cannot be followed.
 */
export function routeLegs(
  doc: HeadrouteDocument,
  result: SolveResult,
  route: readonly Id[],
): { nodes: Id[]; legs: RouteLeg[]; notes: string[] } {
  for (const id of route) {
    if (!has(doc, id))
      throw new RouteError(`The route names a node “${id}” that is not on the sheet.`);
  }
  if (route.length < 2) throw new RouteError('A route needs at least two nodes.');
  const edges = adjacency(doc);
  const legs: RouteLeg[] = [];
  const notes: string[] = [];
  for (let i = 0; i + 1 < route.length; i++) {
    const [a, b] = [route[i], route[i + 1]];
    const leg = directLeg(doc, result, edges, a, b, legs[legs.length - 1] ?? null);
    if (leg) {
      legs.push(leg);
      continue;
    }
    const bridge = searchRoute(doc, result, a, b);
    if (!bridge) {
      throw new RouteError(
        `No pipe path joins “${nameOf(doc, a)}” to “${nameOf(doc, b)}” on the route.`,
      );
    }
    if (bridge.note) notes.push(bridge.note);
    legs.push(...bridge.legs);
  }
  return { nodes: nodesOf(route[0], legs), legs, notes };
}
