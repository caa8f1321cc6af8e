/**
 * What an autosave holds and how it is read back. The saved copy is the project-file text, so
 * restoring goes through the same validated path as opening a file: a damaged or newer copy
 * gives messages, never a broken document in the editor.
 */
import type { DocumentProblem } from '../../model/integrity';
import { parseProjectFile } from '../../model/file/parse';
import type { HeadrouteDocument } from '../../model/types';

/** One autosaved copy of a project (in IndexedDB or the page's synchronous last-edit record). */
export interface AutosaveRecord {
  /** ISO 8601 time of the save. */
  savedAt: string;
  /** Project name, for notices without parsing. */
  name: string;
  /** The project as `*.headroute.json` text. */
  text: string;
  /** The file it was last opened from or saved to, if any. */
  fileName?: string | null;
  /** textHash of the text last saved to or opened from a file (absent: never saved). */
  savedHash?: string;
}

/** A record read back: the document, or why it cannot be read (with whatever text it held). */
export type ReadRecord =
  | {
      ok: true;
      record: AutosaveRecord;
      document: HeadrouteDocument;
      migratedFrom?: number;
    }
  | { ok: false; errors: DocumentProblem[]; savedAt: string; name: string; raw: string };

/** Read a stored value as an autosave record, through the project-file parser. Never throws. */
export function readRecord(value: unknown): ReadRecord {
  const r = (typeof value === 'object' && value !== null ? value : {}) as Partial<AutosaveRecord>;
  const savedAt = typeof r.savedAt === 'string' ? r.savedAt : '';
  const name = typeof r.name === 'string' ? r.name : '';
  if (typeof r.text !== 'string') {
    return {
      ok: false,
      savedAt,
      name,
      raw: safeStringify(value),
      errors: [{ path: '$', message: 'The autosaved copy is damaged and holds no project text.' }],
    };
  }
  const parsed = parseProjectFile(r.text);
  if (!parsed.ok) return { ok: false, errors: parsed.errors, savedAt, name, raw: r.text };
  const record: AutosaveRecord = {
    savedAt,
    name,
    text: r.text,
    fileName: typeof r.fileName === 'string' ? r.fileName : null,
  };
  if (typeof r.savedHash === 'string') record.savedHash = r.savedHash;
  const read: ReadRecord = { ok: true, record, document: parsed.document };
  if (parsed.migratedFrom !== undefined) read.migratedFrom = parsed.migratedFrom;
  return read;
}

function safeStringify(value: unknown): string {
  try {
    return JSON.stringify(value) ?? String(value);
  } catch {
    return String(value);
  }
}

/**
 * A short fingerprint of a text (cyrb53: two 32-bit multiply-xor lanes), to tell whether a
 * restored project is the one last saved to a file. Not a cryptographic hash.
 */
export function textHash(text: string): string {
  let h1 = 0xdeadbeef;
  let h2 = 0x41c6ce57;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    h1 = Math.imul(h1 ^ c, 2654435761);
    h2 = Math.imul(h2 ^ c, 1597334677);
  }
  h1 = Math.imul(h1 ^ (h1 >>> 16), 2246822507) ^ Math.imul(h2 ^ (h2 >>> 13), 3266489909);
  h2 = Math.imul(h2 ^ (h2 >>> 16), 2246822507) ^ Math.imul(h1 ^ (h1 >>> 13), 3266489909);
  return `${(h2 >>> 0).toString(16).padStart(8, '0')}${(h1 >>> 0).toString(16).padStart(8, '0')}:${text.length}`;
}

/** The time now as ISO 8601 (a record's `savedAt`). */
export function nowIso(): string {
  return new Date().toISOString();
}
