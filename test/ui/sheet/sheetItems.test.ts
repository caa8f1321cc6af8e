/**
 * The sheet's per-element records: unchanged elements keep their record (so the sheet does not
 * update them), changed ones get a new one with the right texts.
 */
import { describe, expect, it } from 'vitest';
import { network } from '../../../bench/networks';
import { moveNodes, updateNode, updatePipe } from '../../../src/lib/model/commands';
import { History } from '../../../src/lib/model/history';
import type { HeadrouteDocument } from '../../../src/lib/model/types';
import { solve } from '../../../src/lib/solver/solve';
import type { SolveResult } from '../../../src/lib/solver/types';
import { connectedPortsOf } from '../../../src/lib/ui/sheet/geometry';
import { nodeItems, pipeFlow, pipeItems } from '../../../src/lib/ui/sheet/sheetItems';
import { findingsByElement, nodePressureText } from '../../../src/lib/ui/results';
import { portsOf } from '../../../src/lib/model/ports';

// The sheet keeps one connected-ports map while the pipes are unchanged (NodeLayer).
const connectedOf = new WeakMap<object, ReturnType<typeof connectedPortsOf>>();
const connected = (doc: HeadrouteDocument) => {
  if (!connectedOf.has(doc.pipes)) connectedOf.set(doc.pipes, connectedPortsOf(doc.pipes));
  return connectedOf.get(doc.pipes)!;
};

const SI = { system: 'SI', texts: true } as const;
const US = { system: 'US', texts: true } as const;

const items = (
  doc: HeadrouteDocument,
  result: SolveResult | null,
  caches: {
    nodes: ReturnType<typeof nodeItems> | null;
    pipes: ReturnType<typeof pipeItems> | null;
  },
) => {
  const badges = findingsByElement(result?.findings ?? []);
  const nodes = nodeItems(caches.nodes?.cache ?? null, doc, result, SI, badges, connected(doc));
  const pipes = pipeItems(caches.pipes?.cache ?? null, doc, result, SI, badges);
  return { nodes, pipes };
};

describe('sheet items', () => {
  it('carry the texts the sheet shows for a result', () => {
    const doc = network('series', 8);
    const result = solve(doc, null);
    const { nodes, pipes } = items(doc, result, { nodes: null, pipes: null });
    expect(nodes.items).toHaveLength(Object.keys(doc.nodes).length);
    expect(pipes.items).toHaveLength(Object.keys(doc.pipes).length);
    for (const item of nodes.items) {
      const id = item.node.id;
      expect(item.node).toBe(doc.nodes[id]);
      expect(item.pressure).toBe(nodePressureText(result.nodes[id], portsOf(item.node)[0], 'SI'));
    }
    const pipe = pipes.items[0];
    expect(pipe.from).toBe(doc.nodes[pipe.pipe.from.node]);
    expect(pipe.to).toBe(doc.nodes[pipe.pipe.to.node]);
    expect(pipe.flow).toEqual(pipeFlow(result.pipes[pipe.pipe.id], 'SI'));
    expect(pipe.flow?.text).toMatch(/^[\d.]+ m3\/h$/);
    expect(pipe.flow?.noFlow).toBe(false);
    // Without a result: no texts.
    const bare = items(doc, null, { nodes: null, pipes: null });
    expect(bare.nodes.items.every((n) => n.pressure === null)).toBe(true);
    expect(bare.pipes.items.every((p) => p.flow === null)).toBe(true);
  });

  it('keep the record of every element a change leaves as it was', () => {
    const history = new History(network('series', 8));
    const first = items(history.doc, solve(history.doc, null), { nodes: null, pipes: null });
    const waypoint = first.nodes.items.find((n) => n.node.kind === 'waypoint')!.node;

    // A move on the sheet: only the moved node and its two pipes get new records.
    history.apply(moveNodes([waypoint.id], 40, 0));
    const moved = items(history.doc, solve(history.doc, null), first);
    const changedNodes = moved.nodes.items.filter((n, i) => n !== first.nodes.items[i]);
    const changedPipes = moved.pipes.items.filter((p, i) => p !== first.pipes.items[i]);
    expect(changedNodes.map((n) => n.node.id)).toEqual([waypoint.id]);
    expect(changedPipes).toHaveLength(2);

    // The same result again: nothing changes.
    const again = items(history.doc, solve(history.doc, null), moved);
    expect(again.nodes.items.every((n, i) => n === moved.nodes.items[i])).toBe(true);
    expect(again.pipes.items.every((p, i) => p === moved.pipes.items[i])).toBe(true);

    // A longer pipe: the flow (shown to three figures) changes, so every pipe gets a new flow
    // text and a new record; pressures downstream change too.
    history.apply(updatePipe(first.pipes.items[0].pipe.id, { length: 500 }));
    const longer = items(history.doc, solve(history.doc, null), again);
    expect(longer.pipes.items[0].flow?.text).not.toBe(again.pipes.items[0].flow?.text);
    expect(longer.pipes.items.every((p, i) => p !== again.pipes.items[i])).toBe(true);

    // A small change of elevation leaves the flow texts as they were: only the two pipes at
    // the changed node get new records (for the node's new record), with the same flow record.
    history.apply(updateNode(waypoint.id, { z: waypoint.z + 0.001 }));
    const nudged = items(history.doc, solve(history.doc, null), longer);
    expect(nudged.pipes.items.every((p, i) => p.flow === longer.pipes.items[i].flow)).toBe(true);
    const newPipes = nudged.pipes.items.filter((p, i) => p !== longer.pipes.items[i]);
    expect(newPipes.map((p) => [p.pipe.from.node, p.pipe.to.node].includes(waypoint.id))).toEqual([
      true,
      true,
    ]);
    const node = nudged.nodes.items.find((n) => n.node.id === waypoint.id)!;
    expect(node).not.toBe(longer.nodes.items.find((n) => n.node.id === waypoint.id));
  });

  it('write the texts again when the unit system changes, even for the same result', () => {
    const doc = network('series', 4);
    const result = solve(doc, null);
    const badges = findingsByElement(result.findings);
    const si = pipeItems(null, doc, result, SI, badges);
    const us = pipeItems(si.cache, doc, result, US, badges);
    expect(us.items[0].flow?.text).toBe(pipeFlow(result.pipes[us.items[0].pipe.id], 'US')?.text);
    expect(us.items[0].flow?.text).not.toBe(si.items[0].flow?.text);
    const nodesSi = nodeItems(null, doc, result, SI, badges, connected(doc));
    const nodesUs = nodeItems(nodesSi.cache, doc, result, US, badges, connected(doc));
    const i = nodesUs.items.findIndex((n) => n.pressure !== null);
    expect(nodesUs.items[i].pressure).toMatch(/psi/);
    expect(nodesSi.items[i].pressure).toMatch(/kPa|bar/);
  });

  it('at far zoom carry no result texts, so a new solve leaves every record as it was', () => {
    const history = new History(network('series', 8));
    const far = { system: 'SI', texts: false } as const;
    const first = solve(history.doc, null);
    const badges = findingsByElement(first.findings);
    const ports = connected(history.doc);
    const nodes = nodeItems(null, history.doc, first, far, badges, ports);
    const pipes = pipeItems(null, history.doc, first, far, badges);
    expect(nodes.items.every((n) => n.pressure === null)).toBe(true);
    // The arrow and the dashes still follow the result; only the text is left out.
    expect(pipes.items[0].flow).toEqual({ text: null, reversed: false, noFlow: false });

    const second = solve(history.doc, null); // a new result object with the same figures
    const nodesAgain = nodeItems(nodes.cache, history.doc, second, far, badges, ports);
    const pipesAgain = pipeItems(pipes.cache, history.doc, second, far, badges);
    expect(nodesAgain.items.every((n, i) => n === nodes.items[i])).toBe(true);
    expect(pipesAgain.items.every((p, i) => p === pipes.items[i])).toBe(true);

    // Zoomed in again: the texts are made.
    const near = pipeItems(pipesAgain.cache, history.doc, second, SI, badges);
    expect(near.items[0].flow?.text).toBe(
      pipeFlow(second.pipes[near.items[0].pipe.id], 'SI')?.text,
    );
    expect(near.items[0].flow?.text).not.toBeNull();
  });
});
