/**
 * Web Worker entry for surge runs: receives {id, doc, event, options}, posts {id, result}. The
 * app keeps the newest id and drops older answers.
 */
import type { HeadrouteDocument } from '../model/types';
import { runSurge } from './surge/run';
import type { SurgeEvent, SurgeOptions, SurgeResult } from './surge/types';

/** Message the app sends. */
export interface SurgeRequest {
  id: number;
  doc: HeadrouteDocument;
  event: SurgeEvent;
  options: SurgeOptions;
}

/** Message the worker posts back. */
export interface SurgeResponse {
  id: number;
  result: SurgeResult;
  /** Milliseconds the run took inside the worker. */
  ms: number;
}

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<SurgeRequest>) => void) | null;
  postMessage(message: SurgeResponse): void;
};

scope.onmessage = (event) => {
  const { id, doc, event: surgeEvent, options } = event.data;
  const t0 = performance.now();
  const result = runSurge(doc, surgeEvent, options);
  scope.postMessage({ id, result, ms: performance.now() - t0 });
};
