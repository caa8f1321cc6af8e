/**
 * Web Worker entry for work across all cases (caseJobs.ts): each request carries an id, and
 * the reply carries the same id with the value or the error.
 */
import { answerCaseJob, type CaseJobReply, type CaseJobRequest } from './caseJobs';

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<CaseJobRequest>) => void) | null;
  postMessage(message: CaseJobReply): void;
};

scope.onmessage = (event) => scope.postMessage(answerCaseJob(event.data));
