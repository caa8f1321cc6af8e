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

  type End = { node: Id; port: string } | null;
  const memo: Array<Map<Id, End>> = [new Map(), new Map()];

  /**
   * The port a line ends on, walking from a pipe with (+1) or against (−1) the flow; every pipe
   * passed on the way gets the same answer, so the whole sheet costs O(pipes).
   */
  const walk = (start: Id, direction: 1 | -1): End => {
    const known = memo[direction === 1 ? 0 : 1];
    const chain: Id[] = [];
    const seen = new Set<Id>();
    let id = start;
    let end: End = null;
    for (;;) {
      if (known.has(id)) {
        end = known.get(id)!;
        break;
      }
      if (seen.has(id)) break;
      seen.add(id);
      chain.push(id);
      const gp = graph.pipes.get(id)!;
      const forward = (results.pipes[id]?.flow ?? 0) >= 0;
      const ref = (direction === 1) === forward ? gp.pipe.to : gp.pipe.from;
      const node = doc.nodes[ref.node];
      if (!INLINE.has(node.kind)) {
        end = ref;
        break;
      }
      const next = graph.portPipes.get(portKey(node.id, otherPort(node.kind, ref.port)))?.[0];
      if (!next) break;
      id = next.pipe.id;
    }
    for (const c of chain) known.set(c, end);
    return end;
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
