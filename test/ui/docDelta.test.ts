/**
 * Documents sent to the solver's worker as the records that changed: applying the delta to the
 * document before gives the document after (same values, records in the same order), and the
 * worker solves it exactly as the whole document.
 */
import { describe, expect, it } from 'vitest';
import { network } from '../../bench/networks';
import {
  deleteElements,
  moveNodes,
  updateNode,
  updateSettings,
} from '../../src/lib/model/commands';
import { History } from '../../src/lib/model/history';
import type { HeadrouteDocument } from '../../src/lib/model/types';
import { solve } from '../../src/lib/solver/solve';
import type { SolveRequest, SolveResponse } from '../../src/lib/solver/worker';
import { applyDocDelta, docDelta } from '../../src/lib/model/docDelta';
import { createWorkerRunner, type SolvePort } from '../../src/lib/ui/solveRunner';

const waypointOf = (doc: HeadrouteDocument) =>
  Object.values(doc.nodes).find((n) => n.kind === 'waypoint')!;

describe('docDelta', () => {
  it('carries only the changed records and rebuilds the document after', () => {
    const history = new History(network('series', 20));
    const before = history.doc;
    const w = waypointOf(before);
    history.apply(updateNode(w.id, { z: w.z + 1.5 }));
    const after = history.doc;
    const delta = docDelta(before, after)!;
    expect(Object.keys(delta.nodes)).toEqual([w.id]);
    expect(delta.pipes).toEqual({});
    expect(delta.fields).toEqual({});
    const rebuilt = applyDocDelta(before, delta);
    expect(rebuilt).toEqual(after);
    expect(Object.keys(rebuilt.nodes)).toEqual(Object.keys(after.nodes));
    expect(before.nodes[w.id].z).toBe(w.z); // the document before is left as it was
    expect(JSON.stringify(solve(rebuilt, null))).toBe(JSON.stringify(solve(after, null)));
  });

  it('carries changed settings and moved nodes; none when parts are added or removed', () => {
    const history = new History(network('series', 6));
    const first = history.doc;
    history.apply(updateSettings({ unitSystem: 'US' }));
    history.apply(moveNodes([waypointOf(first).id], 20, 0));
    const changed = history.doc;
    const delta = docDelta(first, changed)!;
    expect(Object.keys(delta.fields)).toEqual(['settings']);
    expect(applyDocDelta(first, delta)).toEqual(changed);
    expect(docDelta(changed, changed)).toEqual({ fields: {}, nodes: {}, pipes: {} });

    history.apply(deleteElements([waypointOf(changed).id]));
    const removed = history.doc;
    expect(docDelta(changed, removed)).toBeNull();
    history.undo(); // the part back: added, so again no delta
    expect(docDelta(removed, history.doc)).toBeNull();
    expect(docDelta(first, network('series', 7))).toBeNull();
  });
});

describe('worker runner', () => {
  it('sends the whole document first, then only what changed, and delivers each result', async () => {
    const posted: SolveRequest[] = [];
    const delivered: SolveResponse[] = [];
    const worker: SolvePort = {
      postMessage: (m: SolveRequest) => void posted.push(m),
      onmessage: null,
      onerror: null,
      terminate: () => undefined,
    };
    const runner = createWorkerRunner(
      worker,
      (r) => delivered.push(r),
      () => undefined,
    );
    // The worker answers with what solver/worker.ts would solve.
    let held: HeadrouteDocument | null = null;
    const answer = () => {
      const request = posted[posted.length - 1];
      held = 'doc' in request ? request.doc : applyDocDelta(held!, request.delta);
      worker.onmessage!({
        data: { id: request.id, revision: request.revision, result: solve(held, request.caseId) },
      });
    };
    const history = new History(network('series', 8));
    runner.request(history.doc, 1, null);
    expect('doc' in posted[0]).toBe(true);
    answer();
    const w = waypointOf(history.doc);
    history.apply(updateNode(w.id, { z: w.z + 1 }));
    runner.request(history.doc, 2, null);
    expect('delta' in posted[1]).toBe(true);
    answer();
    expect(held).toEqual(history.doc);
    expect(delivered.map((d) => d.revision)).toEqual([1, 2]);
    expect(delivered[1].result.nodes[w.id]).toEqual(solve(history.doc, null).nodes[w.id]);
  });

  it('an error reply ends that solve with a failure, and the next request sends the whole document', () => {
    const posted: SolveRequest[] = [];
    const delivered: SolveResponse[] = [];
    const failures: Array<[string, number]> = [];
    const worker: SolvePort = {
      postMessage: (m: SolveRequest) => void posted.push(m),
      onmessage: null,
      onerror: null,
      terminate: () => undefined,
    };
    const runner = createWorkerRunner(
      worker,
      (r) => delivered.push(r),
      (message, revision) => void failures.push([message, revision]),
    );
    const history = new History(network('series', 8));
    runner.request(history.doc, 1, null);
    // A reply naming another request is not this one's answer.
    worker.onmessage!({ data: { id: posted[0].id + 99, revision: 1, error: 'stray' } });
    expect(failures).toEqual([]);
    worker.onmessage!({ data: { id: posted[0].id, revision: 1, error: 'boom' } });
    expect(failures).toEqual([['boom', 1]]);
    const w = waypointOf(history.doc);
    history.apply(updateNode(w.id, { z: w.z + 1 }));
    runner.request(history.doc, 2, null);
    expect(posted).toHaveLength(2);
    expect(posted[1].id).not.toBe(posted[0].id);
    expect('doc' in posted[1]).toBe(true);
    worker.onmessage!({
      data: { id: posted[1].id, revision: 2, result: solve(history.doc, null) },
    });
    expect(delivered.map((d) => d.revision)).toEqual([2]);
  });

  it('a worker that dies solves the request in flight in the page', async () => {
    const delivered: SolveResponse[] = [];
    const worker: SolvePort = {
      postMessage: () => undefined,
      onmessage: null,
      onerror: null,
      terminate: () => undefined,
    };
    const runner = createWorkerRunner(
      worker,
      (r) => delivered.push(r),
      () => undefined,
    );
    runner.request(network('series', 5), 1, null);
    worker.onerror!({ preventDefault: () => undefined });
    await new Promise((resolve) => setTimeout(resolve, 0));
    expect(delivered.map((d) => d.revision)).toEqual([1]);
    expect(delivered[0].result.converged).toBe(true);
  });
});
