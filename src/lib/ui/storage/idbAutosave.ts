/**
 * The autosaved copies in IndexedDB (through idb-keyval), one per browser tab: key
 * `tab:<tab id>`. Copies that could not be read are moved to `unreadable:<time>` keys and kept
 * until the user deletes them; the key `current` is the single copy older builds kept.
 */
import { createStore, del, entries, set, type UseStore } from 'idb-keyval';
import type { AutosaveRecord } from './records';

/** IndexedDB database and object-store names used for the autosave. */
export const AUTOSAVE_DATABASE = 'headroute';
export const AUTOSAVE_STORE = 'autosave';
/** Key of the single autosave of builds before per-tab copies. */
export const LEGACY_KEY = 'current';

/** The IndexedDB key of a tab's copy. */
export const tabKey = (tabId: string) => `tab:${tabId}`;
/** The tab id of a `tab:` key, else null. */
export const tabOfKey = (key: string) => (key.startsWith('tab:') ? key.slice(4) : null);
/** True for the key of a copy kept because it could not be read. */
export const isUnreadableKey = (key: string) => key.startsWith('unreadable:');

/** A key-value store of autosave copies (IndexedDB in the app; a fake in tests). */
export interface AutosaveStore {
  all(): Promise<Array<[string, unknown]>>;
  put(key: string, value: unknown): Promise<void>;
  remove(key: string): Promise<void>;
}

let store: UseStore | undefined;

/** The app's IndexedDB autosave store, or null when the browser offers no IndexedDB. */
export function idbAutosaveStore(): AutosaveStore | null {
  if (typeof indexedDB === 'undefined') return null;
  store ??= createStore(AUTOSAVE_DATABASE, AUTOSAVE_STORE);
  const s = store;
  return {
    all: async () => (await entries<IDBValidKey, unknown>(s)).map(([k, v]) => [String(k), v]),
    put: (key, value) => set(key, value, s),
    remove: (key) => del(key, s),
  };
}

/** Write a tab's copy. Rejects when the write fails (e.g. the storage quota is used up). */
export function putTabRecord(s: AutosaveStore, tabId: string, record: AutosaveRecord) {
  return s.put(tabKey(tabId), record);
}

/** Keep an unreadable value under a fresh `unreadable:` key, then remove it from `fromKey`. */
export async function keepUnreadable(
  s: AutosaveStore,
  fromKey: string | null,
  value: unknown,
  now: Date = new Date(),
): Promise<string> {
  const key = `unreadable:${now.toISOString()}:${Math.random().toString(36).slice(2, 8)}`;
  await s.put(key, value);
  if (fromKey !== null) await s.remove(fromKey);
  return key;
}
