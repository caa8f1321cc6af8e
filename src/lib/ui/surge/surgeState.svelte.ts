/**
 * The surge panel's state (UI state, never saved in the document): the event being set up, the
 * last run and whether one is under way. Runs go to a Web Worker (solver/surgeWorker.ts), or
 * run in the page when workers are not available.
 */
import type { HeadrouteDocument, Id } from '../../model/types';
import { runSurge } from '../../solver/surge/run';
import type { ClosureLaw, SurgeEvent, SurgeResult } from '../../solver/surge/types';
import type { SurgeRequest, SurgeResponse } from '../../solver/surgeWorker';

/** What the user sets up. */
export interface SurgeSetup {
  kind: 'close' | 'trip';
  /** Valve or pump id. */
  element: Id | null;
  /** Closure time, s. */
  time: number;
  law: ClosureLaw;
  /** Inertia, kg·m²; null estimates it. */
  inertia: number | null;
  /** Simulated time, s. */
  duration: number;
}

class SurgeState {
  open = $state(false);
  setup = $state<SurgeSetup>({
    kind: 'trip',
    element: null,
    time: 1,
    law: 'linear',
    inertia: null,
    duration: 30,
  });
  result = $state.raw<SurgeResult | null>(null);
  /** The document the result was run on. */
  ranOn = $state.raw<HeadrouteDocument | null>(null);
  running = $state(false);
  /** Milliseconds the last run took. */
  ms = $state<number | null>(null);
  /** Index of the traced section shown in the time plot. */
  trace = $state(0);

  private worker: Worker | null = null;
  private next = 0;

  /** The event of the current setup, or null when no element is chosen. */
  event(): SurgeEvent | null {
    const s = this.setup;
    if (!s.element) return null;
    return s.kind === 'close'
      ? { kind: 'close', element: s.element, time: s.time, law: s.law }
      : { kind: 'trip', pump: s.element, inertia: s.inertia };
  }

  /** Runs the event on `doc` (case `caseId`); a newer run replaces an older one. */
  run(doc: HeadrouteDocument, caseId: Id | null): void {
    const event = this.event();
    if (!event) return;
    const id = ++this.next;
    const options = { caseId, duration: this.setup.duration };
    this.running = true;
    const deliver = (result: SurgeResult, ms: number) => {
      if (id !== this.next) return;
      this.result = result;
      this.ranOn = doc;
      this.ms = ms;
      this.running = false;
      if (this.trace >= result.traces.length) this.trace = 0;
    };
    const worker = this.ensureWorker();
    if (worker) {
      worker.onmessage = (e: MessageEvent<SurgeResponse>) => {
        if (e.data.id === this.next) deliver(e.data.result, e.data.ms);
      };
      const request: SurgeRequest = { id, doc, event, options };
      worker.postMessage(request);
      return;
    }
    const t0 = performance.now();
    deliver(runSurge(doc, event, options), performance.now() - t0);
  }

  private ensureWorker(): Worker | null {
    if (this.worker) return this.worker;
    if (typeof Worker === 'undefined') return null;
    try {
      this.worker = new Worker(new URL('../../solver/surgeWorker.ts', import.meta.url), {
        type: 'module',
      });
      this.worker.onerror = () => {
        this.worker?.terminate();
        this.worker = null;
        this.running = false;
      };
    } catch {
      this.worker = null;
    }
    return this.worker;
  }
}

/** The one surge panel state of the page. */
export const surge = new SurgeState();
