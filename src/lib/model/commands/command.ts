/**
 * Commands: every change to the document is a command — a label and a recipe that edits an immer
 * draft — applied with immer's produceWithPatches so each change yields patches and inverse
 * patches for undo and redo.
 */
import { enablePatches, produceWithPatches, type Draft, type Patch } from 'immer';
import type { HeadrouteDocument, Id } from '../types';

enablePatches();

/** Why a command refused to run, with the elements at fault. */
export interface CommandError {
  /** Stable code from ./errors.ts. */
  code: string;
  /** Plain words for the user. */
  message: string;
  elements: Id[];
}

/** A document edit. `run` edits the draft, or returns an error and leaves the document as it was. */
export interface Command {
  label: string;
  run(draft: Draft<HeadrouteDocument>): void | CommandError;
  /** Ids of elements the last run created (set by `run`; empty when it created none). */
  created?: Id[];
}

/** Outcome of applying one command. */
export type ApplyResult =
  | {
      ok: true;
      doc: HeadrouteDocument;
      patches: Patch[];
      inversePatches: Patch[];
      created: Id[];
    }
  | { ok: false; error: CommandError };

/**
 * Apply a command to a document without touching the original. On error the document is
 * unchanged and the error says why. A command that changes nothing returns empty patches.
 */
export function applyCommand(doc: HeadrouteDocument, command: Command): ApplyResult {
  let error: CommandError | undefined;
  const [next, patches, inversePatches] = produceWithPatches(doc, (draft) => {
    const result = command.run(draft);
    if (result) error = result;
  });
  if (error) return { ok: false, error };
  return {
    ok: true,
    doc: next,
    patches: [...patches],
    inversePatches: [...inversePatches],
    created: [...(command.created ?? [])],
  };
}
