/** Commands on pipes: connect two ports, edit a pipe (including moving its ends). */
import { createPipe } from '../defaults';
import { ID_PREFIX, nextId } from '../ids';
import { MAX_ELEMENTS } from '../file/limits';
import { PipeSchema } from '../file/schema';
import type { Id, Pipe, PortRef } from '../types';
import type { Command } from './command';
import { assignPatch, checkConnection, checkNewId, validateRecord } from './check';
import { commandErrors } from './errors';

/** Fields of a pipe that an edit may set (never its kind). */
export type PipePatch = Partial<Omit<Pipe, 'kind'>> & Record<string, unknown>;

/**
 * Connect `from` to `to` with a new pipe (default 2" Sch 40 carbon steel, 10 m), overridden by
 * `props`. Refused unless both ports exist, are on two different nodes, and are free (a junction's
 * hub takes several pipes).
 */
export function connect(from: PortRef, to: PortRef, props?: PipePatch): Command {
  const command: Command = {
    label: 'Connect',
    run(draft) {
      command.created = [];
      const count = Object.keys(draft.nodes).length + Object.keys(draft.pipes).length;
      if (count >= MAX_ELEMENTS) return commandErrors.tooMany('elements', MAX_ELEMENTS);
      const refused = checkConnection(draft, from, to);
      if (refused) return refused;
      const id = props?.id ?? nextId(draft, ID_PREFIX.pipe);
      const idError = checkNewId(draft, id);
      if (idError) return idError;
      const pipe = createPipe(from, to, id, draft.settings.unitSystem) as unknown as Record<
        string,
        unknown
      >;
      if (props) assignPatch(pipe, { ...props, id, from: { ...from }, to: { ...to } });
      const invalid = validateRecord(PipeSchema, pipe, id);
      if (invalid) return invalid;
      draft.pipes[id] = pipe as unknown as Pipe;
      command.created = [id];
    },
  };
  return command;
}

/** Edit a pipe's fields; new ends must obey the same rules as `connect`. */
export function updatePipe(id: Id, patch: PipePatch): Command {
  return {
    label: 'Edit pipe',
    run(draft) {
      if (!Object.hasOwn(draft.pipes, id)) return commandErrors.pipeMissing(id);
      if ('id' in patch && patch.id !== id) return commandErrors.fixedField(id, 'id');
      if ('kind' in patch && patch.kind !== 'pipe') return commandErrors.fixedField(id, 'kind');
      const pipe = draft.pipes[id];
      if (patch.from || patch.to || 'from' in patch || 'to' in patch) {
        const from = (patch.from ?? pipe.from) as PortRef;
        const to = (patch.to ?? pipe.to) as PortRef;
        const refused = checkConnection(draft, from, to, id);
        if (refused) return refused;
      }
      assignPatch(pipe as unknown as Record<string, unknown>, patch);
      return validateRecord(PipeSchema, pipe, id);
    },
  };
}
