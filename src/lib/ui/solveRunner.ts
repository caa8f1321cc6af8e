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
import type { SolveReply, SolveRequest, SolveResponse } from '../solver/worker';

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

/** What the worker runner needs of a Worker (a stand-in in tests). */
export interface SolvePort {
  postMessage(request: SolveRequest): void;
  onmessage: ((event: { data: SolveReply }) => void) | null;
  onerror: ((event: { preventDefault(): void }) => void) | null;
  terminate(): void;
}

/**
 * Solve in a Web Worker running solver/worker.ts; falls back to the page if the worker itself
 * fails. Each request carries an id and the reply names it; an error comes back as a reply
 * and ends that solve with `fail` (then the whole document is sent again). After the first
 * document, each request sends only the records that changed (docDelta.ts).
 */
export function createWorkerRunner(worker: SolvePort, deliver: Deliver, fail: Fail): SolveRunner {
  let busy = false;
  let nextId = 1;
  /** Id of the request in flight. */
  let inFlight = 0;
  let pending: Job | null = null;
  let fallback: SolveRunner | null = null;
  /** The document the worker holds (the last one sent). */
  let sent: HeadrouteDocument | null = null;
  const send = () => {
    if (busy || !pending) return;
    busy = true;
    const { doc, revision, caseId } = pending;
    const delta = sent && docDelta(sent, doc);
    const id = (inFlight = nextId++);
    const request: SolveRequest = delta
      ? { id, revision, caseId, delta }
      : { id, revision, caseId, doc };
    pending = null;
    try {
      worker.postMessage(request);
    } catch (error) {
      busy = false;
      sent = null;
      fail(String(error), revision);
      return send();
    }
    sent = doc;
  };
  worker.onmessage = (event) => {
    const reply = event.data;
    if (reply.id !== inFlight) return; // not the request in flight
    busy = false;
    if ('error' in reply) {
      sent = null; // the worker dropped its document
      fail(reply.error, reply.revision);
    } else deliver({ revision: reply.revision, result: reply.result });
    send();
  };
  let lastJob: Job | null = null;
  worker.onerror = (event) => {
    event.preventDefault();
    busy = false;
    worker.terminate();
    fallback = createInlineRunner(deliver, fail);
    // The request in flight died with the worker: solve the newest document in the page.
    const job = pending ?? lastJob;
    if (job) fallback.request(job.doc, job.revision, job.caseId);
  };
  return {
    request(doc, revision, caseId) {
      if (fallback) return fallback.request(doc, revision, caseId);
      // $state.raw documents are plain frozen objects: structured clone copies them as they are.
      pending = lastJob = { doc, revision, caseId };
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
      }) as unknown as SolvePort;
      return createAdaptiveRunner(createWorkerRunner(worker, deliver, fail), deliver, fail);
    } catch {
      // fall through to solving in the page
    }
  }
  return createInlineRunner(deliver, fail);
}
