/**
 * The client of the case worker: one job at a time, and per channel (the comparison table, the
 * envelope) only the newest job waits; a job replaced before it was sent is answered
 * `superseded`. Replies are matched by request id. Where no worker can run (or it crashed),
 * jobs run in the page after the current task.
 */
import {
  answerCaseJob,
  errorText,
  type CaseJob,
  type CaseJobReply,
  type CaseJobRequest,
  type CaseJobValue,
} from './caseJobs';

/** How a job ended. */
export type CaseJobOutcome<T> =
  { ok: true; value: T } | { ok: false; error: string } | { ok: false; superseded: true };

type Channel = 'compare' | 'envelope';

interface Waiting {
  job: CaseJob;
  resolve: (outcome: CaseJobOutcome<unknown>) => void;
}

/** Something that answers case-job requests: a Worker, or a stand-in in tests. */
export interface CaseJobPort {
  postMessage(request: CaseJobRequest): void;
  onmessage: ((event: { data: CaseJobReply }) => void) | null;
  onerror: ((event: { preventDefault(): void }) => void) | null;
  terminate(): void;
}

/** Make a client over `port` (null: run every job in the page). */
export function createCaseWork(port: CaseJobPort | null) {
  let worker = port;
  let nextId = 1;
  let running: { id: number; waiting: Waiting } | null = null;
  const queued = new Map<Channel, Waiting>();

  const finish = (reply: CaseJobReply) => {
    if (!running || reply.id !== running.id) return; // not the job in flight: ignore
    const { waiting } = running;
    running = null;
    waiting.resolve(
      reply.ok ? { ok: true, value: reply.value } : { ok: false, error: reply.error },
    );
    next();
  };

  const next = () => {
    if (running) return;
    const [channel, waiting] = queued.entries().next().value ?? [];
    if (!channel || !waiting) return;
    queued.delete(channel);
    const request: CaseJobRequest = { id: nextId++, ...waiting.job };
    running = { id: request.id, waiting };
    if (worker) {
      try {
        worker.postMessage(request);
        return;
      } catch (error) {
        // a job that cannot be sent (e.g. not cloneable) is answered as an error
        running = null;
        waiting.resolve({ ok: false, error: errorText(error) });
        next();
        return;
      }
    }
    setTimeout(() => finish(answerCaseJob(request)), 0);
  };

  const attach = (w: CaseJobPort) => {
    w.onmessage = (event) => finish(event.data);
    w.onerror = (event) => {
      // The worker itself failed (not a job): finish the work in the page from now on.
      event.preventDefault();
      w.terminate();
      worker = null;
      if (running) {
        const request: CaseJobRequest = { id: running.id, ...running.waiting.job };
        setTimeout(() => finish(answerCaseJob(request)), 0);
      }
    };
  };
  if (worker) attach(worker);

  function run<K extends Channel>(
    job: CaseJob & { kind: K },
  ): Promise<CaseJobOutcome<CaseJobValue[K]>> {
    return new Promise((resolve) => {
      queued.get(job.kind)?.resolve({ ok: false, superseded: true });
      queued.set(job.kind, { job, resolve: resolve as Waiting['resolve'] });
      next();
    });
  }

  return {
    run,
    dispose() {
      worker?.terminate();
      worker = null;
    },
  };
}

/** The client type. */
export type CaseWork = ReturnType<typeof createCaseWork>;

let shared: CaseWork | null = null;

/** The page's case-work client (a worker when the browser can run one). */
export function caseWork(): CaseWork {
  if (shared) return shared;
  let port: CaseJobPort | null = null;
  if (typeof Worker !== 'undefined') {
    try {
      port = new Worker(new URL('./caseWorker.ts', import.meta.url), {
        type: 'module',
      }) as unknown as CaseJobPort;
    } catch {
      port = null;
    }
  }
  shared = createCaseWork(port);
  return shared;
}
