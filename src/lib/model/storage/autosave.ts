/**
 * Autosave of the open project to IndexedDB (through idb-keyval), and its restore on the next
 * visit. The saved copy is the project-file text, so restoring goes through the same validated
 * path as opening a file: a damaged autosave gives messages, never a broken document
 * in the editor.
 */
import { createStore, del, get, set, type UseStore } from 'idb-keyval';
import type { DocumentProblem } from '../integrity';
import type { HeadrouteDocument } from '../types';
import { parseProjectFile } from '../file/parse';
import { serializeProject } from '../file/serialize';

/** IndexedDB database and object-store names used for the autosave. */
export const AUTOSAVE_DATABASE = 'headroute';
export const AUTOSAVE_STORE = 'autosave';
const KEY = 'current';

/** What is stored: the file text and when it was saved. */
export interface AutosaveRecord {
  /** ISO 8601 time of the save. */
  savedAt: string;
  /** Project name, for the restore notice without parsing. */
  name: string;
  /** The project as `*.headroute.json` text. */
  text: string;
}

/** A restored autosave: the document, or why it could not be read. */
export type RestoredAutosave =
  | { ok: true; document: HeadrouteDocument; savedAt: string; migratedFrom?: number }
  | { ok: false; errors: DocumentProblem[]; savedAt: string };

let store: UseStore | undefined;

function autosaveStore(): UseStore | undefined {
  if (typeof indexedDB === 'undefined') return undefined;
  store ??= createStore(AUTOSAVE_DATABASE, AUTOSAVE_STORE);
  return store;
}

/** Save the project now. Rejects when IndexedDB is unavailable or the write fails. */
export async function saveAutosave(doc: HeadrouteDocument, now: Date = new Date()): Promise<void> {
  const s = autosaveStore();
  if (!s) throw new Error('This browser offers no IndexedDB, so the project cannot be autosaved.');
  const record: AutosaveRecord = {
    savedAt: now.toISOString(),
    name: doc.name,
    text: serializeProject(doc),
  };
  await set(KEY, record, s);
}

/**
 * The autosaved project, read through the project-file parser; null when there is none (or no
 * IndexedDB). A damaged record is reported, not deleted, so nothing is lost without asking.
 */
export async function loadAutosave(): Promise<RestoredAutosave | null> {
  const s = autosaveStore();
  if (!s) return null;
  const record: unknown = await get(KEY, s);
  if (record === undefined) return null;
  const r = (
    typeof record === 'object' && record !== null ? record : {}
  ) as Partial<AutosaveRecord>;
  const savedAt = typeof r.savedAt === 'string' ? r.savedAt : '';
  if (typeof r.text !== 'string') {
    return {
      ok: false,
      savedAt,
      errors: [{ path: '$', message: 'The autosaved copy is damaged and holds no project text.' }],
    };
  }
  const parsed = parseProjectFile(r.text);
  return parsed.ok ? { ...parsed, savedAt } : { ok: false, errors: parsed.errors, savedAt };
}

/** Remove the autosaved copy (after the user saves to a file or chooses to discard it). */
export async function clearAutosave(): Promise<void> {
  const s = autosaveStore();
  if (s) await del(KEY, s);
}

/** A throttled autosaver: at most one save per `delayMs`, always of the latest document */
export interface Autosaver {
  /** Note a new document; it is saved within `delayMs`. */
  schedule(doc: HeadrouteDocument): void;
  /** Save the pending document now (e.g. on page hide). */
  flush(): Promise<void>;
  /** Drop the pending document without saving. */
  cancel(): void;
  /** True while a document waits to be saved. */
  readonly pending: boolean;
}

/**
 * Make an autosaver. `save` defaults to `saveAutosave`; `onError` hears failed saves (the
 * document stays pending so the next schedule or flush tries again).
 */
export function createAutosaver(
  options: {
    delayMs?: number;
    save?: (doc: HeadrouteDocument) => Promise<void>;
    onError?: (error: unknown) => void;
  } = {},
): Autosaver {
  const delayMs = options.delayMs ?? 1000;
  const save = options.save ?? ((doc: HeadrouteDocument) => saveAutosave(doc));
  let latest: HeadrouteDocument | undefined;
  let timer: ReturnType<typeof setTimeout> | undefined;

  async function write(): Promise<void> {
    if (timer !== undefined) clearTimeout(timer);
    timer = undefined;
    const doc = latest;
    if (!doc) return;
    latest = undefined;
    try {
      await save(doc);
    } catch (error) {
      latest ??= doc;
      options.onError?.(error);
    }
  }

  return {
    schedule(doc) {
      latest = doc;
      timer ??= setTimeout(() => void write(), delayMs);
    },
    flush: write,
    cancel() {
      if (timer !== undefined) clearTimeout(timer);
      timer = undefined;
      latest = undefined;
    },
    get pending() {
      return latest !== undefined;
    },
  };
}
