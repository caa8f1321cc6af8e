/**
 * A small most-recently-used store keyed on a matrix pattern (size and the exact edge lists of
 * the node equations), so re-solving a sheet whose connections did not change skips the work
 * that depends only on the pattern. Every store registers itself, so `clearPatternCaches`
 * forgets them all at once (tests use it to solve "cold").
 */

const stores: Array<{ clear(): void }> = [];

/** Forgets what every pattern store keeps. */
export function clearPatternCaches(): void {
  for (const store of stores) store.clear();
}

function samePattern(x: Int32Array, y: ArrayLike<number>): boolean {
  if (x.length !== y.length) return false;
  for (let i = 0; i < x.length; i++) if (x[i] !== y[i]) return false;
  return true;
}

/** Values kept per pattern, the last `capacity` patterns used. */
export class PatternCache<T> {
  private readonly entries: Array<{ size: number; a: Int32Array; b: Int32Array; value: T }> = [];
  private readonly capacity: number;

  constructor(capacity: number) {
    this.capacity = capacity;
    stores.push(this);
  }

  /** The value kept for this pattern, or `make()`'s, kept from now on (the oldest one dropped). */
  get(size: number, edgeA: ArrayLike<number>, edgeB: ArrayLike<number>, make: () => T): T {
    const entries = this.entries;
    for (let i = entries.length - 1; i >= 0; i--) {
      const entry = entries[i];
      if (entry.size === size && samePattern(entry.a, edgeA) && samePattern(entry.b, edgeB)) {
        entries.splice(i, 1);
        entries.push(entry);
        return entry.value;
      }
    }
    const value = make();
    entries.push({ size, a: Int32Array.from(edgeA), b: Int32Array.from(edgeB), value });
    if (entries.length > this.capacity) entries.shift();
    return value;
  }

  /** Forgets every kept pattern. */
  clear(): void {
    this.entries.length = 0;
  }
}
