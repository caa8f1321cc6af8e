/**
 * The synchronous last-edit record: a copy of the project in the page's localStorage, written
 * at once (localStorage writes are synchronous) on every committed edit of a small sheet and
 * when the page is hidden or closed. It covers the moments IndexedDB's asynchronous, throttled
 * autosave cannot: a reload or tab close right after an edit. One record per tab.
 */
import type { AutosaveRecord } from './records';

const PREFIX = 'headroute.lastEdit.';

/** The localStorage key of a tab's last-edit record. */
export const lastEditKey = (tabId: string) => PREFIX + tabId;

/** Write a tab's record now. Returns the error when the write failed (quota, blocked storage). */
export function writeLastEdit(
  storage: Storage | null,
  tabId: string,
  record: AutosaveRecord,
): unknown {
  if (!storage) return new Error('This browser offers no localStorage.');
  try {
    storage.setItem(lastEditKey(tabId), JSON.stringify(record));
    return null;
  } catch (error) {
    return error;
  }
}

/** Every tab's last-edit record: tab id → stored value (text that is not JSON stays text). */
export function allLastEdits(storage: Storage | null): Map<string, unknown> {
  const found = new Map<string, unknown>();
  if (!storage) return found;
  for (let i = 0; i < storage.length; i++) {
    const key = storage.key(i);
    if (!key?.startsWith(PREFIX)) continue;
    const text = storage.getItem(key);
    if (text === null) continue;
    let value: unknown = text;
    try {
      value = JSON.parse(text);
    } catch {
      // kept as text: reading it reports the damage
    }
    found.set(key.slice(PREFIX.length), value);
  }
  return found;
}

/** Remove a tab's record. */
export function removeLastEdit(storage: Storage | null, tabId: string): void {
  try {
    storage?.removeItem(lastEditKey(tabId));
  } catch {
    // nothing to do: a record that cannot be removed is read again and offered next time
  }
}

/** The page's localStorage, or null when the browser blocks it. */
export function pageLocalStorage(): Storage | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    return null;
  }
}
