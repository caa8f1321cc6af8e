/**
 * Editor state: the one store the sheet, shelf, details and findings read.
 *
 * The document lives in `$state.raw` and is replaced with each History result (never mutated).
 * Selection, viewport, hover, tool and status are session state: never saved, never undone.
 * Solve results carry the revision they were computed for (see solveRunner.ts).
 */
import { History } from '../model/history';
import type { Command, CommandError } from '../model/commands';
import { createDocument } from '../model/defaults';
import { onlySheetPositionsChanged } from '../model/sheetPositions';
import type { HeadrouteDocument, Id } from '../model/types';
import { failedSolve } from '../solver/failedSolve';
import type { SolveResult } from '../solver/types';
import { IDENTITY, type Viewport } from './sheet/viewport';
import { createSolveRunner, type SolveRunner } from './solveRunner';

/** A short message in the status line, optionally placed near the pointer. */
export interface StatusMessage {
  text: string;
  level: 'info' | 'error';
  at?: { x: number; y: number };
  time: number;
}

/** Result of a solve tagged with the document (and its revision) it belongs to. */
export interface TaggedResult {
  revision: number;
  result: SolveResult;
  /**
   * The document that was solved: draw results against this, not a newer document. After a
   * move on the sheet the result is carried to the new revision and this stays the document
   * that was solved (positions on the sheet do not enter a solve).
   */
  doc: HeadrouteDocument;
}

class Editor {
  #history = new History(createDocument('Untitled project'));
  #runner: SolveRunner | null = null;
  /** Documents sent to the solver and not yet answered, by revision (bookkeeping, not state). */
  // eslint-disable-next-line svelte/prefer-svelte-reactivity
  #requested = new Map<number, { doc: HeadrouteDocument; caseId: Id | null }>();

  /** The document; replaced on every change. */
  doc = $state.raw<HeadrouteDocument>(this.#history.doc);
  /** Revision of `doc` (increases on every change, including undo/redo/load). */
  revision = $state(this.#history.revision);
  canUndo = $state(false);
  canRedo = $state(false);
  /** The latest document outside a gesture: a committed edit (changes at a drag's end). */
  committedDoc = $state.raw<HeadrouteDocument>(this.#history.doc);
  /** Revision last saved or loaded; the project is unsaved when it differs. */
  savedRevision = $state(this.#history.revision);
  fileName = $state<string | null>(null);

  selection = $state.raw<Id[]>([]);
  hover = $state<Id | null>(null);
  viewport = $state.raw<Viewport>(IDENTITY);
  tool = $state<'select' | 'pipe'>('select');
  status = $state.raw<StatusMessage | null>(null);
  /** Operating case solved and shown (null = base case). */
  caseId = $state<Id | null>(null);
  /** Increases when the sheet should fit the drawing to the view (after a load). */
  fitRequest = $state(0);

  /** Latest solve result received (may belong to an older revision while a solve runs). */
  tagged = $state.raw<TaggedResult | null>(null);
  /** The result for the current document, or null while it is being solved. */
  readonly result = $derived(
    this.tagged && this.tagged.revision === this.revision ? this.tagged.result : null,
  );
  /** Latest result even if older than the document (drawn dimmed, marked as updating). */
  readonly lastResult = $derived(this.tagged?.result ?? null);
  /** The document `lastResult` was solved for (the current one once it has been solved). */
  readonly solvedDoc = $derived(this.tagged?.doc ?? null);
  readonly solving = $derived(this.tagged === null || this.tagged.revision !== this.revision);
  /** A gesture is open and one of its changes had to wait for its result. */
  #lagInGesture = $state(false);
  /**
   * Results are drawn dimmed: while they are older than the document and, once that has
   * happened during a drag, until the drag ends. So a drag on a large sheet (solved in the
   * background) dims the results once, rather than on and off with every move: each switch
   * restyles and repaints every result text of the sheet.
   */
  readonly dimmed = $derived(this.solving || this.#lagInGesture);
  readonly dirty = $derived(this.revision !== this.savedRevision);

  /**
   * Apply a command as one undo step (or part of the open gesture). Returns the ids it created,
   * or false (with the reason in the status) when the command was refused.
   */
  dispatch(command: Command, at?: { x: number; y: number }): Id[] | false {
    const outcome = this.#history.apply(command);
    if (!outcome.ok) {
      this.refuse(outcome.error, at);
      return false;
    }
    this.#sync();
    return outcome.created;
  }

  /**
   * Apply a command for an inline editor: returns the refusal message (shown beside the field)
   * or null when it was applied.
   */
  tryDispatch(command: Command): string | null {
    const outcome = this.#history.apply(command);
    if (!outcome.ok) return outcome.error.message;
    this.#sync();
    return null;
  }

  /** Show why a command was refused. */
  refuse(error: CommandError, at?: { x: number; y: number }): void {
    this.say(error.message, 'error', at);
  }

  /** Put a message in the status line. */
  say(text: string, level: 'info' | 'error' = 'info', at?: { x: number; y: number }): void {
    const status = { text, level, at, time: Date.now() };
    this.status = status;
    if (at) {
      // The message near the pointer fades after a while; the status line keeps it.
      setTimeout(() => {
        if (this.status === status) this.status = { ...status, at: undefined };
      }, 4000);
    }
  }

  beginGesture(): void {
    this.#history.beginGesture();
  }
  endGesture(): void {
    this.#history.endGesture();
    this.#sync();
  }
  cancelGesture(): void {
    this.#history.cancelGesture();
    this.#sync();
  }

  undo(): void {
    this.#history.undo();
    this.#sync();
    this.#pruneSelection();
  }
  redo(): void {
    this.#history.redo();
    this.#sync();
    this.#pruneSelection();
  }

  /** Replace the document (new, open, demo, restore): not undoable, clears history and selection. */
  load(doc: HeadrouteDocument, fileName: string | null = null, unsaved = false): void {
    this.#history.reset(doc);
    this.selection = [];
    this.hover = null;
    this.caseId = null;
    this.fileName = fileName;
    this.#sync();
    this.savedRevision = unsaved ? -1 : this.revision;
    this.fitRequest++;
  }

  /** Mark the current revision as saved. */
  markSaved(fileName?: string): void {
    this.savedRevision = this.revision;
    if (fileName) this.fileName = fileName;
  }

  select(ids: Id[]): void {
    this.selection = ids.filter((id) => this.#exists(id));
  }

  #exists(id: Id): boolean {
    return Object.hasOwn(this.doc.nodes, id) || Object.hasOwn(this.doc.pipes, id);
  }

  #pruneSelection(): void {
    if (this.selection.some((id) => !this.#exists(id))) this.select(this.selection);
  }

  #sync(): void {
    const h = this.#history;
    const [before, beforeRevision] = [this.doc, this.revision];
    this.doc = h.doc;
    this.revision = h.revision;
    this.canUndo = h.canUndo;
    this.canRedo = h.canRedo;
    if (!h.inGesture) {
      this.#lagInGesture = false;
      this.committedDoc = h.doc;
    }
    if (!this.#carryResult(before, beforeRevision)) this.#requestSolve();
  }

  /**
   * Parts moved on the sheet and nothing else changed: the hydraulics are the same, so the
   * result current for the document before holds for this one, with no solve. Returns false
   * (a solve is needed) otherwise.
   */
  #carryResult(before: HeadrouteDocument, beforeRevision: number): boolean {
    const t = this.tagged;
    if (!t || t.revision !== beforeRevision || t.result.caseId !== this.caseId) return false;
    if (!onlySheetPositionsChanged(before, this.doc)) return false;
    this.tagged = { ...t, revision: this.revision };
    return true;
  }

  #requestSolve(): void {
    this.#runner ??= createSolveRunner(
      ({ revision, result }) => this.#solved(revision, () => result),
      (message, revision) => {
        // The solve ended in an error: show it as a finding on that revision (the status
        // line stops saying "solving…"), never wait for ever.
        this.#solved(revision, (doc, caseId) => failedSolve(doc, caseId, message));
        this.say(`The solver stopped: ${message}. The sheet stays editable.`, 'error');
      },
    );
    this.#requested.set(this.revision, { doc: this.doc, caseId: this.caseId });
    this.#runner.request(this.doc, this.revision, this.caseId);
    if (this.#history.inGesture && this.solving) this.#lagInGesture = true;
  }

  /** A solve for `revision` ended: keep its result if it is the newest one. */
  #solved(
    revision: number,
    result: (doc: HeadrouteDocument, caseId: Id | null) => SolveResult,
  ): void {
    const asked = this.#requested.get(revision);
    for (const r of this.#requested.keys()) if (r < revision) this.#requested.delete(r);
    // Keep only the newest revision's result; a late reply for an older one is dropped.
    if (asked && (!this.tagged || revision >= this.tagged.revision))
      this.tagged = { revision, result: result(asked.doc, asked.caseId), doc: asked.doc };
  }

  /** Solve again (e.g. after the case changes). */
  resolve(): void {
    this.#requestSolve();
  }
}

/** The app's single editor. */
export const editor = new Editor();
export type { Editor };
