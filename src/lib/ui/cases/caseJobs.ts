/**
 * Work across all cases (the comparison table, the HGL envelope along a route): what is asked,
 * and the pure function that does it. It runs in a Web Worker (caseWorker.ts) so that solving
 * every case of a large sheet never blocks the page; in the page only where no worker runs.
 */
import type { HeadrouteDocument, Id } from '../../model/types';
import { compareCases, type CaseComparison } from '../../solver/compareCases';
import type { SolveResult } from '../../solver/types';
import { caseEnvelope, type CaseEnvelope } from './caseEnvelope';

/** One piece of work across the cases. */
export type CaseJob =
  | { kind: 'compare'; doc: HeadrouteDocument }
  | {
      kind: 'envelope';
      doc: HeadrouteDocument;
      route: Id[];
      /** Results already computed, by case id ('' for the base case). */
      known: Map<string, SolveResult>;
    };

/** What each kind of job answers. */
export interface CaseJobValue {
  compare: CaseComparison;
  envelope: CaseEnvelope | null;
}

/** Message to the case worker. */
export type CaseJobRequest = { id: number } & CaseJob;

/** Message back: the value, or the error as a reply (never a silent drop). */
export type CaseJobReply = { id: number } & (
  { ok: true; value: CaseJobValue[CaseJob['kind']] } | { ok: false; error: string }
);

/** Do a job. Throws what the solver or the envelope throws. */
export function runCaseJob(job: CaseJob): CaseJobValue[CaseJob['kind']] {
  return job.kind === 'compare'
    ? compareCases(job.doc)
    : caseEnvelope(job.doc, job.route, job.known);
}

/** The message of an error, short. */
export function errorText(error: unknown): string {
  const text = error instanceof Error ? error.message : String(error);
  return text.length > 200 ? `${text.slice(0, 197)}…` : text;
}

/** Answer one request (the worker's message handler, also used by tests). */
export function answerCaseJob(request: CaseJobRequest): CaseJobReply {
  try {
    return { id: request.id, ok: true, value: runCaseJob(request) };
  } catch (error) {
    return { id: request.id, ok: false, error: errorText(error) };
  }
}
