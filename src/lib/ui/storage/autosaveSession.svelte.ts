/**
 * The open tab's autosave: where its copies go, what start-up found, and what the notices
 * show (restored work, other tabs' copies, unreadable copies kept, a failing autosave).
 *
 * Each committed edit of a small sheet, and every hide or close of the page, writes the
 * synchronous last-edit record (lastEdit.ts); every change is also saved to IndexedDB at most
 * once a second. Both are per tab (tabs.ts), so two tabs never write over each other's work.
 */
import { serializeProject } from '../../model/file/serialize';
import type { HeadrouteDocument } from '../../model/types';
import { downloadText } from '../downloadText';
import { createAutosaver, type Autosaver } from './autosaver';
import { idbAutosaveStore, putTabRecord, type AutosaveStore } from './idbAutosave';
import { pageLocalStorage, writeLastEdit } from './lastEdit';
import { nowIso, textHash, type AutosaveRecord } from './records';
import {
  adopt,
  forget,
  planRestore,
  setAside,
  type OfferedCopy,
  type RestorePlan,
  type UnreadableCopy,
} from './restore';
import { claimTabId, exclusively, openTabIds } from './tabs';

/** Sheets with at most this many nodes and pipes write the last-edit record on every edit. */
export const EVERY_EDIT_LIMIT = 400;

/** Why a storage error happened, in a few words. */
function reason(error: unknown): string {
  if (error instanceof DOMException && error.name === 'QuotaExceededError')
    return 'the browser’s storage for this page is full';
  const text = error instanceof Error ? error.message : String(error);
  return text.length > 120 ? `${text.slice(0, 117)}…` : text;
}

class AutosaveSession {
  #idb: AutosaveStore | null = null;
  #local: Storage | null = null;
  #tabId: string | null = null;
  #saver: Autosaver | null = null;
  /** The document the last-edit record holds. */
  #written: HeadrouteDocument | null = null;
  /** textHash of the project text last saved to or opened from a file. */
  #baseline: string | undefined;
  #fileName: () => string | null = () => null;

  /** Readable copies of closed tabs, offered to open. */
  offered = $state.raw<OfferedCopy[]>([]);
  /** Copies that could not be read, kept until exported or deleted. */
  unreadable = $state.raw<UnreadableCopy[]>([]);
  /** Other tabs of the app open at start-up (each keeps its own copy). */
  otherTabsOpen = $state(0);
  /** Why the last autosave failed, until one succeeds again. */
  failure = $state<string | null>(null);

  /** Note the project text just saved to or opened from a file (or a project just created). */
  setBaseline(doc: HeadrouteDocument, text: string = serializeProject(doc)): void {
    this.#baseline = textHash(text);
  }

  /** Whether `text` differs from the last saved or opened file (recorded in the copy). */
  static unsavedIn(record: AutosaveRecord): boolean {
    return record.savedHash === undefined || record.savedHash !== textHash(record.text);
  }

  /**
   * Claim this tab and plan the restore. Never throws: storage the browser blocks means
   * nothing to restore (and the failure notice says autosave is off).
   */
  async start(fileName: () => string | null): Promise<RestorePlan | null> {
    this.#fileName = fileName;
    this.#idb = idbAutosaveStore();
    this.#local = pageLocalStorage();
    try {
      const tabId = await claimTabId();
      this.#tabId = tabId;
      const plan = await exclusively(async () =>
        planRestore(this.#idb, this.#local, tabId, await openTabIds(tabId)),
      );
      this.offered = plan.offered;
      this.unreadable = plan.unreadable;
      this.otherTabsOpen = plan.otherTabsOpen;
      return plan;
    } catch (error) {
      this.failure = `the saved copies could not be read (${reason(error)})`;
      return null;
    } finally {
      this.#saver = createAutosaver({
        delayMs: 1000,
        save: (doc) => this.#saveToIdb(doc),
        onError: (error) => (this.failure = reason(error)),
        onSaved: () => (this.failure = null),
      });
    }
  }

  /** After start-up opened `plan.open`: take over a closed tab's copy, or note the baseline. */
  async opened(plan: RestorePlan): Promise<void> {
    if (plan.open) this.#baseline = plan.open.record.savedHash;
    if (plan.taken && this.#tabId) await adopt(this.#idb, this.#local, this.#tabId, plan.taken);
  }

  /** Start-up did not open this tab's own copy (the user began other work): keep it apart. */
  async keepApart(plan: RestorePlan): Promise<void> {
    if (!plan.open) return;
    if (plan.taken) {
      this.offered = [plan.taken, ...this.offered];
      return;
    }
    const aside = await setAside(this.#idb, this.#local, plan.open).catch(() => null);
    if (aside) this.offered = [aside, ...this.offered];
  }

  #record(doc: HeadrouteDocument): AutosaveRecord {
    const record: AutosaveRecord = {
      savedAt: nowIso(),
      name: doc.name,
      text: serializeProject(doc),
      fileName: this.#fileName(),
    };
    if (this.#baseline !== undefined) record.savedHash = this.#baseline;
    return record;
  }

  async #saveToIdb(doc: HeadrouteDocument): Promise<void> {
    if (!this.#tabId) return;
    if (!this.#idb) throw new Error('this browser offers no IndexedDB');
    await putTabRecord(this.#idb, this.#tabId, this.#record(doc));
  }

  /** The document changed (any change, also within a drag): saved to IndexedDB within 1 s. */
  changed(doc: HeadrouteDocument): void {
    this.#saver?.schedule(doc);
  }

  /** An edit was committed: a small sheet writes its last-edit record at once. */
  committed(doc: HeadrouteDocument, elements: number): void {
    if (elements <= EVERY_EDIT_LIMIT) this.#writeLastEdit(doc);
  }

  /** The page is being hidden or closed: write the last-edit record now and flush IndexedDB. */
  hidden(doc: HeadrouteDocument): void {
    this.#writeLastEdit(doc);
    void this.#saver?.flush();
  }

  #writeLastEdit(doc: HeadrouteDocument): void {
    if (!this.#tabId || !this.#saver || this.#written === doc) return;
    const error = writeLastEdit(this.#local, this.#tabId, this.#record(doc));
    if (error === null) this.#written = doc;
  }

  /** Remove an offered copy from the list and from storage. */
  async forgetOffered(copy: OfferedCopy): Promise<void> {
    await forget(this.#idb, this.#local, copy);
    this.offered = this.offered.filter((c) => c !== copy);
  }

  /** This tab opened an offered copy: it becomes this tab's own. */
  async adoptOffered(copy: OfferedCopy): Promise<void> {
    this.#baseline = copy.copy.record.savedHash;
    if (this.#tabId) await adopt(this.#idb, this.#local, this.#tabId, copy);
    this.offered = this.offered.filter((c) => c !== copy);
  }

  /** Download an unreadable copy's text as it was stored. */
  exportUnreadable(copy: UnreadableCopy): void {
    const when = (copy.savedAt || 'unknown-time').replace(/[^0-9A-Za-z-]/g, '-');
    downloadText(copy.raw, `autosave-${when}.headroute.json`);
  }

  /** Delete an unreadable copy (the user chose to). */
  async deleteUnreadable(copy: UnreadableCopy): Promise<void> {
    if (copy.key !== null) await this.#idb?.remove(copy.key);
    this.unreadable = this.unreadable.filter((c) => c !== copy);
  }
}

/** The page's one autosave session. */
export const autosaveSession = new AutosaveSession();
export { AutosaveSession };
