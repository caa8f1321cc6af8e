/**
 * A throttled autosaver: at most one save per `delayMs`, always of the latest document. A
 * failed save keeps the document pending, so the next schedule or flush tries again.
 */
import type { HeadrouteDocument } from '../../model/types';

/** A throttled autosaver. */
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

/** Make an autosaver; `onError` hears failed saves, `onSaved` successful ones. */
export function createAutosaver(options: {
  delayMs?: number;
  save: (doc: HeadrouteDocument) => Promise<void>;
  onError?: (error: unknown) => void;
  onSaved?: () => void;
}): Autosaver {
  const delayMs = options.delayMs ?? 1000;
  let latest: HeadrouteDocument | undefined;
  let timer: ReturnType<typeof setTimeout> | undefined;

  async function write(): Promise<void> {
    if (timer !== undefined) clearTimeout(timer);
    timer = undefined;
    const doc = latest;
    if (!doc) return;
    latest = undefined;
    try {
      await options.save(doc);
      options.onSaved?.();
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
