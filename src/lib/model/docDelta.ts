/**
 * A document as the records that changed since one the solver's worker already holds, so a
 * drag that changes one node sends that node rather than a copy of the whole sheet (on a
 * 1,000-element sheet the copy took a few milliseconds on each side, every move).
 * Documents are immutable (immer): a record that did not change is the same object, so the
 * changes are found by identity.
 */
import type { HeadrouteDocument, Id } from '../model/types';

type Fields = Omit<HeadrouteDocument, 'nodes' | 'pipes'>;

/** What changed between two documents with the same nodes and pipes (by id, in the same order). */
export interface DocDelta {
  /** Top-level fields other than nodes and pipes that changed, with their new values. */
  fields: Partial<Fields>;
  /** Nodes and pipes replaced, by id. */
  nodes: HeadrouteDocument['nodes'];
  pipes: HeadrouteDocument['pipes'];
}

/** Records of `after` that are not those of `before`; null unless both have the same ids in the same order. */
function changedRecords<T>(before: Record<Id, T>, after: Record<Id, T>): Record<Id, T> | null {
  if (before === after) return {};
  const ids = Object.keys(after);
  const old = Object.keys(before);
  if (ids.length !== old.length) return null;
  const changed: Record<Id, T> = {};
  for (let i = 0; i < ids.length; i++) {
    const id = ids[i];
    if (id !== old[i]) return null;
    if (after[id] !== before[id]) changed[id] = after[id];
  }
  return changed;
}

/**
 * The changes from `before` to `after`, or null when parts were added or removed (or reordered):
 * then the whole document is sent. Applying the delta to `before` gives a document equal to
 * `after`, with its records in the same order.
 */
export function docDelta(before: HeadrouteDocument, after: HeadrouteDocument): DocDelta | null {
  const nodes = changedRecords(before.nodes, after.nodes);
  const pipes = changedRecords(before.pipes, after.pipes);
  if (!nodes || !pipes || Object.keys(before).length !== Object.keys(after).length) return null;
  const fields: Partial<Fields> = {};
  for (const key of Object.keys(after) as Array<keyof HeadrouteDocument>) {
    if (key === 'nodes' || key === 'pipes' || after[key] === before[key]) continue;
    (fields as Record<string, unknown>)[key] = after[key];
  }
  return { fields, nodes, pipes };
}

/** `before` with the changes of `delta` (new objects where something changed; `before` is not touched). */
export function applyDocDelta(before: HeadrouteDocument, delta: DocDelta): HeadrouteDocument {
  const replace = <T>(records: Record<Id, T>, changed: Record<Id, T>) =>
    Object.keys(changed).length ? { ...records, ...changed } : records;
  return {
    ...before,
    ...delta.fields,
    nodes: replace(before.nodes, delta.nodes),
    pipes: replace(before.pipes, delta.pipes),
  };
}
