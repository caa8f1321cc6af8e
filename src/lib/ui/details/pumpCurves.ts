/**
 * Curves for the pump chart in details: the fitted pump curve at running speed, the system
 * curve (the head the rest of the network asks of this pump at each flow, found by solving
 * with the pump on duty at that flow), and the operating point. Pure functions.
 */
import type { HeadrouteDocument, Id, Pump } from '../../model/types';
import { fitCurve, pumpHead } from '../../physics/pump';
import type { SolveResult } from '../../solver/types';

export interface FlowHead {
  flow: number;
  head: number;
}

/** Flows from 0 to `max` in `n` equal steps (n + 1 points). */
export function flowSteps(max: number, n: number): number[] {
  return Array.from({ length: n + 1 }, (_, i) => (max * i) / n);
}

/** Largest flow worth drawing: 1.2 × the last curve point (or the operating flow if larger). */
export function chartFlowMax(pump: Pump, operatingFlow: number | null): number {
  const last = Math.max(0, ...pump.headCurve.map((p) => p.flow));
  const q = Math.max(last, operatingFlow ?? 0);
  return q > 0 ? q * 1.2 : 0.01;
}

/** The pump's head curve at running speed (affinity laws in the physics module). */
export function pumpCurve(pump: Pump, flows: number[]): FlowHead[] {
  const fit = fitCurve(pump.headCurve);
  if (fit.form === 'empty') return [];
  const ratio = pump.ratedSpeed > 0 ? pump.speed / pump.ratedSpeed : 1;
  return flows
    .map((flow) => ({ flow, head: pumpHead(fit, flow, ratio) }))
    .filter((p) => Number.isFinite(p.head) && p.head >= 0);
}

/** The document with pump `id` running on duty at `flow`. */
export function withDutyFlow(doc: HeadrouteDocument, id: Id, flow: number): HeadrouteDocument {
  const pump = doc.nodes[id] as Pump;
  return {
    ...doc,
    nodes: { ...doc.nodes, [id]: { ...pump, running: true, mode: 'duty', dutyFlow: flow } },
  };
}

/**
 * The system curve seen by pump `id`: for each flow, the head the pump must give when the
 * rest of the network stays as it is. Points where the solve fails or does not converge are
 * left out.
 */
export function systemCurve(
  doc: HeadrouteDocument,
  id: Id,
  flows: number[],
  solve: (doc: HeadrouteDocument) => SolveResult,
): FlowHead[] {
  const out: FlowHead[] = [];
  for (const flow of flows) {
    try {
      const r = solve(withDutyFlow(doc, id, flow));
      const p = r.pumps[id];
      if (r.converged && p && Number.isFinite(p.head)) out.push({ flow, head: p.head });
    } catch {
      // a failed point is simply not drawn
    }
  }
  return out;
}
