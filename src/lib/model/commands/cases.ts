/** Commands on cases (named override sets). */
import { CASE_NODE_GROUPS } from '../caseTargets';
import { ID_PREFIX, nextId } from '../ids';
import { MAX_CASES, MAX_NAME_LENGTH } from '../file/limits';
import { CaseSchema } from '../file/schema';
import type { Case, CaseOverrides, HeadrouteDocument, Id } from '../types';
import type { Command } from './command';
import { plain, validateRecord } from './check';
import { commandErrors } from './errors';
import type { Draft } from 'immer';

function checkCase(draft: Draft<HeadrouteDocument>, c: Case) {
  const invalid = validateRecord(CaseSchema, c, c.id);
  if (invalid) return invalid;
  for (const [field, kind] of CASE_NODE_GROUPS) {
    for (const id of Object.keys(c.overrides[field] ?? {})) {
      const node = Object.hasOwn(draft.nodes, id) ? draft.nodes[id] : undefined;
      if (!node || node.kind !== kind) {
        return commandErrors.invalid(
          c.id,
          `The case changes ${kind} "${id}", which does not exist.`,
        );
      }
    }
  }
  return undefined;
}

/** Add a case named `name` with `overrides` (none by default). */
export function addCase(name: string, overrides: CaseOverrides = {}): Command {
  const command: Command = {
    label: 'Add case',
    run(draft) {
      command.created = [];
      if (Object.keys(draft.cases).length >= MAX_CASES) {
        return commandErrors.tooMany('cases', MAX_CASES);
      }
      const id = nextId(draft, ID_PREFIX.case);
      const c: Case = { id, name, overrides: structuredClone(overrides) };
      const invalid = checkCase(draft, c);
      if (invalid) return invalid;
      draft.cases[id] = c;
      command.created = [id];
    },
  };
  return command;
}

/** Rename a case. */
export function renameCase(id: Id, name: string): Command {
  return {
    label: 'Rename case',
    run(draft) {
      if (!Object.hasOwn(draft.cases, id)) return commandErrors.caseMissing(id);
      draft.cases[id].name = name;
      return validateRecord(CaseSchema, draft.cases[id], id);
    },
  };
}

/** Copy a case under a new id, named "<name> (copy)". */
export function duplicateCase(id: Id): Command {
  const command: Command = {
    label: 'Duplicate case',
    run(draft) {
      command.created = [];
      if (!Object.hasOwn(draft.cases, id)) return commandErrors.caseMissing(id);
      if (Object.keys(draft.cases).length >= MAX_CASES) {
        return commandErrors.tooMany('cases', MAX_CASES);
      }
      const source = plain(draft.cases[id]);
      const newId = nextId(draft, ID_PREFIX.case);
      draft.cases[newId] = {
        id: newId,
        name: `${source.name} (copy)`.slice(0, MAX_NAME_LENGTH),
        overrides: structuredClone(source.overrides),
      };
      command.created = [newId];
    },
  };
  return command;
}

/** Delete a case. */
export function deleteCase(id: Id): Command {
  return {
    label: 'Delete case',
    run(draft) {
      if (!Object.hasOwn(draft.cases, id)) return commandErrors.caseMissing(id);
      delete draft.cases[id];
    },
  };
}

/** Replace a case's overrides; every node they name must exist and be of the right kind. */
export function updateCaseOverrides(id: Id, overrides: CaseOverrides): Command {
  return {
    label: 'Edit case',
    run(draft) {
      if (!Object.hasOwn(draft.cases, id)) return commandErrors.caseMissing(id);
      const c: Case = { id, name: draft.cases[id].name, overrides: structuredClone(overrides) };
      const invalid = checkCase(draft, c);
      if (invalid) return invalid;
      draft.cases[id].overrides = c.overrides;
    },
  };
}
