/**
 * Pointer and key handling of the sheet: panning, box selection, moving nodes (one undo step per
 * drag), joining ports by dragging, and the pipe tool's drafting. The sheet component owns the
 * elements; this module owns the gesture state and turns events into editor commands.
 */
import { connect, moveNodes } from '../../model/commands';
import type { Id, PortRef } from '../../model/types';
import { editor } from '../editor.svelte';
import { drawPipe } from './actions';
import { portPoint } from './geometry';
import { handleSheetKey } from './keyboard';
import {
  GRID,
  rectContains,
  rectFromCorners,
  sheetCentre,
  snap,
  snapPoint,
  toSheet,
  type SheetPoint,
} from './viewport';

/** The gesture under way on the sheet. */
export type Mode =
  | { kind: 'idle' }
  | { kind: 'pan'; sx: number; sy: number; vx: number; vy: number }
  | { kind: 'box'; start: SheetPoint; current: SheetPoint; base: Id[] }
  | { kind: 'move'; ids: Id[]; start: SheetPoint; dx: number; dy: number }
  | { kind: 'connect'; from: PortRef; current: SheetPoint };

/** What the interaction needs from the sheet component. */
export interface SheetHost {
  wrap(): HTMLDivElement;
  svg(): SVGSVGElement;
  size(): { width: number; height: number };
  zoomBy(factor: number): void;
  fit(): void;
  reveal(id: Id): void;
}

function portFrom(el: Element | null): PortRef | null {
  const p = el?.closest('[data-port]');
  if (!p) return null;
  return { node: p.getAttribute('data-node')!, port: p.getAttribute('data-port')! };
}

/** Toggle `id` in the selection (shift-click). */
function toggled(id: Id): Id[] {
  return editor.selection.includes(id)
    ? editor.selection.filter((s) => s !== id)
    : [...editor.selection, id];
}

/** Gesture state and event handlers of one sheet. */
export class SheetInteraction {
  mode = $state.raw<Mode>({ kind: 'idle' });
  /** The pipe tool's pipe being drawn: its start port and bends so far. */
  draft = $state.raw<{ from: PortRef; bends: SheetPoint[] } | null>(null);
  /** The pointer on the sheet, sheet units (follows the pointer in every mode). */
  cursor = $state.raw<SheetPoint>({ x: 0, y: 0 });
  /** The pointer in the sheet's box, pixels, or null when it is outside. */
  pointer = $state.raw<{ x: number; y: number } | null>(null);
  /** True while nodes are being dragged (changes at the drag's start and end only). */
  readonly moving = $derived(this.mode.kind === 'move');
  /** Ports are shown on every node while joining or drawing with the pipe tool. */
  readonly showPorts = $derived(this.mode.kind === 'connect' || editor.tool === 'pipe');
  /** The rubber band of a join or a draft, as a polyline, or null. */
  readonly rubber = $derived.by(() => {
    const mode = this.mode;
    if (mode.kind === 'connect') {
      const a = portPoint(editor.doc, mode.from);
      return a ? [a, mode.current] : null;
    }
    if (this.draft && editor.tool === 'pipe') {
      const a = portPoint(editor.doc, this.draft.from);
      return a ? [a, ...this.draft.bends, this.cursor] : null;
    }
    return null;
  });
  /** The selection box being dragged, or null. */
  readonly box = $derived(
    this.mode.kind === 'box' ? rectFromCorners(this.mode.start, this.mode.current) : null,
  );

  #host: SheetHost;
  #spaceHeld = false;

  constructor(host: SheetHost) {
    this.#host = host;
  }

  #local(e: { clientX: number; clientY: number }) {
    const r = this.#host.wrap().getBoundingClientRect();
    return { x: e.clientX - r.left, y: e.clientY - r.top };
  }

  #sheetAt(e: { clientX: number; clientY: number }): SheetPoint {
    return toSheet(editor.viewport, this.#local(e));
  }

  pointerdown = (e: PointerEvent) => {
    const svg = this.#host.svg();
    // Pointer users get keyboard shortcuts on the sheet without the keyboard focus ring.
    svg.focus({ focusVisible: false } as FocusOptions);
    const target = e.target as Element;
    const pt = this.#sheetAt(e);
    if (e.button === 1 || (e.button === 0 && this.#spaceHeld)) {
      const vp = editor.viewport;
      this.mode = { kind: 'pan', sx: e.clientX, sy: e.clientY, vx: vp.x, vy: vp.y };
      svg.setPointerCapture(e.pointerId);
      e.preventDefault();
      return;
    }
    if (e.button !== 0) return;
    const port = portFrom(target);
    const nodeId = target.closest('[data-node-id]')?.getAttribute('data-node-id') ?? null;
    const pipeId = target.closest('[data-pipe-id]')?.getAttribute('data-pipe-id') ?? null;

    if (editor.tool === 'pipe') {
      const draft = this.draft;
      if (port && !draft) this.draft = { from: port, bends: [] };
      else if (port && draft) {
        this.draft = null;
        drawPipe(draft.from, draft.bends, port, this.#local(e));
      } else if (draft) this.draft = { ...draft, bends: [...draft.bends, snapPoint(pt)] };
      else if (nodeId || pipeId) editor.select([(nodeId ?? pipeId)!]);
      this.cursor = pt;
      return;
    }
    if (port) {
      this.mode = { kind: 'connect', from: port, current: pt };
    } else if (nodeId) {
      if (e.shiftKey) editor.select(toggled(nodeId));
      else if (!editor.selection.includes(nodeId)) editor.select([nodeId]);
      const ids = editor.selection.filter((id) => Object.hasOwn(editor.doc.nodes, id));
      if (ids.length > 0) {
        editor.beginGesture();
        this.mode = { kind: 'move', ids, start: pt, dx: 0, dy: 0 };
      }
    } else if (pipeId) {
      editor.select(e.shiftKey ? toggled(pipeId) : [pipeId]);
    } else {
      const base = e.shiftKey ? editor.selection : [];
      if (!e.shiftKey) editor.select([]);
      this.mode = { kind: 'box', start: pt, current: pt, base };
    }
    svg.setPointerCapture(e.pointerId);
  };

  pointermove = (e: PointerEvent) => {
    const pt = this.#sheetAt(e);
    this.pointer = this.#local(e);
    this.cursor = pt;
    const mode = this.mode;
    switch (mode.kind) {
      case 'idle': {
        const t = e.target as Element;
        const id =
          t.closest('[data-node-id]')?.getAttribute('data-node-id') ??
          t.closest('[data-pipe-id]')?.getAttribute('data-pipe-id') ??
          null;
        if (id !== editor.hover) editor.hover = id;
        break;
      }
      case 'pan':
        editor.viewport = {
          k: editor.viewport.k,
          x: mode.vx + e.clientX - mode.sx,
          y: mode.vy + e.clientY - mode.sy,
        };
        break;
      case 'box': {
        this.mode = { ...mode, current: pt };
        const doc = editor.doc;
        const r = rectFromCorners(mode.start, pt);
        const inside = Object.values(doc.nodes)
          .filter((n) => rectContains(r, n))
          .map((n) => n.id);
        // eslint-disable-next-line svelte/prefer-svelte-reactivity -- a local lookup, not state
        const set = new Set(inside);
        const pipesInside = Object.values(doc.pipes)
          .filter((p) => set.has(p.from.node) && set.has(p.to.node))
          .map((p) => p.id);
        // eslint-disable-next-line svelte/prefer-svelte-reactivity -- a local de-duplication
        editor.select([...new Set([...mode.base, ...inside, ...pipesInside])]);
        break;
      }
      case 'move': {
        const dx = snap(pt.x - mode.start.x, GRID);
        const dy = snap(pt.y - mode.start.y, GRID);
        if (dx !== mode.dx || dy !== mode.dy) {
          editor.dispatch(moveNodes(mode.ids, dx - mode.dx, dy - mode.dy));
          this.mode = { ...mode, dx, dy };
        }
        break;
      }
      case 'connect':
        this.mode = { ...mode, current: pt };
        break;
    }
  };

  pointerup = (e: PointerEvent) => {
    const m = this.mode;
    this.mode = { kind: 'idle' };
    const svg = this.#host.svg();
    if (svg.hasPointerCapture(e.pointerId)) svg.releasePointerCapture(e.pointerId);
    if (m.kind === 'move') {
      if (m.dx !== 0 || m.dy !== 0) editor.endGesture();
      else editor.cancelGesture();
    } else if (m.kind === 'connect') {
      const to = portFrom(document.elementFromPoint(e.clientX, e.clientY));
      const start = portPoint(editor.doc, m.from);
      const far = start ? Math.hypot(m.current.x - start.x, m.current.y - start.y) > 6 : true;
      if (to && (to.node !== m.from.node || to.port !== m.from.port)) {
        const created = editor.dispatch(connect(m.from, to), this.#local(e));
        if (created) editor.select(created);
      } else if (far) {
        editor.say('Drop the pipe end on a port to join.', 'error', this.#local(e));
      } else {
        editor.select([m.from.node]);
      }
    }
  };

  pointercancel = () => {
    if (this.mode.kind === 'move') editor.cancelGesture();
    this.mode = { kind: 'idle' };
  };

  pointerleave = () => {
    this.pointer = null;
    if (this.mode.kind === 'idle') editor.hover = null;
  };

  keydown = (e: KeyboardEvent) => {
    if (e.key === ' ') {
      this.#spaceHeld = true;
      e.preventDefault();
      return;
    }
    const host = this.#host;
    const handled = handleSheetKey(e, {
      zoomBy: host.zoomBy,
      fit: host.fit,
      pastePoint: () => {
        const { width, height } = host.size();
        return this.pointer
          ? toSheet(editor.viewport, this.pointer)
          : sheetCentre(editor.viewport, width, height);
      },
      reveal: host.reveal,
      cancelDraft: () => {
        if (!this.draft) return false;
        this.draft = null;
        return true;
      },
    });
    if (handled) e.preventDefault();
  };

  keyup = (e: KeyboardEvent) => {
    if (e.key === ' ') this.#spaceHeld = false;
  };
}
