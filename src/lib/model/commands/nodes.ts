/** Commands on nodes: add, move, edit, delete (with their pipes). */
import { CASE_NODE_GROUPS } from '../caseTargets';
import { createNode } from '../defaults';
import { ID_PREFIX, nextId } from '../ids';
import { MAX_COORDINATE, MAX_ELEMENTS } from '../file/limits';
import { NodeSchema } from '../file/schema';
import { nodeLabel } from '../labels';
import type { Draft } from 'immer';
import type { HeadrouteDocument, Id, NodeKind, SheetNode } from '../types';
import type { Command } from './command';
import { assignPatch, checkNewId, validateRecord } from './check';
import { commandErrors } from './errors';

/** Fields of a node that an edit may set (never its kind). */
export type NodePatch = Partial<Omit<SheetNode, 'kind'>> & Record<string, unknown>;

function elementCount(doc: { nodes: object; pipes: object }): number {
  return Object.keys(doc.nodes).length + Object.keys(doc.pipes).length;
}

/** Add a node of `kind` at sheet position `at`, with default properties overridden by `props`. */
export function addNode(kind: NodeKind, at: { x: number; y: number }, props?: NodePatch): Command {
  const command: Command = {
    label: `Add ${kind}`,
    run(draft) {
      command.created = [];
      if (elementCount(draft) >= MAX_ELEMENTS)
        return commandErrors.tooMany('elements', MAX_ELEMENTS);
      const id = props?.id ?? nextId(draft, ID_PREFIX[kind]);
      const idError = checkNewId(draft, id);
      if (idError) return idError;
      const node = createNode(kind, at, id, draft.settings.unitSystem) as unknown as Record<
        string,
        unknown
      >;
      if (props) assignPatch(node, { ...props, id });
      const invalid = validateRecord(NodeSchema, node, id);
      if (invalid) return invalid;
      draft.nodes[id] = node as unknown as SheetNode;
      command.created = [id];
    },
  };
  return command;
}

function checkPosition(id: Id, x: number, y: number) {
  if (!Number.isFinite(x) || !Number.isFinite(y)) {
    return commandErrors.invalid(id, 'A position must be finite numbers.');
  }
  if (Math.abs(x) > MAX_COORDINATE || Math.abs(y) > MAX_COORDINATE) {
    return commandErrors.invalid(id, `A position must lie within ±${MAX_COORDINATE} sheet units.`);
  }
  return undefined;
}

/** Move nodes by (dx, dy) sheet units; ids that are not nodes are ignored. */
export function moveNodes(ids: readonly Id[], dx: number, dy: number): Command {
  return {
    label: ids.length === 1 ? 'Move' : `Move ${ids.length} parts`,
    run(draft) {
      for (const id of ids) {
        if (!Object.hasOwn(draft.nodes, id)) continue;
        const node = draft.nodes[id];
        const bad = checkPosition(id, node.x + dx, node.y + dy);
        if (bad) return bad;
        node.x += dx;
        node.y += dy;
      }
    },
  };
}

/** Place one node at (x, y) sheet units. */
export function setNodePosition(id: Id, x: number, y: number): Command {
  return {
    label: 'Move',
    run(draft) {
      if (!Object.hasOwn(draft.nodes, id)) return commandErrors.nodeMissing(id);
      const bad = checkPosition(id, x, y);
      if (bad) return bad;
      draft.nodes[id].x = x;
      draft.nodes[id].y = y;
    },
  };
}

/**
 * Edit a node's fields. The id and kind cannot change; values are checked against the schema;
 * a vessel cannot lose (or rename) a nozzle that has a pipe on it.
 */
export function updateNode(id: Id, patch: NodePatch): Command {
  return {
    label: 'Edit part',
    run(draft) {
      if (!Object.hasOwn(draft.nodes, id)) return commandErrors.nodeMissing(id);
      const node = draft.nodes[id];
      if ('id' in patch && patch.id !== id) return commandErrors.fixedField(id, 'id');
      if ('kind' in patch && patch.kind !== node.kind) return commandErrors.fixedField(id, 'kind');
      assignPatch(node as unknown as Record<string, unknown>, patch);
      const invalid = validateRecord(NodeSchema, node, id);
      if (invalid) return invalid;
      if (node.kind === 'vessel') {
        const names = new Set<string>();
        for (const nozzle of node.nozzles) {
          if (names.has(nozzle.id)) {
            return commandErrors.invalid(id, `Two nozzles are named "${nozzle.id}".`);
          }
          names.add(nozzle.id);
        }
        for (const [pipeId, pipe] of Object.entries(draft.pipes)) {
          for (const end of [pipe.from, pipe.to]) {
            if (end.node === id && !names.has(end.port)) {
              return commandErrors.nozzleInUse(id, nodeLabel(node), end.port, pipeId);
            }
          }
        }
      }
    },
  };
}

/**
 * Delete nodes and pipes. A node takes its pipes with it; stored routes drop the node (and go
 * when fewer than two nodes remain); case overrides for the node go too. Unknown ids are ignored.
 */
export function deleteElements(ids: readonly Id[]): Command {
  return {
    label: ids.length === 1 ? 'Delete' : `Delete ${ids.length} items`,
    run(draft) {
      const nodes = new Set(ids.filter((id) => Object.hasOwn(draft.nodes, id)));
      for (const id of ids) if (Object.hasOwn(draft.pipes, id)) delete draft.pipes[id];
      if (nodes.size === 0) return;
      for (const [pipeId, pipe] of Object.entries(draft.pipes)) {
        if (nodes.has(pipe.from.node) || nodes.has(pipe.to.node)) delete draft.pipes[pipeId];
      }
      for (const id of nodes) delete draft.nodes[id];
      forgetNodes(draft, nodes);
    },
  };
}

/**
 * Take deleted nodes out of stored routes (a route left with fewer than two nodes goes) and out
 * of every case's overrides. Shared by delete and by the survey import, which replaces waypoints.
 */
export function forgetNodes(draft: Draft<HeadrouteDocument>, removed: ReadonlySet<Id>): void {
  for (const [routeId, route] of Object.entries(draft.routes)) {
    if (!route.nodes.some((n) => removed.has(n))) continue;
    const kept = route.nodes.filter((n) => !removed.has(n));
    if (kept.length < 2) delete draft.routes[routeId];
    else route.nodes = kept;
  }
  for (const c of Object.values(draft.cases)) {
    for (const [field] of CASE_NODE_GROUPS) {
      const map = c.overrides[field];
      if (!map) continue;
      for (const id of removed) if (Object.hasOwn(map, id)) delete map[id];
    }
  }
}
