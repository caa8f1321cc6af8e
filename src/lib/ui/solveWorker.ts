/**
 * Web Worker entry for the app's background solves: like solver/worker.ts, but a request may
 * carry only what changed since the document of the request before (docDelta.ts), which this
 * worker keeps. Posts {revision, result} (solver/worker.ts's SolveResponse).
 */
import type { HeadrouteDocument, Id } from '../model/types';
import { solve } from '../solver/solve';
import type { SolveResponse } from '../solver/worker';
import { applyDocDelta, type DocDelta } from './docDelta';

/** A request: the whole document, or the changes to the one of the request before. */
export type WorkerRequest = { revision: number; caseId: Id | null } & (
  { doc: HeadrouteDocument } | { delta: DocDelta }
);

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<WorkerRequest>) => void) | null;
  postMessage(message: SolveResponse): void;
};

/** The document of the last request. */
let last: HeadrouteDocument | null = null;

scope.onmessage = (event) => {
  const request = event.data;
  if ('doc' in request) last = request.doc;
  else if (last) last = applyDocDelta(last, request.delta);
  else throw new Error('a change arrived before any document');
  scope.postMessage({ revision: request.revision, result: solve(last, request.caseId) });
};
