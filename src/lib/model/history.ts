/**
 * Undo and redo over immer patches. Each step keeps the patches and inverse patches of one user
 * action; a gesture (a drag) squashes all its commands into one step, and a cancelled gesture
 * rolls back. Gestures nest: a gesture begun inside another is part of the outer one's step, and
 * cancelling it rolls back only its own changes. Loading a document (`reset`) is not undoable: it clears both stacks.
 * `revision` grows with every change of `doc`, so results computed from a document can carry it.
 */
import { applyPatches, freeze, type Patch } from 'immer';
import { applyCommand, type Command, type CommandError } from './commands/command';
import type { HeadrouteDocument, Id } from './types';

/** One undo step. */
export interface HistoryStep {
  label: string;
  patches: Patch[];
  inversePatches: Patch[];
}

/** Where a (possibly nested) gesture began: the document then and how many changes it had. */
interface GestureMark {
  doc: HeadrouteDocument;
  changes: number;
  label: string;
}

interface Gesture {
  /** One mark per open level, outermost first. */
  marks: GestureMark[];
  label: string;
  patches: Patch[][];
  inverse: Patch[][];
}

/** Undo/redo history of the open project document */
export class History {
  #doc: HeadrouteDocument;
  #revision = 0;
  #undo: HistoryStep[] = [];
  #redo: HistoryStep[] = [];
  #gesture: Gesture | null = null;
  #listeners = new Set<(doc: HeadrouteDocument, revision: number) => void>();
  /** Most undo steps kept; the oldest are dropped beyond it. */
  readonly limit: number;

  constructor(doc: HeadrouteDocument, limit = 200) {
    this.#doc = freeze(doc, true);
    this.limit = Math.max(1, limit);
  }

  /** The current document (frozen; replace, never mutate). */
  get doc(): HeadrouteDocument {
    return this.#doc;
  }

  /** Counts every change of `doc`, including undo, redo and reset. */
  get revision(): number {
    return this.#revision;
  }

  get canUndo(): boolean {
    return this.#undo.length > 0 || (this.#gesture?.patches.length ?? 0) > 0;
  }

  get canRedo(): boolean {
    return this.#redo.length > 0 && this.#gesture === null;
  }

  /** Label of the step undo would revert, if any. */
  get undoLabel(): string | undefined {
    return this.#undo[this.#undo.length - 1]?.label;
  }

  /** Label of the step redo would repeat, if any. */
  get redoLabel(): string | undefined {
    return this.#redo[this.#redo.length - 1]?.label;
  }

  /** Number of steps on the undo stack (for tests and the UI). */
  get undoDepth(): number {
    return this.#undo.length;
  }

  /** Call `listener` after every change of the document; returns an unsubscribe function. */
  subscribe(listener: (doc: HeadrouteDocument, revision: number) => void): () => void {
    this.#listeners.add(listener);
    return () => this.#listeners.delete(listener);
  }

  #set(doc: HeadrouteDocument) {
    this.#doc = doc;
    this.#revision++;
    for (const listener of this.#listeners) listener(doc, this.#revision);
  }

  #push(step: HistoryStep) {
    this.#undo.push(step);
    if (this.#undo.length > this.limit) this.#undo.splice(0, this.#undo.length - this.limit);
    this.#redo = [];
  }

  /**
   * Apply a command. On success the document changes and (outside a gesture) one undo step is
   * pushed; a command that changes nothing pushes nothing. On error nothing changes.
   */
  apply(command: Command): { ok: true; created: Id[] } | { ok: false; error: CommandError } {
    const result = applyCommand(this.#doc, command);
    if (!result.ok) return result;
    if (result.patches.length === 0) return { ok: true, created: result.created };
    if (this.#gesture) {
      const g = this.#gesture;
      if (g.patches.length === 0) g.label = command.label;
      g.patches.push(result.patches);
      g.inverse.push(result.inversePatches);
    } else {
      this.#push({
        label: command.label,
        patches: result.patches,
        inversePatches: result.inversePatches,
      });
    }
    this.#set(result.doc);
    return { ok: true, created: result.created };
  }

  /**
   * Start a gesture: commands until `endGesture` become one undo step. Nests: an inner gesture
   * joins the outer one's step when it ends, and `cancelGesture` undoes only the inner one.
   */
  beginGesture(): void {
    const g = this.#gesture;
    if (g) {
      g.marks.push({ doc: this.#doc, changes: g.patches.length, label: g.label });
      return;
    }
    this.#gesture = {
      marks: [{ doc: this.#doc, changes: 0, label: '' }],
      label: '',
      patches: [],
      inverse: [],
    };
  }

  /**
   * End the innermost gesture. The outermost pushes its commands as one undo step (none if
   * nothing changed).
   */
  endGesture(): void {
    const g = this.#gesture;
    if (!g) return;
    g.marks.pop();
    if (g.marks.length > 0) return;
    this.#gesture = null;
    if (g.patches.length === 0) return;
    const inversePatches = g.inverse.reverse().flat();
    this.#push({ label: g.label, patches: g.patches.flat(), inversePatches });
  }

  /**
   * Abandon the innermost gesture: the document returns to how it was when that gesture began.
   * An outer gesture stays open with its own changes.
   */
  cancelGesture(): void {
    const g = this.#gesture;
    const mark = g?.marks.pop();
    if (!g || !mark) return;
    const changed = g.patches.length > mark.changes;
    g.patches.length = mark.changes;
    g.inverse.length = mark.changes;
    g.label = mark.label;
    if (g.marks.length === 0) this.#gesture = null;
    if (changed) this.#set(mark.doc);
  }

  /** True while a gesture is open. */
  get inGesture(): boolean {
    return this.#gesture !== null;
  }

  /** Revert the last step (an open gesture is ended first). */
  undo(): boolean {
    if (this.#gesture) this.#closeGesture();
    const step = this.#undo.pop();
    if (!step) return false;
    this.#redo.push(step);
    this.#set(applyPatches(this.#doc, step.inversePatches));
    return true;
  }

  /** Repeat the last undone step. */
  redo(): boolean {
    if (this.#gesture) this.#closeGesture();
    const step = this.#redo.pop();
    if (!step) return false;
    this.#undo.push(step);
    this.#set(applyPatches(this.#doc, step.patches));
    return true;
  }

  #closeGesture() {
    if (this.#gesture) this.#gesture.marks.length = 1;
    this.endGesture();
  }

  /** Replace the document (new, open, restore). Not undoable: both stacks are cleared. */
  reset(doc: HeadrouteDocument): void {
    this.#gesture = null;
    this.#undo = [];
    this.#redo = [];
    this.#set(freeze(doc, true));
  }
}
