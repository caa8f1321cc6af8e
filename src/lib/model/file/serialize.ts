/** Writing a project file. */
import type { HeadrouteDocument } from '../types';

/** The document as `*.headroute.json` text (pretty-printed, newline at the end). */
export function serializeProject(doc: HeadrouteDocument): string {
  return `${JSON.stringify(doc, null, 2)}\n`;
}

/** A file name for the document: its name made safe, ending in `.headroute.json`. */
export function projectFileName(doc: HeadrouteDocument): string {
  const base = doc.name
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9._ -]+/g, '')
    .trim()
    .replace(/\s+/g, '-')
    .slice(0, 80);
  return `${base || 'project'}.headroute.json`;
}
