/**
 * A priority queue for the orderings: a binary heap (Williams, 1964, "Algorithm 232:
 * Heapsort", Comm. ACM 7(6)) of numbers, least first, kept in one typed array.
 */

/** A binary min-heap of numeric keys in a typed array that grows as needed. */
export class KeyHeap {
  private keys: Float64Array;
  /** Number of keys held. */
  size = 0;

  /** @param capacity keys held before the store grows */
  constructor(capacity: number) {
    this.keys = new Float64Array(Math.max(capacity, 16));
  }

  /** Adds a key. */
  push(key: number): void {
    if (this.size === this.keys.length) {
      const grown = new Float64Array(this.keys.length * 2);
      grown.set(this.keys);
      this.keys = grown;
    }
    const keys = this.keys;
    let i = this.size++;
    while (i > 0) {
      const up = (i - 1) >> 1;
      if (keys[up] <= key) break;
      keys[i] = keys[up];
      i = up;
    }
    keys[i] = key;
  }

  /** Removes and returns the least key (the heap must not be empty). */
  pop(): number {
    const keys = this.keys;
    const top = keys[0];
    const last = keys[--this.size];
    const n = this.size;
    let i = 0;
    for (;;) {
      let child = 2 * i + 1;
      if (child >= n) break;
      if (child + 1 < n && keys[child + 1] < keys[child]) child++;
      if (keys[child] >= last) break;
      keys[i] = keys[child];
      i = child;
    }
    keys[i] = last;
    return top;
  }
}
