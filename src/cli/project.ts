/**
 * Reading the project file named on the command line and finding the case, nodes and
 * stored routes the user names in it.
 */
import { readFile } from 'node:fs/promises';
import { parseProjectFile } from '../lib/model/file/index';
import type { HeadrouteDocument, Id } from '../lib/model/types';
import { CliError, EXIT } from './args';

/** Most file problems listed before "and N more". */
const MAX_LISTED_PROBLEMS = 20;

/** Reads and validates a project file; throws CliError (exit 3) with the reader's messages. */
export async function loadProject(path: string): Promise<HeadrouteDocument> {
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const why =
      code === 'ENOENT'
        ? 'there is no such file'
        : code === 'EISDIR'
          ? 'it is a folder, not a file'
          : code === 'EACCES'
            ? 'permission denied'
            : error instanceof Error
              ? error.message
              : String(error);
    throw new CliError(`Cannot read ${path}: ${why}.`, EXIT.file);
  }
  const parsed = parseProjectFile(text);
  if (parsed.ok) return parsed.document;
  const lines = parsed.errors.slice(0, MAX_LISTED_PROBLEMS).map((e) => {
    const where = e.element ? `${e.element}: ` : '';
    return `  - ${where}${e.message} (at ${e.path})`;
  });
  if (parsed.errors.length > MAX_LISTED_PROBLEMS)
    lines.push(`  … and ${parsed.errors.length - MAX_LISTED_PROBLEMS} more.`);
  throw new CliError(`${path} is not a valid Headroute project:\n${lines.join('\n')}`, EXIT.file);
}

function quoteList(names: string[]): string {
  return names.length ? names.map((n) => `“${n}”`).join(', ') : '(none)';
}

/** Finds a record by id, then by exact name, then by name ignoring case; throws when none or several. */
/** The words of a name, lower case, split at spaces, brackets and commas: its tags among them. */
function nameTags(name: string): string[] {
  return name
    .toLowerCase()
    .split(/[\s(),;]+/)
    .filter((w) => w !== '');
}

function findByIdOrName<T extends { id: Id; name: string }>(
  records: Record<Id, T>,
  text: string,
  what: string,
  file: string,
): T {
  if (Object.hasOwn(records, text)) return records[text];
  const all = Object.values(records);
  let matches = all.filter((r) => r.name === text);
  if (matches.length === 0)
    matches = all.filter((r) => r.name.toLowerCase() === text.toLowerCase());
  // A tag within the name ("T-101" in "Storage tank T-101"), when only one name carries it.
  if (matches.length === 0) {
    const tag = text.toLowerCase();
    const tagged = all.filter((r) => nameTags(r.name).includes(tag));
    if (tagged.length === 1) return tagged[0];
  }
  if (matches.length === 1) return matches[0];
  if (matches.length > 1) {
    throw new CliError(
      `Several ${what}s in ${file} are named “${text}”; give one by id: ${matches.map((m) => m.id).join(', ')}.`,
      EXIT.usage,
    );
  }
  const known = all.map((r) => (r.name && r.name !== r.id ? `${r.name} (${r.id})` : r.id));
  throw new CliError(
    `There is no ${what} “${text}” in ${file}. ${what[0].toUpperCase()}${what.slice(1)}s: ${quoteList(known.slice(0, 30))}${known.length > 30 ? ' …' : ''}.`,
    EXIT.usage,
  );
}

/** The case named (by name or id) on the command line, or null for the base document. */
export function resolveCase(
  doc: HeadrouteDocument,
  name: string | undefined,
  file: string,
): Id | null {
  if (name === undefined) return null;
  return findByIdOrName(doc.cases, name, 'case', file).id;
}

/** A node named (by name or id) on the command line. */
export function resolveNode(doc: HeadrouteDocument, name: string, file: string): Id {
  return findByIdOrName(doc.nodes, name, 'node', file).id;
}

/** A stored route named (by name or id) on the command line. */
export function resolveStoredRoute(
  doc: HeadrouteDocument,
  name: string,
  file: string,
): { id: Id; name: string; nodes: Id[] } {
  return findByIdOrName(doc.routes, name, 'route', file);
}
