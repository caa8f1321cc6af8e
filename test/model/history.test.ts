import { describe, expect, it } from 'vitest';
import { History } from '../../src/lib/model/history';
import {
  addNode,
  connect,
  deleteElements,
  moveNodes,
  renameDocument,
  updatePipe,
} from '../../src/lib/model/commands';
import { createDocument } from '../../src/lib/model/defaults';
import { sampleDocument } from './helpers';

describe('History', () => {
  it('undo and redo one command each, counting revisions', () => {
    const first = sampleDocument();
    const h = new History(first);
    expect(h.revision).toBe(0);
    expect(h.canUndo).toBe(false);
    const r = h.apply(addNode('waypoint', { x: 0, y: 0 }));
    expect(r).toEqual({ ok: true, created: ['W1'] });
    const after = h.doc;
    expect(h.revision).toBe(1);
    expect(h.undoLabel).toBe('Add waypoint');
    expect(h.undo()).toBe(true);
    expect(h.doc).toEqual(first);
    expect(h.revision).toBe(2);
    expect(h.canRedo).toBe(true);
    expect(h.redo()).toBe(true);
    expect(h.doc).toEqual(after);
    expect(h.revision).toBe(3);
    expect(h.undo() && h.undo()).toBe(false);
  });

  it('a refused command changes nothing and adds no step', () => {
    const h = new History(sampleDocument());
    const before = h.doc;
    const r = h.apply(connect({ node: 'V1', port: 'N1' }, { node: 'J1', port: 'hub' }));
    expect(r.ok).toBe(false);
    expect(h.doc).toBe(before);
    expect(h.revision).toBe(0);
    expect(h.canUndo).toBe(false);
  });

  it('a command that changes nothing adds no step and keeps the revision', () => {
    const h = new History(sampleDocument());
    h.apply(deleteElements(['nothing-here']));
    expect(h.canUndo).toBe(false);
    expect(h.revision).toBe(0);
  });

  it('a drag of 200 moves is one undo step', () => {
    const h = new History(sampleDocument());
    const start = h.doc;
    h.beginGesture();
    for (let i = 0; i < 200; i++) h.apply(moveNodes(['P1'], 1, 0.5));
    h.endGesture();
    expect(h.doc.nodes.P1).toMatchObject({ x: 400, y: 100 });
    expect(h.undoDepth).toBe(1);
    expect(h.revision).toBe(200);
    h.undo();
    expect(h.doc).toEqual(start);
    h.redo();
    expect(h.doc.nodes.P1).toMatchObject({ x: 400, y: 100 });
  });

  it('a gesture mixing commands undoes in the right order', () => {
    const h = new History(sampleDocument());
    const start = h.doc;
    h.beginGesture();
    h.apply(addNode('junction', { x: 1, y: 1 }));
    h.apply(updatePipe('L2', { to: { node: 'J2', port: 'hub' } }));
    h.apply(moveNodes(['J2'], 5, 5));
    h.endGesture();
    expect(h.undoDepth).toBe(1);
    h.undo();
    expect(h.doc).toEqual(start);
  });

  it('cancelGesture rolls back; nested gestures count', () => {
    const h = new History(sampleDocument());
    const start = h.doc;
    h.beginGesture();
    h.beginGesture();
    h.apply(moveNodes(['V1'], 3, 3));
    h.endGesture();
    expect(h.inGesture).toBe(true);
    h.apply(moveNodes(['V1'], 3, 3));
    h.cancelGesture();
    expect(h.doc).toBe(start);
    expect(h.canUndo).toBe(false);
    expect(h.inGesture).toBe(false);
  });

  it("cancelling a gesture begun inside another keeps the outer gesture's work", () => {
    const h = new History(sampleDocument());
    const start = h.doc;
    h.beginGesture();
    h.apply(moveNodes(['V1'], 3, 3));
    const outer = h.doc;
    h.beginGesture();
    h.apply(moveNodes(['P1'], 7, 7));
    h.apply(renameDocument('inner'));
    h.cancelGesture();
    expect(h.inGesture).toBe(true);
    expect(h.doc).toBe(outer);
    h.apply(moveNodes(['V1'], 1, 1));
    h.endGesture();
    expect(h.inGesture).toBe(false);
    expect(h.undoDepth).toBe(1);
    expect(h.undoLabel).toBe('Move');
    const done = h.doc;
    expect(done.nodes.V1).toMatchObject({ x: start.nodes.V1.x + 4, y: start.nodes.V1.y + 4 });
    expect(done.nodes.P1).toEqual(start.nodes.P1);
    expect(done.name).toBe(start.name);
    h.undo();
    expect(h.doc).toEqual(start);
    h.redo();
    expect(h.doc).toEqual(done);
  });

  it('an inner gesture that ends joins the outer step; cancelling with nothing changed is quiet', () => {
    const h = new History(sampleDocument());
    const start = h.doc;
    h.beginGesture();
    h.beginGesture();
    const revision = h.revision;
    h.cancelGesture();
    expect(h.revision).toBe(revision);
    h.beginGesture();
    h.apply(moveNodes(['P1'], 2, 2));
    h.endGesture();
    h.apply(moveNodes(['V1'], 2, 2));
    h.endGesture();
    expect(h.undoDepth).toBe(1);
    h.undo();
    expect(h.doc).toEqual(start);
  });

  it('undo during a gesture ends it first', () => {
    const h = new History(sampleDocument());
    const start = h.doc;
    h.beginGesture();
    h.apply(moveNodes(['V1'], 3, 3));
    h.undo();
    expect(h.inGesture).toBe(false);
    expect(h.doc).toEqual(start);
  });

  it('a new edit clears redo', () => {
    const h = new History(sampleDocument());
    h.apply(renameDocument('a'));
    h.undo();
    h.apply(renameDocument('b'));
    expect(h.canRedo).toBe(false);
  });

  it('deleting a node and its pipes is one step; one undo brings all back', () => {
    const start = sampleDocument();
    const h = new History(start);
    h.apply(deleteElements(['P1']));
    expect(Object.keys(h.doc.pipes)).toEqual([]);
    expect(h.undoDepth).toBe(1);
    h.undo();
    expect(h.doc).toEqual(start);
  });

  it('is bounded', () => {
    const h = new History(createDocument('x'), 5);
    for (let i = 0; i < 12; i++) h.apply(renameDocument(`n${i}`));
    expect(h.undoDepth).toBe(5);
    let undone = 0;
    while (h.undo()) undone++;
    expect(undone).toBe(5);
    expect(h.doc.name).toBe('n6');
  });

  it('reset is not undoable and still bumps the revision; listeners hear every change', () => {
    const h = new History(sampleDocument());
    const heard: number[] = [];
    const stop = h.subscribe((_doc, revision) => heard.push(revision));
    h.apply(renameDocument('edited'));
    const loaded = createDocument('Loaded');
    h.reset(loaded);
    expect(h.doc).toBe(loaded);
    expect(h.canUndo).toBe(false);
    expect(h.canRedo).toBe(false);
    expect(h.revision).toBe(2);
    stop();
    h.apply(renameDocument('later'));
    expect(heard).toEqual([1, 2]);
  });

  it('documents it hands out are frozen, including ones given to reset', () => {
    const h = new History(createDocument('x'));
    h.reset(structuredClone(sampleDocument()));
    expect(Object.isFrozen(h.doc.nodes.P1)).toBe(true);
    h.apply(moveNodes(['V1'], 1, 1));
    expect(Object.isFrozen(h.doc)).toBe(true);
    expect(Object.isFrozen(h.doc.nodes.V1)).toBe(true);
  });
});
