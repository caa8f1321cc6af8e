import 'fake-indexeddb/auto';
import { createStore, set } from 'idb-keyval';
import { afterEach, describe, expect, it, vi } from 'vitest';
import {
  AUTOSAVE_DATABASE,
  AUTOSAVE_STORE,
  clearAutosave,
  createAutosaver,
  loadAutosave,
  saveAutosave,
} from '../../../src/lib/model/storage/autosave';
import type { HeadrouteDocument } from '../../../src/lib/model/types';
import { sampleDocument } from '../helpers';

afterEach(async () => {
  vi.useRealTimers();
  await clearAutosave();
});

describe('autosave (fake-indexeddb)', () => {
  it('nothing saved gives null', async () => {
    expect(await loadAutosave()).toBeNull();
  });

  it('save then load returns the same document and the save time', async () => {
    const doc = sampleDocument();
    await saveAutosave(doc, new Date('2026-05-01T10:00:00Z'));
    const restored = await loadAutosave();
    expect(restored).toMatchObject({ ok: true, savedAt: '2026-05-01T10:00:00.000Z' });
    if (restored?.ok) expect(restored.document).toEqual(doc);
  });

  it('clear removes it', async () => {
    await saveAutosave(sampleDocument());
    await clearAutosave();
    expect(await loadAutosave()).toBeNull();
  });

  it('a damaged autosave is reported, not thrown, and not deleted', async () => {
    const store = createStore(AUTOSAVE_DATABASE, AUTOSAVE_STORE);
    await set('current', { savedAt: 'x', name: 'n', text: '{"format":"headroute","ver' }, store);
    const first = await loadAutosave();
    expect(first).toMatchObject({ ok: false, savedAt: 'x' });
    if (first && !first.ok) expect(first.errors[0].message).toContain('not valid JSON');
    expect(await loadAutosave()).toMatchObject({ ok: false });
    await set('current', 42, store);
    const second = await loadAutosave();
    if (second && !second.ok) expect(second.errors[0].message).toContain('damaged');
    else throw new Error('expected a damaged-autosave report');
  });
});

describe('createAutosaver', () => {
  it('saves the latest document at most once per delay', async () => {
    vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout'] });
    const saved: string[] = [];
    const saver = createAutosaver({ delayMs: 500, save: async (d) => void saved.push(d.name) });
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

  it('a failed save keeps the document pending and reports the error', async () => {
    const errors: unknown[] = [];
    let fail = true;
    const saved: HeadrouteDocument[] = [];
    const saver = createAutosaver({
      delayMs: 10,
      save: async (d) => {
        if (fail) throw new Error('quota');
        saved.push(d);
      },
      onError: (e) => errors.push(e),
    });
    saver.schedule(sampleDocument());
    await saver.flush();
    expect(errors).toHaveLength(1);
    expect(saver.pending).toBe(true);
    fail = false;
    await saver.flush();
    expect(saved).toHaveLength(1);
  });

  it('the default saver writes to IndexedDB', async () => {
    const saver = createAutosaver({ delayMs: 5 });
    saver.schedule(sampleDocument());
    await saver.flush();
    expect(await loadAutosave()).toMatchObject({ ok: true });
  });
});
