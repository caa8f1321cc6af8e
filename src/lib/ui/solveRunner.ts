/**
 * Runs the solver in the page for small sheets and in a Web Worker for large ones.
 *
 * A small sheet (the demo projects solve in a few milliseconds) is solved at once, inside the
 * edit, so the state update that shows the edit also carries its result: one render, and no
 * frame with the sheet moved but the results dimmed or the profile drawn from the old result. A large sheet goes to the worker so the page stays
 * responsive while it solves. Requests are coalesced: at most one solve runs at a time and only
 * the newest document waits; each result carries the revision it was solved for, so the editor
 * can drop stale ones.
 */
import type { HeadrouteDocument, Id } from '../model/types';
import { solve } from '../solver/solve';
import type { SolveRequest, SolveResponse } from '../solver/worker';

/** A document waiting to be solved. */
interface Job {
  revision: number;
  doc: HeadrouteDocument;
  caseId: Id | null;
}
import { docDelta } from '../model/docDelta';

export interface SolveRunner {
  request(doc: HeadrouteDocument, revision: number, caseId: Id | null): void;
  dispose(): void;
}

type Deliver = (tagged: SolveResponse) => void;
type Fail = (message: string, revision: number) => void;

/**
 * Solve in the page, coalescing requests made in the same task. `observe` hears how long each
 * solve took (ms, by `now`) and of which document.
 */
export function createInlineRunner(
  deliver: Deliver,
  fail: Fail,
  observe?: (ms: number, doc: HeadrouteDocument) => void,
  now: () => number = () => performance.now(),
): SolveRunner {
  let pending: Job | null = null;
  let scheduled = false;
  const run = () => {
    scheduled = false;
    const job = pending;
    pending = null;
    if (!job) return;
    const t0 = now();
    try {
      const result = solve(job.doc, job.caseId);
      observe?.(now() - t0, job.doc);
      deliver({ revision: job.revision, result });
    } catch (error) {
      fail(String(error), job.revision);
    }
  };
  return {
    request(doc, revision, caseId) {
      pending = { doc, revision, caseId };
      if (scheduled) return;
      scheduled = true;
      queueMicrotask(run);
    },
    dispose() {
      pending = null;
    },
  };
}

/**
 * Solve in a Web Worker running solver/worker.ts; falls back to the page if the worker fails.
 * After the first document, each request sends only the records that changed (docDelta.ts).
 */
export function createWorkerRunner(worker: Worker, deliver: Deliver, fail: Fail): SolveRunner {
  let busy = false;
  let pending: Job | null = null;
  let fallback: SolveRunner | null = null;
  /** The document the worker holds (the last one sent). */
  let sent: HeadrouteDocument | null = null;
  const send = () => {
    if (busy || !pending) return;
    busy = true;
    const { doc, revision, caseId } = pending;
    const delta = sent && docDelta(sent, doc);
    const request: SolveRequest = delta ? { revision, caseId, delta } : { revision, caseId, doc };
    worker.postMessage(request);
    sent = doc;
    pending = null;
  };
  worker.onmessage = (event: MessageEvent<SolveResponse>) => {
    busy = false;
    deliver(event.data);
    send();
  };
  worker.onerror = (event) => {
    event.preventDefault();
    busy = false;
    worker.terminate();
    fallback = createInlineRunner(deliver, fail);
    if (pending) fallback.request(pending.doc, pending.revision, pending.caseId);
  };
  return {
    request(doc, revision, caseId) {
      if (fallback) return fallback.request(doc, revision, caseId);
      // $state.raw documents are plain frozen objects: structured clone copies them as they are.
      pending = { doc, revision, caseId };
      send();
    },
    dispose() {
      worker.terminate();
      fallback?.dispose();
    },
  };
}

/** Sheets with at most this many nodes and pipes may be solved in the page. */
export const INLINE_ELEMENT_LIMIT = 400;
/**
 * In-page solves slower than this (ms), SLOW_STREAK times in a row, send sheets of that size or
 * larger to the worker. (One slow solve is normal: the first solve of a sheet also orders its
 * matrix, and the page's engine is still warming up.)
 */
export const INLINE_TIME_LIMIT = 6;
export const SLOW_STREAK = 3;

/** Nodes plus pipes of a document. */
export function elementCount(doc: HeadrouteDocument): number {
  return Object.keys(doc.nodes).length + Object.keys(doc.pipes).length;
}

/**
 * Small sheets in the page, large ones in `background` (a worker runner). The size limit starts
 * at INLINE_ELEMENT_LIMIT and drops below the size of a sheet whose in-page solves took longer
 * than INLINE_TIME_LIMIT SLOW_STREAK times in a row, so a slow machine or an unusually hard
 * sheet moves to the worker.
 * A result from the worker for an older revision than one solved in the page is dropped by the
 * editor's revision check.
 */
export function createAdaptiveRunner(
  background: SolveRunner,
  deliver: Deliver,
  fail: Fail,
  now: () => number = () => performance.now(),
): SolveRunner {
  let limit = INLINE_ELEMENT_LIMIT;
  let slow = 0;
  return {
    request(doc, revision, caseId) {
      const size = elementCount(doc);
      if (size > limit) return background.request(doc, revision, caseId);
      // At once, in the caller's task: the state update that shows the edit carries its result.
      const t0 = now();
      let result;
      try {
        result = solve(doc, caseId);
      } catch (error) {
        return fail(String(error), revision);
      }
      slow = now() - t0 > INLINE_TIME_LIMIT ? slow + 1 : 0;
      if (slow >= SLOW_STREAK) [limit, slow] = [Math.min(limit, size - 1), 0];
      deliver({ revision, result });
    },
    dispose() {
      background.dispose();
    },
  };
}

/** The runner the app uses: small sheets in the page, large ones in a Worker when possible. */
export function createSolveRunner(deliver: Deliver, fail: Fail): SolveRunner {
  if (typeof Worker !== 'undefined') {
    try {
      const worker = new Worker(new URL('../solver/worker.ts', import.meta.url), {
        type: 'module',
      });
      return createAdaptiveRunner(createWorkerRunner(worker, deliver, fail), deliver, fail);
    } catch {
      // fall through to solving in the page
    }
  }
  return createInlineRunner(deliver, fail);
}
