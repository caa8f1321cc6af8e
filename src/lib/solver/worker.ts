/**
 * Web Worker entry for the app: receives {revision, doc, caseId}, posts {revision, result}.
 * The app keeps the newest revision and drops results that come back for older ones.
 */
import type { HeadrouteDocument, Id } from '../model/types';
import { solve } from './solve';
import type { SolveResult } from './types';

/** Message the app sends to the worker. */
export interface SolveRequest {
  revision: number;
  doc: HeadrouteDocument;
  caseId: Id | null;
}

/** Message the worker posts back. */
export interface SolveResponse {
  revision: number;
  result: SolveResult;
}

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<SolveRequest>) => void) | null;
  postMessage(message: SolveResponse): void;
};

scope.onmessage = (event) => {
  const { revision, doc, caseId } = event.data;
  scope.postMessage({ revision, result: solve(doc, caseId) });
};
