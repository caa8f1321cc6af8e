/**
 * Liquid leaving a vessel through a nozzle above its liquid surface: a single liquid phase
 * cannot do that (the nozzle would draw gas), so each such pipe gets a stop finding naming the
 * vessel, the nozzle and the pipe. The solve itself used the nozzle's own fixed head
 * (network/nozzleHeads.ts), so its numbers stay finite; they are simply not physical there.
 */
import type { HydraulicGraph } from '../network/build';
import { isAboveLevel } from '../network/nozzleHeads';
import { NO_FLOW_VELOCITY, type IndexedResults } from '../results';
import type { Finding } from '../types';
import type { findingsIn } from './catalogue';

/** A stop finding (messages from `findings`) for every pipe through which liquid leaves a vessel by a nozzle above its level. */
export function nozzleLevelFindings(
  graph: HydraulicGraph,
  indexed: IndexedResults,
  findings: ReturnType<typeof findingsIn>,
): Finding[] {
  const out: Finding[] = [];
  const { sheetNodes, portStart, portPipeStart, portPipeList, pipeList } = graph;
  for (let i = 0; i < sheetNodes.length; i++) {
    const vessel = sheetNodes[i];
    if (vessel.kind !== 'vessel' || !graph.usable[i]) continue;
    for (let local = 0; local < vessel.nozzles.length; local++) {
      const nozzle = vessel.nozzles[local];
      if (!isAboveLevel(vessel, nozzle)) continue;
      const slot = portStart[i] + local;
      for (let e = portPipeStart[slot]; e < portPipeStart[slot + 1]; e++) {
        const p = portPipeList[e];
        const gp = pipeList[p];
        const r = indexed.pipes[p];
        if (!r || gp.fromSlot === gp.toSlot || Math.abs(r.velocity) < NO_FLOW_VELOCITY) continue;
        // Positive flow runs from → to: it leaves the vessel where the pipe starts on it.
        const leaving = gp.fromSlot === slot ? r.flow > 0 : r.flow < 0;
        if (!leaving) continue;
        out.push(
          findings.nozzleAboveLevel(
            vessel.name,
            nozzle.id,
            nozzle.z,
            vessel.liquidLevel,
            gp.pipe.name,
            [graph.nodeIds[i], gp.id],
          ),
        );
      }
    }
  }
  return out;
}
