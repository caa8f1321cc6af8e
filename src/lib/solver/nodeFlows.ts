/** Flows at a node from the pipes on it, for readouts and tables. */
import type { HeadrouteDocument, Id } from '../model/types';
import type { SolveResult } from './types';

/**
 * Net flow leaving node `id` through its pipes, m³/s: pipes starting on it carry flow away,
 * pipes ending on it bring flow in (so a vessel being filled, or a boundary taking a draw-off,
 * gives a negative figure). Null when no pipe on it has a result.
 */
export function netPipeOutflow(
  doc: HeadrouteDocument,
  result: SolveResult | null,
  id: Id,
): number | null {
  if (!result) return null;
  let sum = 0;
  let any = false;
  for (const pipe of Object.values(doc.pipes)) {
    const r = result.pipes[pipe.id];
    if (!r) continue;
    if (pipe.from.node === id) {
      sum += r.flow;
      any = true;
    }
    if (pipe.to.node === id) {
      sum -= r.flow;
      any = true;
    }
  }
  return any && Number.isFinite(sum) ? sum : null;
}
