/**
 * The cheap checks on a project file's text, in one streaming pass before `JSON.parse` builds
 * anything: nesting depth, keys that could reach a prototype, a key written twice in one object
 * (`JSON.parse` would silently keep the last), too many entries in one object or list, and too
 * many objects and lists in all. The pass keeps one small frame per open object or list (at most
 * MAX_DEPTH of them) and the keys of the open objects; paths are built only for a message.
 *
 * The text need not be well-formed: the pass reads what is there, and `JSON.parse` reports
 * syntax errors afterwards. Its first problem is returned; a file with none gives undefined.
 */
import { joinPath, type DocumentProblem } from '../integrity';
import { MAX_CONTAINERS, MAX_DEPTH, MAX_ENTRIES } from './limits';
import { quoteKey } from './messages';

/** Keys that could reach an object's prototype if copied carelessly; refused anywhere. */
export const FORBIDDEN_KEYS: readonly string[] = ['__proto__', 'constructor', 'prototype'];

interface Frame {
  /** Keys seen so far in an object; null for a list. */
  keys: Set<string> | null;
  /** Key (object) or index (list) of the value being read, for paths. */
  current: string | number;
  expectKey: boolean;
}

const QUOTE = 34;
const BACKSLASH = 92;
const OPEN_OBJECT = 123;
const CLOSE_OBJECT = 125;
const OPEN_LIST = 91;
const CLOSE_LIST = 93;
const COMMA = 44;

/** Path of the value being read in the innermost frame (`below` frames counted). */
function pathOf(stack: Frame[], below = stack.length): string {
  let path = '';
  for (let i = 0; i < below; i++) path = joinPath(path, stack[i].current);
  return path;
}

/**
 * Index of the quote closing a string whose text starts at `from` (one not escaped by an odd
 * run of backslashes), or the text's length when the string is never closed. Each backslash
 * is counted once, so the whole pass stays linear.
 */
function closingQuote(text: string, from: number): number {
  let j = text.indexOf('"', from);
  while (j >= 0) {
    let k = j - 1;
    while (k >= from && text.charCodeAt(k) === BACKSLASH) k--;
    if ((j - 1 - k) % 2 === 0) return j;
    j = text.indexOf('"', j + 1);
  }
  return text.length;
}

/** The key text between quotes at `start`..`end` (escapes read; raw when they are broken). */
function keyText(text: string, start: number, end: number): string {
  const raw = text.slice(start, end);
  if (!raw.includes('\\')) return raw;
  try {
    return JSON.parse(`"${raw}"`) as string;
  } catch {
    return raw;
  }
}

/** What the pass found wrong: a problem for the user, and its kind (and key) for callers. */
export interface ScanProblem extends DocumentProblem {
  kind: 'depth' | 'forbidden-key' | 'duplicate-key' | 'entries' | 'containers';
  key?: string;
}

/** The first cheap-check problem in project-file text, or undefined. */
export function scanJsonText(text: string): ScanProblem | undefined {
  const stack: Frame[] = [];
  const length = text.length;
  let containers = 0;
  // Strings are skipped to their closing quote with indexOf, which is far quicker than a
  // loop over their characters.
  for (let i = 0; i < length; i++) {
    const ch = text.charCodeAt(i);
    if (ch === QUOTE) {
      const j = closingQuote(text, i + 1);
      const top = stack[stack.length - 1];
      if (top?.keys && top.expectKey) {
        const key = keyText(text, i + 1, j);
        top.current = key;
        top.expectKey = false;
        if (FORBIDDEN_KEYS.includes(key)) {
          return {
            kind: 'forbidden-key',
            key,
            path: pathOf(stack),
            message: `The file contains a key named "${key}", which is not allowed in a project file.`,
          };
        }
        if (top.keys.has(key)) {
          return {
            kind: 'duplicate-key',
            key,
            path: pathOf(stack),
            message: `The key "${quoteKey(key)}" is written twice in the same object; each id and field may appear only once.`,
          };
        }
        top.keys.add(key);
        if (top.keys.size > MAX_ENTRIES) return tooManyEntries(stack);
      }
      i = j;
    } else if (ch === OPEN_OBJECT || ch === OPEN_LIST) {
      if (stack.length >= MAX_DEPTH) {
        return {
          kind: 'depth',
          path: pathOf(stack) || '$',
          message: `The file is nested more than ${MAX_DEPTH} levels deep; a project file is never that deep.`,
        };
      }
      if (++containers > MAX_CONTAINERS) {
        return {
          kind: 'containers',
          path: pathOf(stack) || '$',
          message: `The file holds more than ${MAX_CONTAINERS.toLocaleString('en')} objects and lists; a project file within the element limit never holds that many.`,
        };
      }
      const object = ch === OPEN_OBJECT;
      stack.push({ keys: object ? new Set() : null, current: 0, expectKey: object });
    } else if (ch === CLOSE_OBJECT || ch === CLOSE_LIST) {
      stack.pop();
    } else if (ch === COMMA) {
      const top = stack[stack.length - 1];
      if (top?.keys) top.expectKey = true;
      else if (top) {
        top.current = (top.current as number) + 1;
        if (top.current >= MAX_ENTRIES) return tooManyEntries(stack);
      }
    }
  }
  return undefined;
}

function tooManyEntries(stack: Frame[]): ScanProblem {
  const path = pathOf(stack, stack.length - 1);
  const what = path === '' ? 'The file' : `"${path}"`;
  return {
    kind: 'entries',
    path: path || '$',
    message: `${what} has more than ${MAX_ENTRIES.toLocaleString('en')} entries; no part of a project file holds that many.`,
  };
}
