/**
 * Reading a project file. Nothing from the file is trusted until it has passed every check:
 * size, JSON syntax, forbidden keys and nesting depth, format tag and version, migrations,
 * the schema, and the links between records. A file that fails returns messages; it never throws
 * and never yields a partial document:
 * either the whole project or nothing.
 */
import type { DocumentProblem } from '../integrity';
import { joinPath } from '../integrity';
import type { HeadrouteDocument } from '../types';
import { findDuplicateKey } from './duplicateKeys';
import { MAX_DEPTH, MAX_FILE_CHARS } from './limits';
import { migrate } from './migrations';
import { validateDocument } from './validate';
import { CURRENT_VERSION, FORMAT_TAG } from './version';

/** Outcome of reading a project file. */
export type ParseResult =
  | { ok: true; document: HeadrouteDocument; migratedFrom?: number }
  | { ok: false; errors: DocumentProblem[] };

/** Keys that could reach an object's prototype if copied carelessly; refused anywhere. */
export const FORBIDDEN_KEYS: readonly string[] = ['__proto__', 'constructor', 'prototype'];

function fail(message: string, path = '$'): ParseResult {
  return { ok: false, errors: [{ path, message }] };
}

/** Walk the parsed JSON without recursion: refuse forbidden keys and deep nesting. */
function scanTree(root: unknown): DocumentProblem | undefined {
  const stack: Array<{ value: unknown; path: string; depth: number }> = [
    { value: root, path: '', depth: 0 },
  ];
  while (stack.length > 0) {
    const { value, path, depth } = stack.pop()!;
    if (typeof value !== 'object' || value === null) continue;
    if (depth >= MAX_DEPTH) {
      return {
        path: path || '$',
        message: `The file is nested more than ${MAX_DEPTH} levels deep; a project file is never that deep.`,
      };
    }
    if (Array.isArray(value)) {
      value.forEach((item, i) =>
        stack.push({ value: item, path: joinPath(path, i), depth: depth + 1 }),
      );
      continue;
    }
    for (const key of Object.keys(value)) {
      const childPath = joinPath(path, key);
      if (FORBIDDEN_KEYS.includes(key)) {
        return {
          path: childPath,
          message: `The file contains a key named "${key}", which is not allowed in a project file.`,
        };
      }
      stack.push({
        value: (value as Record<string, unknown>)[key],
        path: childPath,
        depth: depth + 1,
      });
    }
  }
  return undefined;
}

/** Read a `*.headroute.json` text into a validated document, or say what is wrong and where. */
export function parseProjectFile(text: string): ParseResult {
  if (typeof text !== 'string') return fail('The file could not be read as text.');
  if (text.length > MAX_FILE_CHARS) {
    const mb = (text.length / (1024 * 1024)).toFixed(1);
    return fail(
      `The file is too large (${mb} MB); Headroute opens project files up to ${MAX_FILE_CHARS / (1024 * 1024)} MB.`,
    );
  }
  let raw: unknown;
  try {
    raw = JSON.parse(text.replace(/^\uFEFF/, ''));
  } catch (error) {
    const detail = error instanceof Error ? error.message : String(error);
    return fail(`The file is not valid JSON; it may be cut short or damaged (${detail}).`);
  }
  const duplicate = findDuplicateKey(text);
  if (duplicate) {
    return fail(
      `The key "${duplicate.key.slice(0, 40)}" is written twice in the same object; each id and field may appear only once.`,
      duplicate.path,
    );
  }
  const hostile = scanTree(raw);
  if (hostile) return { ok: false, errors: [hostile] };
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    return fail('The file does not hold a Headroute project (expected a JSON object).');
  }
  const file = raw as Record<string, unknown>;
  if (file.format !== FORMAT_TAG) {
    return fail(
      `This is not a Headroute project file: "format" should be "${FORMAT_TAG}".`,
      'format',
    );
  }
  const version = file.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 0) {
    return fail(
      'The file has no valid format version ("version" should be a whole number).',
      'version',
    );
  }
  if (version > CURRENT_VERSION) {
    return fail(
      `This file was saved by a newer version of Headroute (file format version ${version}; this app reads up to version ${CURRENT_VERSION}). Update Headroute to open it.`,
      'version',
    );
  }
  let current = file;
  if (version < CURRENT_VERSION) {
    const migrated = migrate(file, version);
    if (!migrated.ok) return migrated;
    current = migrated.value;
  }
  const result = validateDocument(current);
  if (!result.ok) return result;
  return version < CURRENT_VERSION
    ? { ok: true, document: result.document, migratedFrom: version }
    : { ok: true, document: result.document };
}
