/**
 * Which pipes are pump suction or discharge lines, for the velocity guidance.
 */
import type { HydraulicGraph } from '../network/build';
import type { IndexedResults } from '../results';

/** A pipe's service, as `pipeService` codes it: neither suction nor discharge. */
export const OTHER = 0;
/** On a pump's suction side. */
export const SUCTION = 1;
/** On a pump's discharge side. */
export const DISCHARGE = 2;

/** Memo value of a pipe not walked yet (any other value: the end's port slot, or −1 for none). */
const UNKNOWN = -2;

/**
 * Classifies pipes by following the flow through inline elements (waypoints, fittings,
 * control valves): a pipe whose flow reaches a pump's suction port is a suction line; one fed
 * from a pump's discharge port is a discharge line. Junctions, vessels and boundaries end a walk.
 * Returns a code (OTHER, SUCTION, DISCHARGE) for each pipe of graph.pipeList.
 */
export function pipeService(graph: HydraulicGraph, indexed: IndexedResults): Uint8Array {
  const { pipeList, sheetNodes, slotOwner, portStart, portPipeStart, portPipeList } = graph;
  const n = pipeList.length;
  const service = new Uint8Array(n);
  /** Port slot each walk ends on, with (index 0) and against (1) the flow; −1: no end. */
  const memo = [new Int32Array(n).fill(UNKNOWN), new Int32Array(n).fill(UNKNOWN)];
  /** Walk number that last passed each pipe (a loop of inline elements ends the walk). */
  const seen = new Int32Array(n);
  let walks = 0;
  /** Pipes passed by the current walk (a walk passes each pipe at most once). */
  const chain = new Int32Array(n);

  /**
   * The port slot a line ends on, walking from a pipe with (+1) or against (−1) the flow; every
   * pipe passed on the way gets the same answer, so the whole sheet costs O(pipes).
   */
  const walk = (start: number, direction: 1 | -1): number => {
    const known = memo[direction === 1 ? 0 : 1];
    const stamp = ++walks;
    let length = 0;
    let p = start;
    let end = -1;
    for (;;) {
      if (known[p] !== UNKNOWN) {
        end = known[p];
        break;
      }
      if (seen[p] === stamp) break;
      seen[p] = stamp;
      chain[length++] = p;
      const gp = pipeList[p];
      const forward = (indexed.pipes[p]?.flow ?? 0) >= 0;
      const slot = (direction === 1) === forward ? gp.toSlot : gp.fromSlot;
      const owner = slotOwner[slot];
      const kind = sheetNodes[owner].kind;
      if (kind !== 'waypoint' && kind !== 'fitting' && kind !== 'control-valve') {
        end = slot;
        break;
      }
      // The other port of a two-port inline element ('in' ↔ 'out').
      const other = 2 * portStart[owner] + 1 - slot;
      const e = portPipeStart[other];
      if (e === portPipeStart[other + 1]) break;
      p = portPipeList[e];
    }
    for (let c = 0; c < length; c++) known[chain[c]] = end;
    return end;
  };

  /** True when the slot is the given port (0 suction, 1 discharge) of a pump. */
  const isPumpPort = (slot: number, local: number): boolean =>
    slot >= 0 &&
    sheetNodes[slotOwner[slot]].kind === 'pump' &&
    slot - portStart[slotOwner[slot]] === local;

  for (let p = 0; p < n; p++) {
    if (isPumpPort(walk(p, 1), 0)) {
      service[p] = SUCTION;
      continue;
    }
    service[p] = isPumpPort(walk(p, -1), 1) ? DISCHARGE : OTHER;
  }
  return service;
}
