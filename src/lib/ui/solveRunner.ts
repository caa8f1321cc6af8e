/**
 * Runs the solver in a Web Worker when one can be started, in the page otherwise.
 * Requests are coalesced: at most one solve runs at a time and only the newest document waits;
 * each result carries the revision it was solved for, so the editor can drop stale ones.
 */
import type { HeadrouteDocument, Id } from '../model/types';
import { solve } from '../solver/solve';
import type { SolveRequest, SolveResponse } from '../solver/worker';

export interface SolveRunner {
  request(doc: HeadrouteDocument, revision: number, caseId: Id | null): void;
  dispose(): void;
}

type Deliver = (tagged: SolveResponse) => void;
type Fail = (message: string, revision: number) => void;

/** Solve in the page, coalescing requests made in the same task. */
export function createInlineRunner(deliver: Deliver, fail: Fail): SolveRunner {
  let pending: SolveRequest | null = null;
  let scheduled = false;
  const run = () => {
    scheduled = false;
    const job = pending;
    pending = null;
    if (!job) return;
    try {
      deliver({ revision: job.revision, result: solve(job.doc, job.caseId) });
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

/** Solve in a Web Worker; falls back to the page if the worker fails. */
export function createWorkerRunner(worker: Worker, deliver: Deliver, fail: Fail): SolveRunner {
  let busy = false;
  let pending: SolveRequest | null = null;
  let fallback: SolveRunner | null = null;
  const send = () => {
    if (busy || !pending) return;
    busy = true;
    worker.postMessage(pending);
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

/** The runner the app uses: a Worker when the browser can start one. */
export function createSolveRunner(deliver: Deliver, fail: Fail): SolveRunner {
  if (typeof Worker !== 'undefined') {
    try {
      const worker = new Worker(new URL('../solver/worker.ts', import.meta.url), {
        type: 'module',
      });
      return createWorkerRunner(worker, deliver, fail);
    } catch {
      // fall through to solving in the page
    }
  }
  return createInlineRunner(deliver, fail);
}
