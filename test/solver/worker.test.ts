import { describe, expect, it } from 'vitest';
import type { SolveRequest, SolveResponse } from '../../src/lib/solver/worker';
import { at, Sheet } from './helpers';

describe('solver worker entry', () => {
  it('answers {revision, doc, caseId} with {revision, result}', async () => {
    const posted: SolveResponse[] = [];
    const scope = {
      onmessage: null as ((event: { data: SolveRequest }) => void) | null,
      postMessage: (message: SolveResponse) => posted.push(message),
    };
    (globalThis as unknown as { self: typeof scope }).self = scope;
    await import('../../src/lib/solver/worker');
    const s = new Sheet();
    s.vessel('A', 10);
    s.vessel('B', 5);
    s.pipe('P1', at('A', 'N1'), at('B', 'N1'));
    scope.onmessage!({ data: { revision: 7, doc: s.doc, caseId: null } });
    expect(posted).toHaveLength(1);
    expect(posted[0].revision).toBe(7);
    expect(posted[0].result.converged).toBe(true);
    expect(posted[0].result.pipes.P1.flow).toBeGreaterThan(0);
    delete (globalThis as { self?: unknown }).self;
  });
});
