/**
 * Reading a project file. Nothing from the file is trusted until it has passed every check:
 * size; then depth, forbidden and duplicate keys and entry counts in one pass over the text
 * (./textScan.ts); JSON syntax, format tag and version, migrations,
 * the schema, and the links between records. A file that fails returns messages; it never throws
 * and never yields a partial document:
 * either the whole project or nothing.
 */
import type { DocumentProblem } from '../integrity';
import type { HeadrouteDocument } from '../types';
import { MAX_FILE_CHARS } from './limits';
import { quoteKey } from './messages';
import { migrate } from './migrations';
import { validateDocument } from './validate';
import { scanJsonText } from './textScan';
import { CURRENT_VERSION, FORMAT_TAG } from './version';

/** Outcome of reading a project file. */
export type ParseResult =
  | { ok: true; document: HeadrouteDocument; migratedFrom?: number }
  | { ok: false; errors: DocumentProblem[] };

function fail(message: string, path = '$'): ParseResult {
  return { ok: false, errors: [{ path, message }] };
}

/** Line and column (from 1) of a character offset in `text`. */
function lineAndColumn(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let lineStart = 0;
  for (let i = text.indexOf('\n'); i >= 0 && i < offset; i = text.indexOf('\n', i + 1)) {
    line++;
    lineStart = i + 1;
  }
  return { line, column: offset - lineStart + 1 };
}

/**
 * Where JSON.parse stopped, in words of our own: the engine's message quotes the text around
 * the fault, which may be raw binary or a huge key, so it is never shown.
 */
function syntaxWhere(text: string, error: unknown): string {
  const detail = error instanceof Error ? error.message : '';
  const at = /position (\d+)/.exec(detail);
  if (!at) return 'it ends too soon or holds something JSON does not allow';
  const offset = Number(at[1]);
  const { line, column } = lineAndColumn(text, offset);
  const found = offset < text.length ? `"${quoteKey(text.slice(offset, offset + 1))}"` : 'the end';
  return `line ${line}, column ${column}: unexpected ${found}`;
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
  const body = text.startsWith('\uFEFF') ? text.slice(1) : text;
  // Cheap checks first, in one pass over the text, before JSON.parse builds anything.
  const scanned = scanJsonText(body);
  if (scanned) return { ok: false, errors: [{ path: scanned.path, message: scanned.message }] };
  let raw: unknown;
  try {
    raw = JSON.parse(body);
  } catch (error) {
    return fail(
      `The file is not valid JSON; it may be cut short or damaged (${syntaxWhere(body, error)}).`,
    );
  }
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
