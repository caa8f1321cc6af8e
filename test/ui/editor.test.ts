/**
 * The editor's live results: every change to the hydraulics is solved, a move on the sheet
 * carries the current result to the new revision without a solve, and a result is only ever
 * shown for the revision (and document) it belongs to.
 */
import { describe, expect, it } from 'vitest';
import { moveNodes, updateNode } from '../../src/lib/model/commands';
import { editor } from '../../src/lib/ui/editor.svelte';
import { network } from '../../bench/networks';

const settle = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

describe('editor live results', () => {
  it('carries the result over a move on the sheet and solves again after a hydraulic edit', async () => {
    editor.load(network('series', 6));
    await settle();
    const first = editor.result;
    expect(first?.converged).toBe(true);
    const solvedDoc = editor.tagged!.doc;

    const waypoint = Object.values(editor.doc.nodes).find((n) => n.kind === 'waypoint')!;
    editor.dispatch(moveNodes([waypoint.id], 40, 0));
    // At once, with no solve: the same result, now tagged with the new revision.
    expect(editor.solving).toBe(false);
    expect(editor.result).toBe(first);
    expect(editor.tagged!.revision).toBe(editor.revision);
    expect(editor.tagged!.doc).toBe(solvedDoc);

    editor.dispatch(updateNode(waypoint.id, { z: waypoint.z + 2 }));
    expect(editor.result).toBeNull(); // being solved: the old result is not current
    expect(editor.solving).toBe(true);
    await settle();
    expect(editor.result).not.toBe(first);
    expect(editor.result?.converged).toBe(true);
    expect(editor.tagged!.doc).toBe(editor.doc);
  });

  it('undoing a move carries the result too; undoing an edit solves again', async () => {
    editor.load(network('series', 4));
    await settle();
    const id = Object.values(editor.doc.nodes).find((n) => n.kind === 'waypoint')!.id;
    editor.dispatch(updateNode(id, { z: 5 }));
    await settle();
    const edited = editor.result;
    editor.dispatch(moveNodes([id], 0, 20));
    editor.undo(); // the move
    expect(editor.result).toBe(edited);
    editor.undo(); // the elevation
    await settle();
    expect(editor.result).not.toBe(edited);
    expect(editor.tagged!.doc).toBe(editor.doc);
  });

  it('dims the results once per drag: from the first move that waits for a solve to the end of the drag', async () => {
    editor.load(network('series', 6));
    await settle();
    const id = Object.values(editor.doc.nodes).find((n) => n.kind === 'waypoint')!.id;
    // Outside a drag, dimmed follows the solve.
    editor.dispatch(updateNode(id, { z: 3 }));
    expect(editor.dimmed).toBe(true);
    await settle();
    expect(editor.dimmed).toBe(false);

    editor.beginGesture();
    editor.dispatch(updateNode(id, { z: 4 }));
    expect(editor.dimmed).toBe(true);
    await settle();
    // Solved, but the drag goes on: still dimmed, so the sheet is not restyled at every move.
    expect(editor.solving).toBe(false);
    expect(editor.dimmed).toBe(true);
    editor.dispatch(updateNode(id, { z: 5 }));
    await settle();
    expect(editor.dimmed).toBe(true);
    editor.endGesture();
    await settle();
    expect(editor.solving).toBe(false);
    expect(editor.dimmed).toBe(false);

    // A cancelled drag ends the dimming too.
    editor.beginGesture();
    editor.dispatch(updateNode(id, { z: 6 }));
    await settle();
    expect(editor.dimmed).toBe(true);
    editor.cancelGesture();
    await settle();
    expect(editor.dimmed).toBe(false);
    expect(editor.doc.nodes[id].z).toBe(5);
  });
});
