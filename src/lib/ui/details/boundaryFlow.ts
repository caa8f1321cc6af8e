/** The flow a boundary passes in a solved result, for holding it when it switches to a flow. */
import type { HeadrouteDocument, Id } from '../../model/types';
import type { SolveResult } from '../../solver/types';

/**
 * Net flow leaving the sheet at boundary `id` in `result`, m³/s (pipes ending on it bring flow
 * in, pipes starting on it take flow out), or null when there is no result for its pipes.
 */
export function boundaryFlow(
  doc: HeadrouteDocument,
  result: SolveResult | null,
  id: Id,
): number | null {
  if (!result) return null;
  let outflow = 0;
  let seen = false;
  for (const pipe of Object.values(doc.pipes)) {
    const r = result.pipes[pipe.id];
    if (!r) continue;
    if (pipe.to.node === id) {
      outflow += r.flow;
      seen = true;
    }
    if (pipe.from.node === id) {
      outflow -= r.flow;
      seen = true;
    }
  }
  return seen && Number.isFinite(outflow) ? outflow : null;
}
