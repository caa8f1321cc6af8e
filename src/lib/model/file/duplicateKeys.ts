/**
 * Finding a key written twice in one JSON object. `JSON.parse` silently keeps the last of them,
 * so a file with two records under the same id would lose one without a word; this scan of the
 * (already well-formed) JSON text finds the first such key and where it is.
 */
import { joinPath } from '../integrity';

interface Frame {
  kind: 'object' | 'array';
  path: string;
  keys: Set<string>;
  expectKey: boolean;
  index: number;
  /** Key (or index) of the value being read, for the path of a nested container. */
  current: string | number;
}

/** The first duplicated key in well-formed JSON text: its path and the key, or undefined. */
export function findDuplicateKey(text: string): { path: string; key: string } | undefined {
  const stack: Frame[] = [];
  const childPath = () => {
    const top = stack[stack.length - 1];
    return top ? joinPath(top.path, top.current) : '';
  };
  const QUOTE = 34;
  const BACKSLASH = 92;
  for (let i = 0; i < text.length; i++) {
    const ch = text.charCodeAt(i);
    if (ch === QUOTE) {
      // Find the closing quote: one not preceded by an odd number of backslashes.
      let j = text.indexOf('"', i + 1);
      let escaped = false;
      for (;;) {
        let k = j - 1;
        let slashes = 0;
        while (text.charCodeAt(k) === BACKSLASH) {
          slashes++;
          k--;
        }
        if (slashes % 2 === 0) break;
        escaped = true;
        j = text.indexOf('"', j + 1);
      }
      if (j < 0) return undefined;
      const top = stack[stack.length - 1];
      if (top?.kind === 'object' && top.expectKey) {
        const raw = text.slice(i + 1, j);
        const key = escaped || raw.includes('\\') ? (JSON.parse(`"${raw}"`) as string) : raw;
        if (top.keys.has(key)) return { path: joinPath(top.path, key), key };
        top.keys.add(key);
        top.current = key;
        top.expectKey = false;
      }
      i = j;
    } else if (ch === 123 /* { */ || ch === 91 /* [ */) {
      stack.push({
        kind: ch === 123 ? 'object' : 'array',
        path: childPath(),
        keys: new Set(),
        expectKey: ch === 123,
        index: 0,
        current: 0,
      });
    } else if (ch === 125 /* } */ || ch === 93 /* ] */) {
      stack.pop();
    } else if (ch === 44 /* , */) {
      const top = stack[stack.length - 1];
      if (top?.kind === 'object') top.expectKey = true;
      else if (top) top.current = ++top.index;
    }
  }
  return undefined;
}
