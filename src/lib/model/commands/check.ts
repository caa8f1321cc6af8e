/** Helpers the commands share: reading drafts, validating edited records, connection rules. */
import { current, isDraft, type Draft } from 'immer';
import * as v from 'valibot';
import { issueToProblem } from '../file/messages';
import { nodeLabel } from '../labels';
import { hasPort, isMultiPort } from '../ports';
import { ID_PATTERN, idInUse } from '../ids';
import type { HeadrouteDocument, Id, PortRef } from '../types';
import type { CommandError } from './command';
import { commandErrors } from './errors';

/** A plain snapshot of a draft value (or the value itself when it is not a draft). */
export function plain<T>(value: T): T {
  return isDraft(value) ? (current(value as never) as T) : value;
}

/**
 * Validate an edited record against its schema; the error names the first problem found.
 * Also refuses fields the schema does not know, so the document never holds stray data.
 */
export function validateRecord(
  schema: v.GenericSchema,
  value: unknown,
  id: Id,
): CommandError | undefined {
  const snapshot = plain(value);
  const result = v.safeParse(schema, snapshot);
  if (!result.success) {
    const problem = issueToProblem(result.issues[0], undefined);
    return commandErrors.invalid(id, `${problem.message} (at ${problem.path})`);
  }
  const known = result.output as Record<string, unknown>;
  for (const key of Object.keys(snapshot as object)) {
    if (!Object.hasOwn(known, key)) {
      return commandErrors.invalid(id, `"${key}" is not a field of this element.`);
    }
  }
  return undefined;
}

/** Error when `id` is not a well-formed, unused id. */
export function checkNewId(doc: HeadrouteDocument, id: Id): CommandError | undefined {
  if (!ID_PATTERN.test(id)) {
    return commandErrors.invalid(id, `"${id}" is not a valid id.`);
  }
  if (idInUse(doc, id)) return commandErrors.idTaken(id);
  return undefined;
}

/** The pipe already on a port (other than `ignore`), if any. */
export function pipeOnPort(
  doc: Draft<HeadrouteDocument> | HeadrouteDocument,
  ref: PortRef,
  ignore?: Id,
): Id | undefined {
  for (const [id, pipe] of Object.entries(doc.pipes)) {
    if (id === ignore) continue;
    if (
      (pipe.from.node === ref.node && pipe.from.port === ref.port) ||
      (pipe.to.node === ref.node && pipe.to.port === ref.port)
    ) {
      return id;
    }
  }
  return undefined;
}

/**
 * The connection rules: both ends name existing nodes and ports; the ends are on two different
 * nodes; each port is free, except a junction's hub which takes several pipes.
 */
export function checkConnection(
  doc: Draft<HeadrouteDocument> | HeadrouteDocument,
  from: PortRef,
  to: PortRef,
  ignorePipe?: Id,
): CommandError | undefined {
  for (const ref of [from, to]) {
    if (!ref || typeof ref.node !== 'string' || typeof ref.port !== 'string') {
      return commandErrors.invalid('', 'A pipe needs both ends: a node and a port at each.');
    }
    const node = Object.hasOwn(doc.nodes, ref.node) ? doc.nodes[ref.node] : undefined;
    if (!node) return commandErrors.nodeMissing(ref.node);
    if (!hasPort(node, ref.port)) {
      return commandErrors.portMissing(ref.node, nodeLabel(node), ref.port);
    }
  }
  if (from.node === to.node) {
    return commandErrors.sameNode(from.node, nodeLabel(doc.nodes[from.node]));
  }
  for (const ref of [from, to]) {
    const node = doc.nodes[ref.node];
    if (isMultiPort(node, ref.port)) continue;
    const taken = pipeOnPort(doc, ref, ignorePipe);
    if (taken !== undefined) {
      return commandErrors.portTaken(ref.node, nodeLabel(node), ref.port, taken);
    }
  }
  return undefined;
}

/**
 * Copy `patch` onto `target`: undefined values remove optional fields. A negative zero is
 * stored as 0: it is the same value, and a saved file (JSON) cannot keep its sign, so the
 * document would not read back equal.
 */
export function assignPatch(target: Record<string, unknown>, patch: Record<string, unknown>) {
  for (const [key, value] of Object.entries(patch)) {
    if (value === undefined) delete target[key];
    else target[key] = Object.is(value, -0) ? 0 : value;
  }
}
