/**
 * Project files in the browser: new, open (picker or drop), save (download), the demo
 * projects, and the restore of autosaved work at start-up (storage/autosaveSession.svelte.ts).
 * Loading is never undoable; a refused file leaves the open project untouched, and the
 * question about unsaved changes comes only once a file has been read and accepted.
 */
import { base } from '$app/paths';
import { createDocument } from '../model/defaults';
import { parseProjectFile, projectFileName, serializeProject } from '../model/file';
import { loadExample, type ExampleProject } from '../model/examples';
import type { HeadrouteDocument } from '../model/types';
import { downloadText } from './downloadText';
import { editor } from './editor.svelte';
import { autosaveSession, AutosaveSession } from './storage/autosaveSession.svelte';
import type { OfferedCopy } from './storage/restore';

/** Largest project file the app will read, bytes. */
export const MAX_FILE_BYTES = 20 * 1024 * 1024;

/** Ask before throwing away unsaved work. */
function mayDiscard(): boolean {
  return !editor.dirty || confirm('The project has unsaved changes. Discard them?');
}

/** Read project text; on refusal say why (first few problems) and return null. */
function readProjectText(text: string, fileName: string | null) {
  const parsed = parseProjectFile(text);
  if (parsed.ok) return parsed;
  const first = parsed.errors
    .slice(0, 3)
    .map((e: { path: string; message: string }) => (e.path ? `${e.path}: ${e.message}` : e.message))
    .join('; ');
  const more = parsed.errors.length > 3 ? ` (and ${parsed.errors.length - 3} more)` : '';
  editor.say(`${fileName ?? 'The file'} was not opened: ${first}${more}`, 'error');
  return null;
}

/**
 * Load project text; on refusal say why and keep the open project. Unsaved changes are asked
 * about only once the text has been read and accepted.
 */
export function loadProjectText(text: string, fileName: string | null): boolean {
  const parsed = readProjectText(text, fileName);
  if (!parsed || !mayDiscard()) return false;
  editor.load(parsed.document as HeadrouteDocument, fileName);
  autosaveSession.setBaseline(editor.doc);
  editor.say(
    parsed.migratedFrom !== undefined
      ? `Opened ${fileName ?? parsed.document.name} (updated from file version ${parsed.migratedFrom}).`
      : `Opened ${fileName ?? parsed.document.name}.`,
  );
  return true;
}

/** Start an empty project. */
export function newProject(): void {
  if (!mayDiscard()) return;
  editor.load(createDocument('Untitled project'));
  autosaveSession.setBaseline(editor.doc);
  editor.say('New project.');
}

/** Open a project file chosen by the user or dropped on the page. */
export async function openFile(file: File): Promise<boolean> {
  if (file.size > MAX_FILE_BYTES) {
    editor.say(`${file.name} was not opened: it is larger than 20 MB.`, 'error');
    return false;
  }
  return loadProjectText(await file.text(), file.name);
}

/**
 * Open one of the demo projects in static/examples. With `unlessChangedSince` (a document
 * revision), the demo is not opened if the user changed or replaced the document while it
 * was being fetched: their work wins.
 */
export async function openDemo(
  example: ExampleProject,
  ask = true,
  unlessChangedSince?: number,
): Promise<boolean> {
  const parsed = await loadExample(example, undefined, base);
  if (unlessChangedSince !== undefined && editor.revision !== unlessChangedSince) return false;
  if (!parsed.ok) {
    editor.say(parsed.errors.map((e) => e.message).join('; '), 'error');
    return false;
  }
  if (ask && !mayDiscard()) return false;
  editor.load(parsed.document);
  autosaveSession.setBaseline(editor.doc);
  editor.say(`Opened the demo project “${example.title}”.`);
  return true;
}

/** Save the project as a download. */
export function saveProject(): void {
  const name = editor.fileName ?? projectFileName(editor.doc);
  const text = serializeProject(editor.doc);
  downloadText(text, name);
  editor.markSaved(name);
  autosaveSession.setBaseline(editor.doc, text);
  editor.say(`Saved ${name}.`);
}

/** What the restore notice shows after a reload brought back autosaved work. */
export interface RestoreNotice {
  text: string;
  level: 'info' | 'error';
}

/**
 * At start-up: bring back this tab's autosaved project, or the newest one of a closed tab
 * (unsaved only if it differs from the file it was last saved to or opened from), otherwise
 * open the first demo. Returns a notice for the user, or null.
 */
export async function startUp(firstDemo: ExampleProject): Promise<RestoreNotice | null> {
  const startRevision = editor.revision;
  const plan = await autosaveSession.start(() => editor.fileName);
  // The user may already have pressed New or opened a file: never replace what they started.
  if (editor.revision !== startRevision) {
    if (plan) await autosaveSession.keepApart(plan);
    return null;
  }
  if (plan?.open) {
    const { record, document, migratedFrom } = plan.open;
    editor.load(document, record.fileName ?? null, AutosaveSession.unsavedIn(record));
    await autosaveSession.opened(plan);
    const when = record.savedAt ? new Date(record.savedAt).toLocaleString() : 'earlier';
    const updated =
      migratedFrom !== undefined ? ` (updated from file version ${migratedFrom})` : '';
    return {
      text: `Restored “${document.name}” from the autosave of ${when}${updated}.`,
      level: 'info',
    };
  }
  await openDemo(firstDemo, false, startRevision);
  return null;
}

/** Open a closed tab's autosaved copy in this tab (asking first about unsaved changes). */
export async function openOffered(copy: OfferedCopy): Promise<boolean> {
  if (!mayDiscard()) return false;
  const { record, document } = copy.copy;
  editor.load(document, record.fileName ?? null, AutosaveSession.unsavedIn(record));
  await autosaveSession.adoptOffered(copy);
  editor.say(`Opened the autosaved “${document.name}”.`);
  return true;
}
