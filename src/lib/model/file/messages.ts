/**
 * Schema issues turned into plain words with a JSON path and the element they belong to.
 */
import type * as v from 'valibot';
import { NODE_KIND_LABEL } from '../labels';
import { joinPath, type DocumentProblem } from '../integrity';
import type { NodeKind } from '../types';

type Issue = v.BaseIssue<unknown>;

const MAX_QUOTE = 40;

/** A value in words, short enough for a message (markup stays as literal text). */
export function describeValue(value: unknown): string {
  if (value === undefined) return 'missing';
  if (value === null) return 'empty (null)';
  if (typeof value === 'string') {
    return `the text "${quoteKey(value)}"`;
  }
  if (typeof value === 'number') return String(value);
  if (typeof value === 'boolean') return value ? 'true' : 'false';
  if (Array.isArray(value)) return 'a list';
  return 'an object';
}

/** A key cut to a few dozen characters, control characters shown as escapes. */
export function quoteKey(key: string): string {
  const cut = key.length > MAX_QUOTE ? `${key.slice(0, MAX_QUOTE)}…` : key;
  return JSON.stringify(cut).slice(1, -1);
}

/** A field the schema does not know: named with where it sits, never dropped. */
function unknownFieldWords(issue: Issue): string {
  const path = issue.path ?? [];
  const parent = path[path.length - 2];
  const where = parent ? ` in "${quoteKey(String(parent.key))}"` : ' at the top of the file';
  return `Unknown field "${quoteKey(String(issue.input))}"${where}: this version of Headroute does not know it, so the file is refused rather than read without it (check the spelling, or open the file in the Headroute that wrote it).`;
}

const EXPECTED_WORDS: Record<string, string> = {
  number: 'a number',
  string: 'text',
  boolean: 'true or false',
  object: 'an object',
  array: 'a list',
  record: 'an object of records',
};

function lengthOf(input: unknown): number {
  return typeof input === 'string' || Array.isArray(input) ? input.length : 0;
}

/** The path of an issue as a string such as `nodes.P1.headCurve[0].flow`. */
export function issuePath(issue: Issue): string {
  const keys = (issue.path ?? []).map((item) => item.key as string | number);
  return keys.reduce<string>((path, key) => joinPath(path, key), '');
}

function fieldName(issue: Issue): string {
  const path = issue.path ?? [];
  const last = path[path.length - 1];
  if (!last) return 'The file';
  if (typeof last.key === 'number') {
    const parent = path[path.length - 2];
    return parent
      ? `Entry ${last.key + 1} of "${quoteKey(String(parent.key))}"`
      : `Entry ${last.key + 1}`;
  }
  return `"${quoteKey(String(last.key))}"`;
}

/** One schema issue in plain words. */
export function describeIssue(issue: Issue): string {
  const field = fieldName(issue);
  const got = describeValue(issue.input);
  const req = (issue as { requirement?: unknown }).requirement;
  const keyIssue = issue.path?.[issue.path.length - 1]?.origin === 'key';
  switch (issue.type) {
    case 'strict_object':
      if (keyIssue && issue.expected === 'never') return unknownFieldWords(issue);
      break;
    case 'finite':
      return `${field} must be a finite number, but is ${got}.`;
    case 'gt_value':
      return `${field} must be greater than ${String(req)}, but is ${got}.`;
    case 'min_value':
      return `${field} must be at least ${String(req)}, but is ${got}.`;
    case 'max_value':
      return `${field} must be at most ${String(req)}, but is ${got}.`;
    case 'max_length':
      return typeof issue.input === 'string'
        ? `${field} is too long: ${lengthOf(issue.input)} characters, at most ${String(req)} allowed.`
        : `${field} has too many entries: ${lengthOf(issue.input)}, at most ${String(req)} allowed.`;
    case 'min_length':
      return typeof issue.input === 'string'
        ? `${field} must not be empty.`
        : `${field} needs at least ${String(req)} ${req === 1 ? 'entry' : 'entries'}.`;
    case 'max_entries':
      return `${field} has too many records, at most ${String(req)} allowed.`;
    case 'regex':
      return keyIssue
        ? `The record key "${quoteKey(String(issue.input))}" is not a valid id (1–64 letters, digits, "_", "-" or ".", starting with a letter or digit).`
        : `${field} is not a valid id: ${got} (ids are 1–64 letters, digits, "_", "-" or ".", starting with a letter or digit).`;
    case 'picklist':
    case 'literal':
    case 'variant':
      if (issue.input === undefined) return `${field} is missing.`;
      return `${field} is ${got}, which is not one of the allowed values ${issue.expected ?? ''}.`.replace(
        ' .',
        '.',
      );
    case 'custom':
      return `${field} should be an object of records keyed by id, but is ${got}.`;
  }
  if (issue.input === undefined) return `${field} is missing.`;
  const expected = EXPECTED_WORDS[issue.type] ?? issue.expected ?? issue.type;
  return `${field} should be ${expected}, but is ${got}.`;
}

function recordWords(collection: string, key: string, record: unknown): string {
  const r = record && typeof record === 'object' ? (record as Record<string, unknown>) : {};
  const name = typeof r.name === 'string' ? quoteKey(r.name) : '';
  let kind: string;
  if (collection === 'nodes') {
    kind =
      typeof r.kind === 'string' && Object.hasOwn(NODE_KIND_LABEL, r.kind)
        ? NODE_KIND_LABEL[r.kind as NodeKind]
        : 'Node';
  } else {
    kind = { pipes: 'Pipe', cases: 'Case', routes: 'Route' }[collection] ?? 'Record';
  }
  return name !== '' && name !== key ? `${kind} "${name}" (${key})` : `${kind} ${key}`;
}

/** The element an issue belongs to, in words, when its path starts inside a collection. */
export function issueElement(issue: Issue, root: unknown): string | undefined {
  const path = issue.path ?? [];
  const [first, second] = path;
  if (!first || !second || typeof first.key !== 'string' || typeof second.key !== 'string') {
    if (first?.key === 'settings') return 'Project settings';
    return undefined;
  }
  if (!['nodes', 'pipes', 'cases', 'routes'].includes(first.key)) {
    return first.key === 'settings' ? 'Project settings' : undefined;
  }
  const collection = (root as Record<string, Record<string, unknown>>)[first.key];
  return recordWords(first.key, second.key, collection?.[second.key]);
}

/** A schema issue as a document problem. */
export function issueToProblem(issue: Issue, root: unknown): DocumentProblem {
  const element = issueElement(issue, root);
  const problem: DocumentProblem = { path: issuePath(issue) || '$', message: describeIssue(issue) };
  if (element) problem.element = element;
  return problem;
}
