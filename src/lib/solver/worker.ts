/**
 * Web Worker entry for the app's background solves: receives {id, revision, caseId} with either
 * the whole document or only what changed since the document of the request before
 * (model/docDelta.ts), which this worker keeps; posts {id, revision, result}, or
 * {id, revision, error} when anything throws (after which it holds no document, so the next
 * request must send a whole one). The app keeps the newest revision and drops results that
 * come back for older ones.
 */
import { applyDocDelta, type DocDelta } from '../model/docDelta';
import type { HeadrouteDocument, Id } from '../model/types';
import { solve } from './solve';
import type { SolveResult } from './types';

/** Message the app sends to the worker: the whole document, or the changes to the last one. */
export type SolveRequest = { id: number; revision: number; caseId: Id | null } & (
  { doc: HeadrouteDocument } | { delta: DocDelta }
);

/** A solve result for a revision. */
export interface SolveResponse {
  revision: number;
  result: SolveResult;
}

/** Message the worker posts back: the result, or the error, for request `id`. */
export type SolveReply = { id: number } & (SolveResponse | { revision: number; error: string });

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<SolveRequest>) => void) | null;
  postMessage(message: SolveReply): void;
};

/** The document of the last request. */
let last: HeadrouteDocument | null = null;

scope.onmessage = (event) => {
  const { id, revision } = event.data;
  try {
    const request = event.data;
    if ('doc' in request) last = request.doc;
    else if (last) last = applyDocDelta(last, request.delta);
    else throw new Error('a change arrived before any document');
    scope.postMessage({ id, revision, result: solve(last, request.caseId) });
  } catch (error) {
    last = null;
    const text = error instanceof Error ? error.message : String(error);
    scope.postMessage({ id, revision, error: text.length > 200 ? `${text.slice(0, 197)}…` : text });
  }
};
