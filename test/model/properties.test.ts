import { applyPatches } from 'immer';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  addCase,
  addNode,
  addRoute,
  applyCommand,
  connect,
  deleteCase,
  deleteElements,
  deleteRoute,
  duplicateCase,
  duplicateElements,
  moveNodes,
  renameCase,
  renameDocument,
  setNodePosition,
  updateCaseOverrides,
  updateNode,
  updatePipe,
  updateRoute,
  updateSettings,
  type Command,
} from '../../src/lib/model/commands';
import { createDocument } from '../../src/lib/model/defaults';
import { parseProjectFile, serializeProject } from '../../src/lib/model/file';
import { validateDocument } from '../../src/lib/model/file/validate';
import { History } from '../../src/lib/model/history';
import { portsOf } from '../../src/lib/model/ports';
import type { HeadrouteDocument, NodeKind } from '../../src/lib/model/types';

const KINDS: NodeKind[] = [
  'vessel',
  'pump',
  'fitting',
  'control-valve',
  'waypoint',
  'junction',
  'boundary',
];

/** A random action: an operation number and some numbers to pick targets and values with. */
const action = fc.record({
  op: fc.nat(19),
  a: fc.nat(1000),
  b: fc.nat(1000),
  c: fc.nat(1000),
  value: fc.double({ min: -50, max: 50, noNaN: true }),
  gesture: fc.boolean(),
});
type Action = typeof action extends fc.Arbitrary<infer T> ? T : never;

function pick<T>(items: readonly T[], n: number): T | undefined {
  return items.length === 0 ? undefined : items[n % items.length];
}

/** Turn an action into a command against the current document (it may be refused). */
function toCommand(doc: HeadrouteDocument, x: Action): Command {
  const nodes = Object.values(doc.nodes);
  const pipes = Object.keys(doc.pipes);
  const cases = Object.keys(doc.cases);
  const routes = Object.keys(doc.routes);
  const node = pick(nodes, x.a);
  const other = pick(nodes, x.b);
  switch (x.op) {
    case 0:
    case 1:
      return addNode(KINDS[x.a % KINDS.length], { x: x.b, y: x.c });
    case 2:
    case 3: {
      if (!node || !other) return addNode('junction', { x: 0, y: 0 });
      const from = { node: node.id, port: pick(portsOf(node), x.c) ?? 'in' };
      const to = { node: other.id, port: pick(portsOf(other), x.c + 1) ?? 'out' };
      return connect(from, to, { length: Math.abs(x.value) + 0.1 });
    }
    case 4:
      return moveNodes(
        nodes.filter((_, i) => (i + x.a) % 2 === 0).map((n) => n.id),
        x.value,
        -x.value,
      );
    case 5:
      return setNodePosition(node?.id ?? 'none', x.b, x.c);
    case 6:
      return updateNode(node?.id ?? 'none', { z: x.value, name: `n${x.b}` });
    case 7:
      return updatePipe(pick(pipes, x.a) ?? 'none', { length: x.value }); // negative is refused
    case 8: {
      const pipe = pick(pipes, x.a);
      if (!pipe || !other) return renameDocument(`d${x.a}`);
      return updatePipe(pipe, { to: { node: other.id, port: pick(portsOf(other), x.c) ?? 'p' } });
    }
    case 9:
      return deleteElements([node?.id, pick(pipes, x.b)].filter((id): id is string => !!id));
    case 10:
      return duplicateElements(node && other ? [node.id, other.id] : [], { x: 20, y: 20 });
    case 11:
      return addCase(
        `case ${x.a}`,
        node?.kind === 'vessel'
          ? { vessels: { [node.id]: { liquidLevel: x.value } } }
          : { temperature: 280 + x.b / 10 },
      );
    case 12:
      return renameCase(pick(cases, x.a) ?? 'none', `c${x.b}`);
    case 13:
      return duplicateCase(pick(cases, x.a) ?? 'none');
    case 14:
      return deleteCase(pick(cases, x.a) ?? 'none');
    case 15:
      return updateCaseOverrides(pick(cases, x.a) ?? 'none', { temperature: 300 + x.value });
    case 16:
      return addRoute(
        `r${x.a}`,
        [node?.id, other?.id].filter((id): id is string => !!id),
      );
    case 17:
      return pick(routes, x.a)
        ? updateRoute(pick(routes, x.a)!, { name: `route ${x.b}` })
        : deleteRoute(pick(routes, x.b) ?? 'none');
    case 18:
      return updateSettings({ temperature: 273.15 + x.value + 60, siteElevation: x.value * 10 });
    default:
      return renameDocument(`Project ${x.a}`);
  }
}

describe('random command sequences (fast-check)', () => {
  it('undo all returns the first document, redo all the last; every step is valid', () => {
    fc.assert(
      fc.property(fc.array(action, { minLength: 1, maxLength: 60 }), (actions) => {
        const first = createDocument('Random');
        const h = new History(first, 1000);
        let gestureOpen = false;
        for (const x of actions) {
          if (x.gesture && !gestureOpen) {
            h.beginGesture();
            gestureOpen = true;
          } else if (!x.gesture && gestureOpen) {
            h.endGesture();
            gestureOpen = false;
          }
          h.apply(toCommand(h.doc, x));
          const valid = validateDocument(h.doc);
          if (!valid.ok) throw new Error(JSON.stringify(valid.errors));
        }
        if (gestureOpen) h.endGesture();
        const last = h.doc;
        while (h.undo());
        expect(h.doc).toEqual(first);
        while (h.redo());
        expect(h.doc).toEqual(last);
      }),
      { numRuns: 150 },
    );
  });

  it('each command’s patches replay forwards and backwards; files round-trip', () => {
    const applied = new Map<string, number>();
    fc.assert(
      fc.property(fc.array(action, { minLength: 1, maxLength: 40 }), (actions) => {
        let doc = createDocument('Random');
        for (const x of actions) {
          const result = applyCommand(doc, toCommand(doc, x));
          if (!result.ok) continue;
          const key = x.op < 2 ? 'add' : x.op < 4 ? 'connect' : String(x.op);
          applied.set(key, 1 + (applied.get(key) ?? 0));
          expect(applyPatches(doc, result.patches)).toEqual(result.doc);
          expect(applyPatches(result.doc, result.inversePatches)).toEqual(doc);
          doc = result.doc;
        }
        const reread = parseProjectFile(serializeProject(doc));
        expect(reread.ok).toBe(true);
        if (reread.ok) expect(reread.document).toEqual(doc);
      }),
      { numRuns: 150 },
    );
    // The generator must reach the commands it is meant to test, not only refusals.
    for (const op of ['add', 'connect', '4', '5', '6', '8', '9', '10', '11', '16', '18']) {
      expect(applied.get(op) ?? 0, `operation ${op} never succeeded`).toBeGreaterThan(0);
    }
  });
});
