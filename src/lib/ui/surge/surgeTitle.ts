/** The title line of a surge drawing or export: project and event. */
import type { HeadrouteDocument } from '../../model/types';
import type { SurgeResult } from '../../solver/surge/types';

/** "Project — trip “P-401”" or "Project — close “HV-402” over 1 s (linear)". */
export function surgeExportTitle(doc: HeadrouteDocument, run: SurgeResult): string {
  const e = run.event;
  const id = e.kind === 'close' ? e.element : e.pump;
  const name = doc.nodes[id]?.name || id;
  const what =
    e.kind === 'close' ? `close “${name}” over ${e.time} s (${e.law})` : `trip “${name}”`;
  return `${doc.name} — surge: ${what}`;
}
