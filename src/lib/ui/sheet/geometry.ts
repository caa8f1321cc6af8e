/**
 * Drawing geometry for the sheet: where pipes run between ports, and where their labels go.
 * Pure functions of the document; no DOM.
 */
import { portPosition } from '../../model/ports';
import type { HeadrouteDocument, Pipe, PortRef, SheetNode } from '../../model/types';

export interface Point {
  x: number;
  y: number;
}

/** Length of the straight lead out of a port before a pipe turns, sheet units. */
export const PORT_LEAD = 14;

/** Outward direction of a port along x: +1 right, −1 left, 0 for a centre port (junction hub). */
export function portDirection(node: SheetNode, port: string): -1 | 0 | 1 {
  const p = portPosition(node, port);
  const dx = p.x - node.x;
  return Math.abs(dx) < 1e-9 ? 0 : dx > 0 ? 1 : -1;
}

/** Where a port ref sits on the sheet, or null when its node is missing. */
export function portPoint(doc: HeadrouteDocument, ref: PortRef): Point | null {
  const node = Object.hasOwn(doc.nodes, ref.node) ? doc.nodes[ref.node] : undefined;
  return node ? portPosition(node, ref.port) : null;
}

/**
 * Orthogonal route between two ports: a short lead out of each port along its direction, then
 * horizontal–vertical–horizontal through the middle. Collinear points are dropped.
 */
export function orthogonalRoute(a: Point, dirA: number, b: Point, dirB: number): Point[] {
  const a1 = { x: a.x + dirA * PORT_LEAD, y: a.y };
  const b1 = { x: b.x + dirB * PORT_LEAD, y: b.y };
  const midX = (a1.x + b1.x) / 2;
  const raw = [a, a1, { x: midX, y: a1.y }, { x: midX, y: b1.y }, b1, b];
  return simplify(raw);
}

/** Drop repeated and collinear interior points of an axis-aligned polyline. */
export function simplify(points: Point[]): Point[] {
  const out: Point[] = [];
  for (const p of points) {
    const last = out[out.length - 1];
    if (last && Math.abs(last.x - p.x) < 1e-9 && Math.abs(last.y - p.y) < 1e-9) continue;
    if (out.length >= 2) {
      const prev = out[out.length - 2];
      const collinear =
        (Math.abs(prev.x - last.x) < 1e-9 && Math.abs(last.x - p.x) < 1e-9) ||
        (Math.abs(prev.y - last.y) < 1e-9 && Math.abs(last.y - p.y) < 1e-9);
      if (collinear) out.pop();
    }
    out.push(p);
  }
  return out;
}

/** The route a pipe is drawn along, or null when an end node is missing. */
export function pipeRoute(doc: HeadrouteDocument, pipe: Pipe): Point[] | null {
  const from = doc.nodes[pipe.from.node];
  const to = doc.nodes[pipe.to.node];
  if (!from || !to) return null;
  return routeBetween(pipe, from, to);
}

/** The route of a pipe between its two end nodes (given, so a view can pass the records). */
export function routeBetween(pipe: Pipe, from: SheetNode, to: SheetNode): Point[] {
  return orthogonalRoute(
    portPosition(from, pipe.from.port),
    portDirection(from, pipe.from.port),
    portPosition(to, pipe.to.port),
    portDirection(to, pipe.to.port),
  );
}

/** SVG path data for a polyline. */
export function polylinePath(points: Point[]): string {
  return points.map((p, i) => `${i === 0 ? 'M' : 'L'} ${p.x} ${p.y}`).join(' ');
}

/**
 * Midpoint of the longest segment of a polyline and that segment's angle (degrees, along the
 * polyline's direction): where a pipe's flow arrow and label go.
 */
export function labelAnchor(points: Point[]): { x: number; y: number; angle: number } {
  let best = { x: points[0]?.x ?? 0, y: points[0]?.y ?? 0, angle: 0 };
  let bestLength = -1;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1];
    const b = points[i];
    const length = Math.hypot(b.x - a.x, b.y - a.y);
    if (length > bestLength) {
      bestLength = length;
      best = {
        x: (a.x + b.x) / 2,
        y: (a.y + b.y) / 2,
        angle: (Math.atan2(b.y - a.y, b.x - a.x) * 180) / Math.PI,
      };
    }
  }
  return best;
}

/** For each node, the names of its ports that have a pipe (from the document's pipes). */
export function connectedPortsOf(pipes: HeadrouteDocument['pipes']): Map<string, Set<string>> {
  const map = new Map<string, Set<string>>();
  for (const p of Object.values(pipes)) {
    for (const end of [p.from, p.to]) {
      let set = map.get(end.node);
      if (!set) map.set(end.node, (set = new Set()));
      set.add(end.port);
    }
  }
  return map;
}

/** Reuse the previous map's port sets where their contents did not change. */
export function keepSameSets(
  previous: Map<string, Set<string>> | null,
  next: Map<string, Set<string>>,
): Map<string, Set<string>> {
  if (!previous) return next;
  for (const [id, set] of next) {
    const old = previous.get(id);
    if (old && old.size === set.size && [...set].every((p) => old.has(p))) next.set(id, old);
  }
  return next;
}
