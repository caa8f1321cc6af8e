import { afterEach, describe, expect, it, vi } from 'vitest';
import { createAutosaver } from '../../../src/lib/ui/storage/autosaver';
import type { HeadrouteDocument } from '../../../src/lib/model/types';
import { sampleDocument } from '../../model/helpers';

afterEach(() => vi.useRealTimers());

describe('createAutosaver', () => {
  it('saves the latest document at most once per delay', async () => {
    vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout'] });
    const saved: string[] = [];
    const saver = createAutosaver({
      delayMs: 500,
      save: async (d: HeadrouteDocument) => void saved.push(d.name),
    });
    const doc = sampleDocument();
    saver.schedule({ ...doc, name: 'a' });
    saver.schedule({ ...doc, name: 'b' });
    expect(saver.pending).toBe(true);
    await vi.advanceTimersByTimeAsync(499);
    expect(saved).toEqual([]);
    saver.schedule({ ...doc, name: 'c' });
    await vi.advanceTimersByTimeAsync(1);
    expect(saved).toEqual(['c']);
    expect(saver.pending).toBe(false);
    saver.schedule({ ...doc, name: 'd' });
    await saver.flush();
    expect(saved).toEqual(['c', 'd']);
    saver.schedule({ ...doc, name: 'e' });
    saver.cancel();
    await vi.advanceTimersByTimeAsync(1000);
    expect(saved).toEqual(['c', 'd']);
  });

  it('a failed save keeps the document pending and reports the error; a later success is heard', async () => {
    const errors: unknown[] = [];
    let fail = true;
    let successes = 0;
    const saved: HeadrouteDocument[] = [];
    const saver = createAutosaver({
      delayMs: 10,
      save: async (d: HeadrouteDocument) => {
        if (fail) throw new DOMException('full', 'QuotaExceededError');
        saved.push(d);
      },
      onError: (e: unknown) => errors.push(e),
      onSaved: () => successes++,
    });
    saver.schedule(sampleDocument());
    await saver.flush();
    expect(errors).toHaveLength(1);
    expect(saver.pending).toBe(true);
    fail = false;
    await saver.flush();
    expect(saved).toHaveLength(1);
    expect(successes).toBe(1);
  });
});
