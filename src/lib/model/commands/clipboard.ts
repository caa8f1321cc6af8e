/** Copy, paste and duplicate: nodes with the pipes that run between them. */
import { ID_PREFIX, nextId } from '../ids';
import { MAX_ELEMENTS } from '../file/limits';
import { NodeSchema, PipeSchema } from '../file/schema';
import type { HeadrouteDocument, Id, Pipe, SheetNode } from '../types';
import type { Command } from './command';
import { checkConnection, plain, validateRecord } from './check';
import { commandErrors } from './errors';

/** What copy puts on the clipboard: whole node and pipe records (plain data). */
export interface Clip {
  nodes: SheetNode[];
  pipes: Pipe[];
}

/** The selected nodes, and the pipes whose both ends are among them, as a clip. */
export function copyElements(doc: HeadrouteDocument, ids: readonly Id[]): Clip {
  const chosen = new Set(ids.filter((id) => Object.hasOwn(doc.nodes, id)));
  return structuredClone({
    nodes: [...chosen].map((id) => doc.nodes[id]),
    pipes: Object.values(doc.pipes).filter((p) => chosen.has(p.from.node) && chosen.has(p.to.node)),
  });
}

/**
 * Paste a clip with fresh ids so its top-left node lands at `at` (sheet units). Pipes in the clip
 * are kept only when both their ends are in the clip. Names are kept as they were.
 */
export function pasteElements(clip: Clip, at: { x: number; y: number }): Command {
  const command: Command = {
    label: 'Paste',
    run(draft) {
      command.created = [];
      if (clip.nodes.length === 0) return commandErrors.nothingToPaste();
      const count = Object.keys(draft.nodes).length + Object.keys(draft.pipes).length;
      if (count + clip.nodes.length + clip.pipes.length > MAX_ELEMENTS) {
        return commandErrors.tooMany('elements', MAX_ELEMENTS);
      }
      const minX = Math.min(...clip.nodes.map((n) => n.x));
      const minY = Math.min(...clip.nodes.map((n) => n.y));
      const reserved = new Set<Id>();
      const newId = new Map<Id, Id>();
      const created: Id[] = [];
      for (const node of clip.nodes) {
        const id = nextId(draft, ID_PREFIX[node.kind], reserved);
        reserved.add(id);
        newId.set(node.id, id);
        const copy = {
          ...structuredClone(node),
          id,
          x: node.x - minX + at.x,
          y: node.y - minY + at.y,
        } as SheetNode;
        const invalid = validateRecord(NodeSchema, copy, id);
        if (invalid) return invalid;
        draft.nodes[id] = copy;
        created.push(id);
      }
      for (const pipe of clip.pipes) {
        const fromNode = newId.get(pipe.from.node);
        const toNode = newId.get(pipe.to.node);
        if (fromNode === undefined || toNode === undefined) continue;
        const id = nextId(draft, ID_PREFIX.pipe, reserved);
        reserved.add(id);
        const copy: Pipe = {
          ...structuredClone(pipe),
          id,
          from: { node: fromNode, port: pipe.from.port },
          to: { node: toNode, port: pipe.to.port },
        };
        const refused = checkConnection(draft, copy.from, copy.to);
        if (refused) return refused;
        const invalid = validateRecord(PipeSchema, copy, id);
        if (invalid) return invalid;
        draft.pipes[id] = copy;
        created.push(id);
      }
      command.created = created;
    },
  };
  return command;
}

/** Duplicate the selected nodes (and the pipes between them), shifted by `offset`. */
export function duplicateElements(ids: readonly Id[], offset: { x: number; y: number }): Command {
  const command: Command = {
    label: 'Duplicate',
    run(draft) {
      command.created = [];
      const clip = copyElements(plain(draft) as HeadrouteDocument, ids);
      if (clip.nodes.length === 0) return commandErrors.nothingToPaste();
      const minX = Math.min(...clip.nodes.map((n) => n.x));
      const minY = Math.min(...clip.nodes.map((n) => n.y));
      const paste = pasteElements(clip, { x: minX + offset.x, y: minY + offset.y });
      const error = paste.run(draft);
      command.created = paste.created ?? [];
      return error;
    },
  };
  return command;
}
