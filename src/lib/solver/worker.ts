/**
 * Web Worker entry for the app's background solves: receives {revision, caseId} with either the
 * whole document or only what changed since the document of the request before
 * (model/docDelta.ts), which this worker keeps; posts {revision, result}. The app keeps the
 * newest revision and drops results that come back for older ones.
 */
import { applyDocDelta, type DocDelta } from '../model/docDelta';
import type { HeadrouteDocument, Id } from '../model/types';
import { solve } from './solve';
import type { SolveResult } from './types';

/** Message the app sends to the worker: the whole document, or the changes to the last one. */
export type SolveRequest = { revision: number; caseId: Id | null } & (
  { doc: HeadrouteDocument } | { delta: DocDelta }
);

/** Message the worker posts back. */
export interface SolveResponse {
  revision: number;
  result: SolveResult;
}

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<SolveRequest>) => void) | null;
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
