/**
 * The solve runner: small sheets solved in the page in the same task (coalesced), large ones
 * handed to the background runner, and a slow in-page solve moving that size to the background.
 */
import { describe, expect, it } from 'vitest';
import type { HeadrouteDocument } from '../../src/lib/model/types';
import {
  createAdaptiveRunner,
  createInlineRunner,
  elementCount,
  INLINE_ELEMENT_LIMIT,
  SLOW_STREAK,
  type SolveRunner,
} from '../../src/lib/ui/solveRunner';
import type { SolveResponse } from '../../src/lib/solver/worker';
import { network } from '../../bench/networks';

function recorder() {
  const requests: Array<{ doc: HeadrouteDocument; revision: number }> = [];
  const background: SolveRunner = {
    request: (doc, revision) => void requests.push({ doc, revision }),
    dispose: () => undefined,
  };
  return { requests, background };
}

const settle = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

describe('solve runner', () => {
  it('solves in the page once per task, for the newest revision only', async () => {
    const delivered: SolveResponse[] = [];
    const runner = createInlineRunner(
      (r) => void delivered.push(r),
      () => undefined,
    );
    const doc = network('series', 5);
    runner.request(doc, 1, null);
    runner.request(doc, 2, null);
    runner.request(doc, 3, null);
    expect(delivered).toHaveLength(0); // not before the task ends
    await settle();
    expect(delivered.map((d) => d.revision)).toEqual([3]);
    expect(delivered[0].result.converged).toBe(true);
  });

  it('keeps small sheets in the page and sends large ones to the background', async () => {
    const { requests, background } = recorder();
    const delivered: number[] = [];
    const runner = createAdaptiveRunner(
      background,
      (r) => void delivered.push(r.revision),
      () => {
        throw new Error('no failure expected');
      },
    );
    const small = network('series', 10);
    const large = network('series', INLINE_ELEMENT_LIMIT); // about 2 × the limit in elements
    expect(elementCount(large)).toBeGreaterThan(INLINE_ELEMENT_LIMIT);
    runner.request(small, 1, null);
    runner.request(large, 2, null);
    await settle();
    expect(delivered).toEqual([1]);
    expect(requests.map((r) => r.revision)).toEqual([2]);
  });

  it('moves a sheet to the background after its in-page solves were slow several times running', async () => {
    const { requests, background } = recorder();
    let clock = 0;
    // every solve appears to take 50 ms on this clock
    const now = () => (clock += 25);
    const delivered: number[] = [];
    const runner = createAdaptiveRunner(
      background,
      (r) => void delivered.push(r.revision),
      () => undefined,
      now,
    );
    const doc = network('series', 20);
    for (let revision = 1; revision <= SLOW_STREAK + 1; revision++)
      runner.request(doc, revision, null);
    await settle();
    const inPage = Array.from({ length: SLOW_STREAK }, (_, i) => i + 1);
    expect(delivered).toEqual(inPage);
    expect(requests.map((r) => r.revision)).toEqual([SLOW_STREAK + 1]);
    // a smaller sheet still solves in the page
    const smaller = network('series', 5);
    runner.request(smaller, 10, null);
    await settle();
    expect(delivered).toEqual([...inPage, 10]);
  });
});
