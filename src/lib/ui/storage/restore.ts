/**
 * At start-up: find the autosaved copies, decide which one this tab opens, and keep the rest.
 *
 * - This tab's own copy (after a reload) wins; else the newest copy of a tab that is closed
 *   now is taken over by this tab. Copies of tabs still open are left alone: two tabs never
 *   write over each other's copy.
 * - The IndexedDB copy and the synchronous last-edit copy of a tab are compared by save time;
 *   the newer opens.
 * - A copy that cannot be read (damaged, or from a newer version) is moved to an
 *   `unreadable:` key and kept until the user exports or deletes it; nothing writes over it.
 */
import {
  isUnreadableKey,
  keepUnreadable,
  LEGACY_KEY,
  putTabRecord,
  tabKey,
  tabOfKey,
  type AutosaveStore,
} from './idbAutosave';
import { allLastEdits, removeLastEdit, writeLastEdit } from './lastEdit';
import { readRecord, type ReadRecord } from './records';

/** A readable copy. */
export type ReadableCopy = Extract<ReadRecord, { ok: true }>;

/** A readable copy of a closed tab, offered to open. */
export interface OfferedCopy {
  /** The tab whose last-edit record holds it, if any. */
  tabId: string | null;
  /** Its IndexedDB key, if any. */
  idbKey: string | null;
  copy: ReadableCopy;
}

/** A copy that could not be read, kept under `key` in IndexedDB (or in localStorage if null). */
export interface UnreadableCopy {
  key: string | null;
  savedAt: string;
  name: string;
  message: string;
  /** The stored text, for export. */
  raw: string;
}

/** What start-up found. */
export interface RestorePlan {
  /** The copy to open, or null (open the first demo). */
  open: ReadableCopy | null;
  /** Whether `open` is this tab's own copy or a closed tab's (then `adopt` it once opened). */
  from: 'own' | 'closed-tab' | null;
  /** The closed tab's copy `open` comes from. */
  taken: OfferedCopy | null;
  /** Further readable copies of closed tabs. */
  offered: OfferedCopy[];
  /** Unreadable copies, kept. */
  unreadable: UnreadableCopy[];
  /** Number of other tabs of the app open now. */
  otherTabsOpen: number;
}

interface Group {
  idbKey?: string;
  idb?: ReadableCopy;
  local?: ReadableCopy;
}

function firstMessage(read: Extract<ReadRecord, { ok: false }>): string {
  const e = read.errors[0];
  if (!e) return 'unknown problem';
  const text = e.path && e.path !== '$' ? `${e.path}: ${e.message}` : e.message;
  return text.length > 160 ? `${text.slice(0, 157)}…` : text;
}

/**
 * Gather the copies in `idb` and `local` for tab `self` given the tabs open now, and move the
 * unreadable ones aside. When this tab has no copy, the newest copy of a closed tab is the one
 * to open (`adopt` it once it is open).
 */
export async function planRestore(
  idb: AutosaveStore | null,
  local: Storage | null,
  self: string,
  openTabs: ReadonlySet<string>,
  now: Date = new Date(),
): Promise<RestorePlan> {
  const groups = new Map<string, Group>();
  const group = (id: string) => groups.get(id) ?? groups.set(id, {}).get(id)!;
  const unreadable: UnreadableCopy[] = [];
  const others = new Set<string>();
  const kept = (read: Extract<ReadRecord, { ok: false }>, key: string | null) =>
    unreadable.push({
      key,
      savedAt: read.savedAt,
      name: read.name,
      message: firstMessage(read),
      raw: read.raw,
    });

  for (const [key, value] of idb ? await idb.all() : []) {
    const tab = isUnreadableKey(key) ? key : key === LEGACY_KEY ? key : tabOfKey(key);
    if (tab === null) continue;
    if (tab !== self && openTabs.has(tab)) {
      others.add(tab);
      continue;
    }
    const read = readRecord(value);
    if (!read.ok) {
      kept(read, isUnreadableKey(key) ? key : await keepUnreadable(idb!, key, value, now));
      continue;
    }
    // (a copy kept as unreadable that this build can read is offered like any other)
    Object.assign(group(tab), { idbKey: key, idb: read });
  }
  for (const [tab, value] of allLastEdits(local)) {
    if (tab !== self && openTabs.has(tab)) {
      others.add(tab);
      continue;
    }
    const read = readRecord(value);
    if (!read.ok) {
      if (idb) {
        kept(read, await keepUnreadable(idb, null, value, now));
        removeLastEdit(local, tab);
      } else kept(read, null);
      continue;
    }
    group(tab).local = read;
  }

  // The last-edit record wins a tie: it is written at every committed edit.
  const newest = (g: Group): ReadableCopy | undefined =>
    g.local && g.idb
      ? g.idb.record.savedAt > g.local.record.savedAt
        ? g.idb
        : g.local
      : (g.local ?? g.idb);
  const own = groups.get(self);
  const closed: OfferedCopy[] = [];
  for (const [id, g] of groups) {
    const copy = newest(g);
    if (id === self || !copy) continue;
    closed.push({ tabId: g.local ? id : null, idbKey: g.idbKey ?? null, copy });
  }
  closed.sort((a, b) => (a.copy.record.savedAt < b.copy.record.savedAt ? 1 : -1));
  const base = { unreadable, otherTabsOpen: others.size };
  const mine = own && newest(own);
  if (mine) return { ...base, open: mine, from: 'own', taken: null, offered: closed };
  const [taken, ...offered] = closed;
  if (!taken) return { ...base, open: null, from: null, taken: null, offered: [] };
  return { ...base, open: taken.copy, from: 'closed-tab', taken, offered };
}

/**
 * Make a closed tab's copy this tab's own: write it under this tab's keys, then remove the
 * closed tab's (so it is neither lost nor offered twice).
 */
export async function adopt(
  idb: AutosaveStore | null,
  local: Storage | null,
  self: string,
  offered: OfferedCopy,
): Promise<void> {
  const record = offered.copy.record;
  if (idb) await putTabRecord(idb, self, record);
  const localError = writeLastEdit(local, self, record);
  if (!idb && localError) return; // nowhere to keep it: leave the closed tab's copy in place
  await forget(idb, local, offered);
}

/** Remove a closed tab's copies (IndexedDB and last-edit record). */
export async function forget(
  idb: AutosaveStore | null,
  local: Storage | null,
  offered: OfferedCopy,
): Promise<void> {
  if (offered.idbKey !== null) await idb?.remove(offered.idbKey);
  if (offered.tabId !== null) removeLastEdit(local, offered.tabId);
}

/**
 * Keep this tab's own copy under a key of its own (as a closed tab's copy), when the tab is
 * about to write a different project over it. Returns the copy as offered.
 */
export async function setAside(
  idb: AutosaveStore | null,
  local: Storage | null,
  copy: ReadableCopy,
): Promise<OfferedCopy | null> {
  const id = `earlier-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}`;
  if (idb) {
    await putTabRecord(idb, id, copy.record);
    return { tabId: null, idbKey: tabKey(id), copy };
  }
  return writeLastEdit(local, id, copy.record) ? null : { tabId: id, idbKey: null, copy };
}
