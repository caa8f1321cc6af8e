/**
 * Runs of pipe: pipes joined end to end through pass-through waypoints (a waypoint with exactly
 * two pipes), as an engineer reads one line on an isometric between two real parts.
 */
import type { HeadrouteDocument, Id, PortRef } from './types';

/** The run of pipes a pipe belongs to: pipes joined end to end through plain waypoints. */
export interface PipeRun {
  /** Where the run starts and ends (ports of nodes that are not pass-through waypoints). */
  start: PortRef;
  end: PortRef;
  /** The run's pipes, from start to end. */
  pipes: Id[];
  /** The waypoints between them, from start to end. */
  waypoints: Id[];
}

/** Pipes on each node, for walking runs. */
function pipesByNode(doc: HeadrouteDocument): Map<Id, Id[]> {
  const map = new Map<Id, Id[]>();
  for (const pipe of Object.values(doc.pipes)) {
    for (const node of [pipe.from.node, pipe.to.node]) {
      const list = map.get(node);
      if (list) list.push(pipe.id);
      else map.set(node, [pipe.id]);
    }
  }
  return map;
}

/**
 * The run through `pipeId`: walked from the pipe's `from` end back and its `to` end forward
 * through waypoints that carry exactly two pipes. Null when the walk closes on itself (a ring
 * of waypoints with no other part on it).
 */
export function pipeRun(doc: HeadrouteDocument, pipeId: Id): PipeRun | null {
  const byNode = pipesByNode(doc);
  const walk = (
    first: Id,
    from: PortRef,
  ): { pipes: Id[]; waypoints: Id[]; end: PortRef } | null => {
    const pipes: Id[] = [];
    const waypoints: Id[] = [];
    let pipe = doc.pipes[first];
    let at = from; // the far end of `pipe`, seen from where the walk came
    for (;;) {
      const node = doc.nodes[at.node];
      const on = byNode.get(at.node) ?? [];
      if (node?.kind !== 'waypoint' || on.length !== 2) return { pipes, waypoints, end: at };
      const next = on[0] === pipe.id ? on[1] : on[0];
      if (next === first || pipes.includes(next)) return null;
      waypoints.push(at.node);
      pipes.push(next);
      pipe = doc.pipes[next];
      at = pipe.from.node === at.node ? pipe.to : pipe.from;
    }
  };
  const pipe = doc.pipes[pipeId];
  const back = walk(pipeId, pipe.from);
  const ahead = walk(pipeId, pipe.to);
  if (!back || !ahead) return null;
  return {
    start: back.end,
    end: ahead.end,
    pipes: [...back.pipes.reverse(), pipeId, ...ahead.pipes],
    waypoints: [...back.waypoints.reverse(), ...ahead.waypoints],
  };
}
