/**
 * Which pipes are pump suction or discharge lines, for the velocity guidance.
 */
import type { HeadrouteDocument, Id } from '../../model/types';
import { portKey, type HydraulicGraph } from '../network/build';
import type { ElementResults } from '../results';

/** A pipe's service: on a pump's suction side, its discharge side, or neither. */
export type PipeService = 'suction' | 'discharge' | 'other';

const INLINE = new Set(['waypoint', 'fitting', 'control-valve']);

/**
 * Classifies pipes by following the flow through inline elements (waypoints, fittings,
 * control valves): a pipe whose flow reaches a pump's suction port is a suction line; one fed
 * from a pump's discharge port is a discharge line. Junctions, vessels and boundaries end a walk.
 */
export function pipeService(
  doc: HeadrouteDocument,
  graph: HydraulicGraph,
  results: ElementResults,
): Map<Id, PipeService> {
  const service = new Map<Id, PipeService>();
  const otherPort = (kind: string, port: string) =>
    kind === 'waypoint' ? (port === 'in' ? 'out' : 'in') : port === 'in' ? 'out' : 'in';

  /** Walks from a pipe in a direction (+1 downstream, −1 upstream) to the port the line ends on. */
  const walk = (start: Id, direction: 1 | -1): { node: Id; port: string } | null => {
    let id = start;
    const seen = new Set<Id>();
    for (;;) {
      if (seen.has(id)) return null;
      seen.add(id);
      const gp = graph.pipes.get(id)!;
      const forward = (results.pipes[id]?.flow ?? 0) >= 0;
      const end = (direction === 1) === forward ? gp.pipe.to : gp.pipe.from;
      const node = doc.nodes[end.node];
      if (!INLINE.has(node.kind)) return end;
      const next = graph.portPipes.get(portKey(node.id, otherPort(node.kind, end.port)))?.[0];
      if (!next) return null;
      id = next.pipe.id;
    }
  };

  for (const id of graph.pipes.keys()) {
    const down = walk(id, 1);
    if (down && doc.nodes[down.node].kind === 'pump' && down.port === 'suction') {
      service.set(id, 'suction');
      continue;
    }
    const up = walk(id, -1);
    service.set(
      id,
      up && doc.nodes[up.node].kind === 'pump' && up.port === 'discharge' ? 'discharge' : 'other',
    );
  }
  return service;
}
