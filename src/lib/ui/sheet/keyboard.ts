/**
 * Keyboard commands on the focused sheet. Returns true when the key was handled.
 */
import { editor } from '../editor.svelte';
import {
  copySelection,
  deleteSelection,
  duplicateSelection,
  nudgeSelection,
  pasteAt,
  selectedNodeIds,
} from './actions';
import { GRID, panBy, type SheetPoint } from './viewport';

export interface SheetKeyContext {
  zoomBy(factor: number): void;
  fit(): void;
  /** Where a paste lands: the pointer if it is over the sheet, else the centre. */
  pastePoint(): SheetPoint;
  cancelDraft(): boolean;
  reveal(id: string): void;
}

/** Select the next (or previous) element in document order: keyboard users pick parts this way. */
function cycleSelection(step: 1 | -1, ctx: SheetKeyContext): void {
  const ids = [...Object.keys(editor.doc.nodes), ...Object.keys(editor.doc.pipes)];
  if (ids.length === 0) return;
  const current = editor.selection.length > 0 ? ids.indexOf(editor.selection[0]) : -1;
  const next = ids[(current + step + ids.length) % ids.length];
  editor.select([next]);
  ctx.reveal(next);
}

const ARROWS: Record<string, [number, number]> = {
  ArrowLeft: [-1, 0],
  ArrowRight: [1, 0],
  ArrowUp: [0, -1],
  ArrowDown: [0, 1],
};

/** Handle a keydown on the sheet. */
export function handleSheetKey(e: KeyboardEvent, ctx: SheetKeyContext): boolean {
  const mod = e.ctrlKey || e.metaKey;
  const arrow = ARROWS[e.key];
  if (arrow && !mod) {
    if (selectedNodeIds().length > 0) {
      const step = e.shiftKey ? GRID * 5 : GRID;
      nudgeSelection(arrow[0] * step, arrow[1] * step);
    } else {
      editor.viewport = panBy(editor.viewport, -arrow[0] * 60, -arrow[1] * 60);
    }
    return true;
  }
  if (mod) {
    switch (e.key.toLowerCase()) {
      case 'a':
        editor.select([...Object.keys(editor.doc.nodes), ...Object.keys(editor.doc.pipes)]);
        return true;
      case 'c':
        copySelection();
        return true;
      case 'v':
        pasteAt(ctx.pastePoint());
        return true;
      case 'd':
        duplicateSelection();
        return true;
      default:
        return false;
    }
  }
  switch (e.key) {
    case 'Delete':
    case 'Backspace':
      deleteSelection();
      return true;
    case 'Escape':
      if (ctx.cancelDraft()) return true;
      if (editor.tool !== 'select') {
        editor.tool = 'select';
        return true;
      }
      editor.select([]);
      return true;
    case '+':
    case '=':
      ctx.zoomBy(1.25);
      return true;
    case '-':
    case '_':
      ctx.zoomBy(0.8);
      return true;
    case '0':
    case 'f':
      ctx.fit();
      return true;
    case 'p':
      editor.tool = editor.tool === 'pipe' ? 'select' : 'pipe';
      return true;
    case ']':
      cycleSelection(1, ctx);
      return true;
    case '[':
      cycleSelection(-1, ctx);
      return true;
    default:
      return false;
  }
}
