/**
 * Marks along the route that come from the stations: where each node sits, the steps of the
 * grade lines at nodes, and the vessel liquid levels at the route ends.
 */
import type { Id, NodeKind, SheetNode } from '../model/types';
import type { Station } from '../solver/types';
import type { LevelMark, ProfileGeometry, Step } from './profileTypes';

/** Consecutive stations on the same element. */
export function groupRuns(stations: readonly Station[]): Station[][] {
  const runs: Station[][] = [];
  for (const s of stations) {
    const run = runs[runs.length - 1];
    if (run && run[0].elementId === s.elementId) run.push(s);
    else runs.push([s]);
  }
  return runs;
}

/** Where a node of the route sits: its chainage and the pipe elevation there, m. */
export interface NodePlace {
  elementId: Id;
  kind: NodeKind | null;
  chainage: number;
  elevation: number;
}

/**
 * Where each node of the route sits. Pipe runs k and k + 1 meet at route node k + 1, so nodes
 * without stations of their own (waypoints, junctions; vessels, which only have a level
 * station) are found at the pipe ends. Without a matching route, nodes with stations are used.
 */
export function nodePlaces(
  route: readonly Id[],
  line: readonly Station[],
  kindOf: (id: Id) => NodeKind | null,
): NodePlace[] {
  const place = (elementId: Id, s: Station): NodePlace => ({
    elementId,
    kind: kindOf(elementId),
    chainage: s.chainage,
    elevation: s.elevation,
  });
  const runs = groupRuns(line.filter((s) => s.at === 'pipe'));
  if (route.length >= 2 && runs.length === route.length - 1) {
    // The first station of each node of its own, looked up once (a find per node was
    // quadratic in the route's length).
    const ownOf = new Map<Id, Station>();
    for (const s of line) if (s.at !== 'pipe' && !ownOf.has(s.elementId)) ownOf.set(s.elementId, s);
    return route.map((id, k) => {
      const own = ownOf.get(id);
      if (own) return place(id, own);
      return place(id, k < runs.length ? runs[k][0] : runs[k - 1][runs[k - 1].length - 1]);
    });
  }
  const places: NodePlace[] = [];
  for (const s of line) {
    if (s.at === 'pipe' || places.some((m) => m.elementId === s.elementId)) continue;
    places.push(place(s.elementId, s));
  }
  return places;
}

/** The steps of the HGL at nodes: a 'node-in' station followed by the same node's 'node-out'. */
export function nodeSteps(
  line: readonly Station[],
  x: (c: number) => number,
  y: (h: number) => number,
): Step[] {
  const steps: Step[] = [];
  for (let i = 0; i + 1 < line.length; i++) {
    const a = line[i];
    const b = line[i + 1];
    if (a.at !== 'node-in' || b.at !== 'node-out' || a.elementId !== b.elementId) continue;
    if (!Number.isFinite(a.hgl) || !Number.isFinite(b.hgl) || a.hgl === b.hgl) continue;
    steps.push({
      elementId: a.elementId,
      x: x(a.chainage),
      yIn: y(a.hgl),
      yOut: y(b.hgl),
      direction: b.hgl > a.hgl ? 'rise' : 'drop',
    });
  }
  return steps;
}

const LEVEL_MARK_LENGTH = 28;

/** Short marks for vessel liquid surfaces: from level stations, else from the document's level. */
export function levelMarks(
  stations: readonly Station[],
  nodes: Record<Id, SheetNode> | undefined,
  x: (c: number) => number,
  y: (h: number) => number,
  plot: ProfileGeometry['plot'],
): LevelMark[] {
  const ends = [stations[0], stations[stations.length - 1]].filter(Boolean);
  const marks: LevelMark[] = [];
  const mid = plot.left + plot.width / 2;
  for (const s of stations) {
    if (s.at !== 'level' || !Number.isFinite(s.elevation)) continue;
    marks.push(levelMark(s.elementId, x(s.chainage), y(s.elevation), mid));
  }
  // A vessel at a route end without a level station: draw its level from the document.
  for (const s of ends) {
    const node = nodes?.[s.elementId];
    if (node?.kind !== 'vessel' || marks.some((m) => m.elementId === s.elementId)) continue;
    marks.push(levelMark(s.elementId, x(s.chainage), y(node.liquidLevel), mid));
  }
  return marks;
}

function levelMark(elementId: Id, px: number, py: number, mid: number): LevelMark {
  // Drawn inside the plot, next to the route end the vessel sits at.
  return px <= mid
    ? { elementId, x1: px, x2: px + LEVEL_MARK_LENGTH, y: py }
    : { elementId, x1: px - LEVEL_MARK_LENGTH, x2: px, y: py };
}
