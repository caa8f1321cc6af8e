/**
 * Which browser tab this page is, and which other tabs are open: each tab has an id kept in
 * sessionStorage (so a reload keeps it) and holds a Web Lock named for it while it is open.
 * A copy whose tab holds its lock belongs to an open tab and is never taken or overwritten.
 */

const SESSION_KEY = 'headroute.tabId';
const LOCK_PREFIX = 'headroute-tab:';
/** How long a reload waits for the page before it to let go of the tab's lock, ms. */
const CLAIM_WAIT_MS = 1500;

function newId(): string {
  return typeof crypto !== 'undefined' && 'randomUUID' in crypto
    ? crypto.randomUUID()
    : `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 10)}`;
}

function locks(): LockManager | null {
  return typeof navigator !== 'undefined' && navigator.locks ? navigator.locks : null;
}

/** Hold the lock `name` until the page goes away; resolves true once held, false if not. */
function holdLock(name: string, waitMs: number): Promise<boolean> {
  const manager = locks();
  if (!manager) return Promise.resolve(true);
  return new Promise((resolve) => {
    const signal = AbortSignal.timeout(waitMs);
    manager
      .request(name, { signal }, () => {
        resolve(true);
        return new Promise<void>(() => {}); // held for the life of the page
      })
      .catch(() => resolve(false));
  });
}

/**
 * This tab's id. A reload keeps its id (and so its autosave); a duplicated tab, which copies
 * sessionStorage, finds the id's lock held by the tab it came from and takes a new id.
 */
export async function claimTabId(): Promise<string> {
  let session: Storage | null;
  try {
    session = typeof sessionStorage === 'undefined' ? null : sessionStorage;
  } catch {
    session = null;
  }
  const kept = session?.getItem(SESSION_KEY) ?? null;
  if (kept && (await holdLock(LOCK_PREFIX + kept, CLAIM_WAIT_MS))) return kept;
  for (;;) {
    const id = newId();
    if (await holdLock(LOCK_PREFIX + id, CLAIM_WAIT_MS)) {
      try {
        session?.setItem(SESSION_KEY, id);
      } catch {
        // without sessionStorage a reload is a new tab: its copy is offered as another tab's
      }
      return id;
    }
  }
}

/** Ids of the tabs open now (this one included). Without Web Locks, only `self`. */
export async function openTabIds(self: string): Promise<Set<string>> {
  const manager = locks();
  const open = new Set([self]);
  if (!manager) return open;
  const state = await manager.query();
  for (const lock of state.held ?? []) {
    if (lock.name?.startsWith(LOCK_PREFIX)) open.add(lock.name.slice(LOCK_PREFIX.length));
  }
  return open;
}

/** Run `work` while no other tab of the app runs its own start-up restore. */
export async function exclusively<T>(work: () => Promise<T>): Promise<T> {
  const manager = locks();
  if (!manager) return work();
  return manager.request('headroute-restore', work);
}
