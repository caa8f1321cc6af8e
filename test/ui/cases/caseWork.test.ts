/**
 * The case-work client: requests carry ids, replies are matched by id, only the newest job per
 * channel waits, errors come back as replies, and a dead worker hands the work to the page.
 */
import { describe, expect, it } from 'vitest';
import { network } from '../../../bench/networks';
import { addCase } from '../../../src/lib/model/commands';
import { History } from '../../../src/lib/model/history';
import { compareCases } from '../../../src/lib/solver/compareCases';
import { failedSolve } from '../../../src/lib/solver/failedSolve';
import {
  answerCaseJob,
  type CaseJobReply,
  type CaseJobRequest,
} from '../../../src/lib/ui/cases/caseJobs';
import { createCaseWork, type CaseJobPort } from '../../../src/lib/ui/cases/caseWork';

function withCases() {
  const h = new History(network('series', 6));
  h.apply(addCase('Hot', { temperature: 353.15 }));
  h.apply(addCase('Cold', { temperature: 278.15 }));
  return h.doc;
}

function fakePort() {
  const posted: CaseJobRequest[] = [];
  const port: CaseJobPort = {
    postMessage: (r) => void posted.push(r),
    onmessage: null,
    onerror: null,
    terminate: () => undefined,
  };
  const reply = (r: CaseJobReply) => port.onmessage!({ data: r });
  return { port, posted, reply };
}

describe('case work', () => {
  it('answers a comparison from the worker by request id; a stray id is ignored', async () => {
    const { port, posted, reply } = fakePort();
    const work = createCaseWork(port);
    const doc = withCases();
    const outcome = work.run({ kind: 'compare', doc });
    expect(posted).toHaveLength(1);
    reply({ id: posted[0].id + 1, ok: false, error: 'not mine' });
    reply(answerCaseJob(posted[0]));
    const got = await outcome;
    expect(got.ok).toBe(true);
    if (got.ok) expect(got.value).toEqual(compareCases(doc));
  });

  it('only the newest job of a channel waits; the replaced one is answered superseded', async () => {
    const { port, posted, reply } = fakePort();
    const work = createCaseWork(port);
    const doc = withCases();
    const first = work.run({ kind: 'compare', doc });
    const second = work.run({ kind: 'compare', doc: { ...doc, name: 'second' } });
    const third = work.run({ kind: 'compare', doc: { ...doc, name: 'third' } });
    expect(await second).toEqual({ ok: false, superseded: true });
    reply(answerCaseJob(posted[0]));
    expect((await first).ok).toBe(true);
    expect(posted.map((p) => p.kind === 'compare' && p.doc.name)).toEqual([doc.name, 'third']);
    reply(answerCaseJob(posted[1]));
    expect((await third).ok).toBe(true);
  });

  it('an error in the job comes back as an error reply', async () => {
    const request = { id: 4, kind: 'compare', doc: null } as unknown as CaseJobRequest;
    const answer = answerCaseJob(request);
    expect(answer).toMatchObject({ id: 4, ok: false });
    const { port, posted, reply } = fakePort();
    const work = createCaseWork(port);
    const outcome = work.run({ kind: 'compare', doc: withCases() });
    reply({ id: posted[0].id, ok: false, error: 'boom' });
    expect(await outcome).toEqual({ ok: false, error: 'boom' });
  });

  it('a worker that dies hands the job in flight to the page; no worker runs it in the page', async () => {
    const { port } = fakePort();
    const work = createCaseWork(port);
    const doc = withCases();
    const outcome = work.run({ kind: 'compare', doc });
    port.onerror!({ preventDefault: () => undefined });
    expect((await outcome).ok).toBe(true);
    const inPage = createCaseWork(null);
    const got = await inPage.run({ kind: 'compare', doc });
    expect(got.ok && got.value.cases.length).toBe(3);
  });
});

describe('failedSolve', () => {
  it('is a not-converged result with no figures and one stop finding saying why', () => {
    const doc = withCases();
    const r = failedSolve(doc, null, 'boom');
    expect(r.converged).toBe(false);
    expect(r.pipes).toEqual({});
    expect(r.findings).toHaveLength(1);
    expect(r.findings[0]).toMatchObject({
      level: 'stop',
      message: 'The solver failed (boom); no results.',
    });
    expect(Number.isFinite(r.fluid.density)).toBe(true);
  });
});
