import { describe, expect, it } from 'vitest';
import {
  addNode,
  moveNodes,
  renameDocument,
  updateNode,
  updatePipe,
} from '../../src/lib/model/commands';
import { onlySheetPositionsChanged } from '../../src/lib/model/sheetPositions';
import { build, sampleDocument } from './helpers';

describe('onlySheetPositionsChanged', () => {
  const doc = sampleDocument();

  it('is true for a move on the sheet (one node or several) and for the same document', () => {
    expect(onlySheetPositionsChanged(doc, doc)).toBe(true);
    expect(onlySheetPositionsChanged(doc, build(doc, moveNodes(['P1'], 20, -40)))).toBe(true);
    expect(onlySheetPositionsChanged(doc, build(doc, moveNodes(['V1', 'V2'], 5, 5)))).toBe(true);
  });

  it('is false for anything a solve depends on or a finding quotes', () => {
    const pipeId = Object.keys(doc.pipes)[0];
    for (const next of [
      build(doc, updateNode('P1', { z: 3 })),
      build(doc, updateNode('P1', { name: 'P-1' })),
      build(doc, updateNode('V1', { liquidLevel: 2 })),
      build(doc, updatePipe(pipeId, { length: 12 })),
      build(doc, addNode('waypoint', { x: 50, y: 50 })),
      build(doc, renameDocument('Other')),
      { ...doc, settings: { ...doc.settings, temperature: 350 } },
    ])
      expect(onlySheetPositionsChanged(doc, next)).toBe(false);
  });

  it('is false when a node moves and changes in the same step, or a node is replaced', () => {
    const moved = build(doc, moveNodes(['P1'], 20, 0), updateNode('P1', { z: 1 }));
    expect(onlySheetPositionsChanged(doc, moved)).toBe(false);
    const { P1, ...rest } = doc.nodes;
    const swapped = { ...doc, nodes: { ...rest, P2: { ...P1, id: 'P2' } } };
    expect(onlySheetPositionsChanged(doc, swapped)).toBe(false);
  });
});
