/** Setting one bore on every pipe of a run, as one undoable step (line sizing applies it). */
import type { Id, PipeBore } from '../types';
import type { Command } from './command';
import { assignPatch, validateRecord } from './check';
import { commandErrors } from './errors';
import { PipeSchema } from '../file/schema';

/** Give each pipe in `ids` the bore `bore`; refused (nothing changed) if one is missing. */
export function setRunBore(ids: readonly Id[], bore: PipeBore): Command {
  return {
    label: ids.length === 1 ? 'Resize pipe' : `Resize ${ids.length} pipes`,
    run(draft) {
      for (const id of ids)
        if (!Object.hasOwn(draft.pipes, id)) return commandErrors.pipeMissing(id);
      for (const id of ids) {
        assignPatch(draft.pipes[id] as unknown as Record<string, unknown>, { bore: { ...bore } });
        const invalid = validateRecord(PipeSchema, draft.pipes[id], id);
        if (invalid) return invalid;
      }
    },
  };
}
