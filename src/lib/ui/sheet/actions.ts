/**
 * Editing actions shared by the sheet, shelf and keyboard: each turns a user intent into a
 * model command dispatched through the editor (one undo step each).
 */
import {
  addNode,
  connect,
  copyElements,
  deleteElements,
  duplicateElements,
  moveNodes,
  pasteElements,
} from '../../model/commands';
import type { Clip } from '../../model/commands';
import type { Id, PortRef } from '../../model/types';
import { editor } from '../editor.svelte';
import type { ShelfPart } from '../shelf/parts';
import { GRID, snapPoint, type SheetPoint } from './viewport';

/** Place a shelf part at a sheet point (snapped) and select it. Returns the new node id. */
export function placePart(part: ShelfPart, at: SheetPoint): Id | null {
  if (part.kind === 'pipe') return null;
  const created = editor.dispatch(addNode(part.kind, snapPoint(at), part.props));
  if (!created) return null;
  editor.select(created);
  return created[0] ?? null;
}

/** Delete the selection (attached pipes go too). */
export function deleteSelection(): void {
  if (editor.selection.length === 0) return;
  if (editor.dispatch(deleteElements(editor.selection))) editor.select([]);
}

/** Node ids in the selection. */
export function selectedNodeIds(): Id[] {
  return editor.selection.filter((id) => Object.hasOwn(editor.doc.nodes, id));
}

/** Move the selected nodes by a sheet offset. */
export function nudgeSelection(dx: number, dy: number): void {
  const ids = selectedNodeIds();
  if (ids.length > 0) editor.dispatch(moveNodes(ids, dx, dy));
}

/** Duplicate the selection one grid step down-right and select the copies. */
export function duplicateSelection(): void {
  if (editor.selection.length === 0) return;
  const created = editor.dispatch(
    duplicateElements(editor.selection, { x: GRID * 2, y: GRID * 2 }),
  );
  if (created) editor.select(created);
}

/** In-page clipboard: the copied nodes and the pipes wholly among them. */
let clipboard: Clip | null = null;

/** Copy the selected nodes (and pipes between them). */
export function copySelection(): void {
  const ids = new Set(selectedNodeIds());
  if (ids.size === 0) return;
  clipboard = copyElements(editor.doc, [...ids]);
  editor.say(`Copied ${ids.size} part${ids.size === 1 ? '' : 's'}`);
}

/** Paste the clipboard centred at a sheet point and select the pasted elements. */
export function pasteAt(at: SheetPoint): void {
  if (!clipboard) return;
  const created = editor.dispatch(pasteElements(clipboard, snapPoint(at)));
  if (created) editor.select(created);
}

/** Whether something has been copied. */
export function hasClipboard(): boolean {
  return clipboard !== null;
}

/**
 * The pipe tool's result as one undo step: a waypoint at each bend and pipes joining
 * `from` → bends → `to`. Any refusal rolls the whole drawing back (the reason is in the status).
 */
export function drawPipe(
  from: PortRef,
  bends: SheetPoint[],
  to: PortRef,
  at: { x: number; y: number },
): void {
  const start = editor.doc;
  editor.beginGesture();
  let prev = from;
  for (const bend of bends) {
    const created = editor.dispatch(addNode('waypoint', bend), at);
    const id = created ? created[0] : undefined;
    if (!id || !editor.dispatch(connect(prev, { node: id, port: 'in' }), at)) {
      return editor.cancelGesture();
    }
    prev = { node: id, port: 'out' };
  }
  if (!editor.dispatch(connect(prev, to), at)) return editor.cancelGesture();
  editor.endGesture();
  editor.select([
    ...Object.keys(editor.doc.nodes).filter((k) => !Object.hasOwn(start.nodes, k)),
    ...Object.keys(editor.doc.pipes).filter((k) => !Object.hasOwn(start.pipes, k)),
  ]);
  const n = bends.length;
  editor.say(
    n > 0
      ? `Pipe drawn with ${n} waypoint${n === 1 ? '' : 's'}; set their elevations in details.`
      : 'Pipe drawn.',
  );
}
