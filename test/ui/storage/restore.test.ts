import 'fake-indexeddb/auto';
import { afterEach, describe, expect, it } from 'vitest';
import { serializeProject } from '../../../src/lib/model/file/serialize';
import {
  idbAutosaveStore,
  isUnreadableKey,
  putTabRecord,
  tabKey,
  type AutosaveStore,
} from '../../../src/lib/ui/storage/idbAutosave';
import { allLastEdits, lastEditKey, writeLastEdit } from '../../../src/lib/ui/storage/lastEdit';
import { textHash, type AutosaveRecord } from '../../../src/lib/ui/storage/records';
import { adopt, planRestore, setAside } from '../../../src/lib/ui/storage/restore';
import type { HeadrouteDocument } from '../../../src/lib/model/types';
import { sampleDocument } from '../../model/helpers';

/** localStorage stand-in. */
class MemoryStorage implements Storage {
  #items = new Map<string, string>();
  get length() {
    return this.#items.size;
  }
  key(i: number) {
    return [...this.#items.keys()][i] ?? null;
  }
  getItem(k: string) {
    return this.#items.get(k) ?? null;
  }
  setItem(k: string, v: string) {
    this.#items.set(k, String(v));
  }
  removeItem(k: string) {
    this.#items.delete(k);
  }
  clear() {
    this.#items.clear();
  }
}

const idb = idbAutosaveStore() as AutosaveStore;

afterEach(async () => {
  for (const [key] of await idb.all()) await idb.remove(key);
});

function record(doc: HeadrouteDocument, savedAt: string, extra: Partial<AutosaveRecord> = {}) {
  return { savedAt, name: doc.name, text: serializeProject(doc), ...extra };
}

const named = (name: string) => ({ ...sampleDocument(), name });

describe('planRestore', () => {
  it('nothing saved: nothing to open', async () => {
    const plan = await planRestore(idb, new MemoryStorage(), 'me', new Set(['me']));
    expect(plan).toMatchObject({ open: null, offered: [], unreadable: [], otherTabsOpen: 0 });
  });

  it("this tab's newer copy wins: the last-edit record over an older IndexedDB copy", async () => {
    const local = new MemoryStorage();
    await putTabRecord(idb, 'me', record(named('throttled'), '2026-01-01T10:00:00.000Z'));
    writeLastEdit(local, 'me', record(named('last edit'), '2026-01-01T10:00:00.300Z'));
    const plan = await planRestore(idb, local, 'me', new Set(['me']));
    expect(plan.from).toBe('own');
    expect(plan.open?.document.name).toBe('last edit');
    await putTabRecord(idb, 'me', record(named('later'), '2026-01-01T10:00:01.000Z'));
    const again = await planRestore(idb, local, 'me', new Set(['me']));
    expect(again.open?.document.name).toBe('later');
  });

  it("another open tab's copy is neither opened, offered nor touched", async () => {
    const local = new MemoryStorage();
    await putTabRecord(idb, 'other', record(named('theirs'), '2026-01-01T10:00:00.000Z'));
    writeLastEdit(local, 'other', record(named('theirs'), '2026-01-01T10:00:00.000Z'));
    const plan = await planRestore(idb, local, 'me', new Set(['me', 'other']));
    expect(plan).toMatchObject({ open: null, offered: [], otherTabsOpen: 1 });
    expect((await idb.all()).map(([k]) => k)).toEqual([tabKey('other')]);
    expect(allLastEdits(local).has('other')).toBe(true);
  });

  it("a closed tab's newest copy opens and is taken over; the others are offered", async () => {
    const local = new MemoryStorage();
    await putTabRecord(idb, 'a', record(named('A'), '2026-01-01T09:00:00.000Z'));
    writeLastEdit(local, 'b', record(named('B'), '2026-01-01T11:00:00.000Z'));
    await idb.put('current', record(named('legacy'), '2026-01-01T08:00:00.000Z'));
    const plan = await planRestore(idb, local, 'me', new Set(['me']));
    expect(plan.from).toBe('closed-tab');
    expect(plan.open?.document.name).toBe('B');
    expect(plan.offered.map((o) => o.copy.document.name)).toEqual(['A', 'legacy']);
    await adopt(idb, local, 'me', plan.taken!);
    expect(local.getItem(lastEditKey('b'))).toBeNull();
    const mine = (await idb.all()).find(([k]) => k === tabKey('me'))?.[1] as AutosaveRecord;
    expect(mine.name).toBe('B');
    const next = await planRestore(idb, local, 'me', new Set(['me']));
    expect(next.from).toBe('own');
    expect(next.offered).toHaveLength(2);
  });

  it('an unreadable copy (newer version, damaged) is kept apart and never written over', async () => {
    const local = new MemoryStorage();
    const newer = serializeProject(named('future')).replace(/"version": ?\d+/, '"version": 999');
    await putTabRecord(idb, 'me', {
      savedAt: '2026-01-01T10:00:00.000Z',
      name: 'future',
      text: newer,
    });
    local.setItem(lastEditKey('me'), '{"savedAt":"2026-01-01T10:00:01.000Z","text":"{\\"form');
    const plan = await planRestore(idb, local, 'me', new Set(['me']));
    expect(plan.open).toBeNull();
    expect(plan.unreadable).toHaveLength(2);
    expect(plan.unreadable.map((u) => u.name).sort()).toEqual(['', 'future']);
    expect(plan.unreadable.find((u) => u.name === 'future')?.raw).toBe(newer);
    expect(plan.unreadable.every((u) => u.key !== null && isUnreadableKey(u.key))).toBe(true);
    // This tab's next autosave goes to its own keys, not over the kept copies.
    await putTabRecord(idb, 'me', record(named('new work'), '2026-01-01T10:05:00.000Z'));
    writeLastEdit(local, 'me', record(named('new work'), '2026-01-01T10:05:00.000Z'));
    const later = await planRestore(idb, local, 'me', new Set(['me']));
    expect(later.open?.document.name).toBe('new work');
    expect(later.unreadable.map((u) => u.raw)).toContain(newer);
    expect(later.unreadable).toHaveLength(2);
  });

  it('a copy set aside is offered, not lost', async () => {
    const local = new MemoryStorage();
    await putTabRecord(idb, 'me', record(named('mine'), '2026-01-01T10:00:00.000Z'));
    const plan = await planRestore(idb, local, 'me', new Set(['me']));
    const aside = await setAside(idb, local, plan.open!);
    await putTabRecord(idb, 'me', record(named('other work'), '2026-01-01T10:01:00.000Z'));
    const next = await planRestore(idb, local, 'me', new Set(['me']));
    expect(next.open?.document.name).toBe('other work');
    expect(next.offered.map((o) => o.copy.document.name)).toEqual(['mine']);
    expect(aside?.idbKey).toBe(next.offered[0].idbKey);
  });
});

describe('textHash', () => {
  it('tells texts apart and is stable', () => {
    const a = serializeProject(named('a'));
    expect(textHash(a)).toBe(textHash(`${a}`));
    expect(textHash(a)).not.toBe(textHash(serializeProject(named('b'))));
  });
});
