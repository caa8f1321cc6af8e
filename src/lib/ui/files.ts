/**
 * Project files in the browser: new, open (picker or drop), save (download), the demo
 * projects, autosave and its restore. Loading is never undoable; a refused file leaves the
 * open project untouched.
 */
import { base } from '$app/paths';
import { createDocument } from '../model/defaults';
import { parseProjectFile, projectFileName, serializeProject } from '../model/file';
import { loadExample, type ExampleProject } from '../model/examples';
import { clearAutosave, createAutosaver, loadAutosave } from '../model/storage/autosave';
import type { HeadrouteDocument } from '../model/types';
import { editor } from './editor.svelte';

/** Largest project file the app will read, bytes. */
export const MAX_FILE_BYTES = 20 * 1024 * 1024;

/** Ask before throwing away unsaved work. */
function mayDiscard(): boolean {
  return !editor.dirty || confirm('The project has unsaved changes. Discard them?');
}

/** Load project text; on refusal say why (first few problems) and keep the open project. */
export function loadProjectText(text: string, fileName: string | null): boolean {
  const parsed = parseProjectFile(text);
  if (!parsed.ok) {
    const first = parsed.errors
      .slice(0, 3)
      .map((e: { path: string; message: string }) =>
        e.path ? `${e.path}: ${e.message}` : e.message,
      )
      .join('; ');
    const more = parsed.errors.length > 3 ? ` (and ${parsed.errors.length - 3} more)` : '';
    editor.say(`${fileName ?? 'The file'} was not opened: ${first}${more}`, 'error');
    return false;
  }
  editor.load(parsed.document as HeadrouteDocument, fileName);
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
  editor.say('New project.');
}

/** Open a project file chosen by the user or dropped on the page. */
export async function openFile(file: File): Promise<boolean> {
  if (file.size > MAX_FILE_BYTES) {
    editor.say(`${file.name} was not opened: it is larger than 20 MB.`, 'error');
    return false;
  }
  if (!mayDiscard()) return false;
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
  if (ask && !mayDiscard()) return false;
  const parsed = await loadExample(example, undefined, base);
  if (unlessChangedSince !== undefined && editor.revision !== unlessChangedSince) return false;
  if (!parsed.ok) {
    editor.say(parsed.errors.map((e) => e.message).join('; '), 'error');
    return false;
  }
  editor.load(parsed.document);
  editor.say(`Opened the demo project “${example.title}”.`);
  return true;
}

/** Save the project as a download. */
export function saveProject(): void {
  const name = editor.fileName ?? projectFileName(editor.doc);
  const blob = new Blob([serializeProject(editor.doc)], { type: 'application/json' });
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  a.click();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
  editor.markSaved(name);
  editor.say(`Saved ${name}.`);
}

/** What the restore notice shows after a reload brought back autosaved work. */
export interface RestoreNotice {
  text: string;
  level: 'info' | 'error';
}

/**
 * At start-up: bring back the autosaved project if there is one (unsaved, so the guard still
 * asks), otherwise open the first demo. Returns a notice for the user, or null.
 */
export async function startUp(firstDemo: ExampleProject): Promise<RestoreNotice | null> {
  const startRevision = editor.revision;
  // An unreadable IndexedDB (private mode, blocked storage) simply means nothing to restore.
  const restored = await loadAutosave().catch(() => null);
  // The user may already have pressed New or opened a file: never replace what they started.
  if (editor.revision !== startRevision) return null;
  if (restored?.ok) {
    editor.load(restored.document, null, true);
    const when = restored.savedAt ? new Date(restored.savedAt).toLocaleString() : 'earlier';
    return {
      text: `Restored “${restored.document.name}” from the autosave of ${when}.`,
      level: 'info',
    };
  }
  await openDemo(firstDemo, false, startRevision);
  if (restored && !restored.ok) {
    return {
      text: `The autosaved copy could not be read (${restored.errors[0]?.message ?? 'unknown problem'}); it is kept until you clear it.`,
      level: 'error',
    };
  }
  return null;
}

/** Keep an autosave of the document, at most once a second, and on page hide. */
export function startAutosave(): { schedule(doc: HeadrouteDocument): void; flush(): void } {
  const saver = createAutosaver({
    delayMs: 1000,
    onError: (error) => editor.say(`Autosave failed: ${String(error)}`, 'error'),
  });
  return { schedule: (doc) => saver.schedule(doc), flush: () => void saver.flush() };
}

/** Forget the autosaved copy. */
export async function discardAutosave(): Promise<void> {
  await clearAutosave();
}
