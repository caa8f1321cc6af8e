import { beforeAll, describe, expect, it } from 'vitest';
import { network } from '../../bench/networks';
import { updateNode } from '../../src/lib/model/commands';
import { docDelta } from '../../src/lib/model/docDelta';
import { History } from '../../src/lib/model/history';
import { solve } from '../../src/lib/solver/solve';
import type { SolveReply, SolveRequest } from '../../src/lib/solver/worker';
import { at, Sheet } from './helpers';

describe('solver worker entry', () => {
  // The module sets `self.onmessage` once when it is first imported: one scope for the file.
  const posted: SolveReply[] = [];
  const scope = {
    onmessage: null as ((event: { data: SolveRequest }) => void) | null,
    postMessage: (message: SolveReply) => posted.push(message),
  };
  beforeAll(async () => {
    (globalThis as unknown as { self: typeof scope }).self = scope;
    await import('../../src/lib/solver/worker');
    delete (globalThis as { self?: unknown }).self;
  });

  it('answers {revision, doc, caseId} with {revision, result}', () => {
    posted.length = 0;
    const s = new Sheet();
    s.vessel('A', 10);
    s.vessel('B', 5);
    s.pipe('P1', at('A', 'N1'), at('B', 'N1'));
    scope.onmessage!({ data: { id: 1, revision: 7, doc: s.doc, caseId: null } });
    expect(posted).toHaveLength(1);
    expect(posted[0].revision).toBe(7);
    const reply = posted[0];
    if (!('result' in reply)) throw new Error(`expected a result, got ${JSON.stringify(reply)}`);
    expect(reply.id).toBe(1);
    expect(reply.result.converged).toBe(true);
    expect(reply.result.pipes.P1.flow).toBeGreaterThan(0);
  });

  it('answers a whole document, then a delta against it, as solving the document would', () => {
    posted.length = 0;
    const history = new History(network('series', 8));
    const before = history.doc;
    scope.onmessage!({ data: { id: 2, revision: 1, caseId: null, doc: before } });
    const w = Object.values(before.nodes).find((n) => n.kind === 'waypoint')!;
    history.apply(updateNode(w.id, { z: w.z - 2 }));
    const delta = docDelta(before, history.doc)!;
    scope.onmessage!({ data: { id: 3, revision: 2, caseId: null, delta } });
    expect(posted.map((p) => p.revision)).toEqual([1, 2]);
    const reply = posted[1];
    expect('result' in reply && JSON.stringify(reply.result)).toBe(
      JSON.stringify(solve(history.doc, null)),
    );
  });

  it('answers a throw with an error reply naming the request, then needs a whole document', () => {
    posted.length = 0;
    const history = new History(network('series', 8));
    const before = history.doc;
    scope.onmessage!({ data: { id: 10, revision: 1, caseId: null, doc: before } });
    // A message that makes the worker throw (a delta that is not one).
    const broken = null as never;
    expect(() =>
      scope.onmessage!({ data: { id: 11, revision: 2, caseId: null, delta: broken } }),
    ).not.toThrow();
    const w = Object.values(before.nodes).find((n) => n.kind === 'waypoint')!;
    history.apply(updateNode(w.id, { z: w.z - 2 }));
    const delta = docDelta(before, history.doc)!;
    scope.onmessage!({ data: { id: 12, revision: 3, caseId: null, delta } });
    scope.onmessage!({ data: { id: 13, revision: 4, caseId: null, doc: history.doc } });
    expect(posted.map((p) => [p.id, 'error' in p])).toEqual([
      [10, false],
      [11, true],
      [12, true],
      [13, false],
    ]);
  });
});
