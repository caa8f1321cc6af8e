/**
 * Checks of the links between records, run after the schema has passed: record keys match ids,
 * ids are unique across the document, every pipe joins two different existing ports and no port
 * carries more pipes than it may, stored routes and case overrides name existing nodes.
 */
import { CASE_NODE_GROUPS } from './caseTargets';
import { idInUse } from './ids';
import { NODE_KIND_LABEL, nodeLabel } from './labels';
import { hasPort, isMultiPort } from './ports';
import type { HeadrouteDocument, Id, PortRef, SheetNode } from './types';

/** One problem found in a document, tied to where it is and which element it belongs to. */
export interface DocumentProblem {
  /** JSON path, e.g. `pipes.L1.to.node`. */
  path: string;
  /** The element at fault in words, e.g. `Pipe "Suction line" (L1)`. */
  element?: string;
  /** What is wrong, in plain words. */
  message: string;
}

/** Longest key written whole in a path; a longer (hostile) key is cut, so no message echoes it. */
const MAX_PATH_KEY = 64;

/**
 * Path segment for a record key: plain when it is identifier-like, bracketed otherwise (quoted
 * as JSON, so control characters and lone surrogates show as escapes; cut when very long).
 */
export function pathKey(key: string | number): string {
  if (typeof key === 'number') return `[${key}]`;
  if (key.length > MAX_PATH_KEY) return `[${JSON.stringify(`${key.slice(0, 40)}…`)}]`;
  return /^[A-Za-z_][A-Za-z0-9_]*$/.test(key) ? `.${key}` : `[${JSON.stringify(key)}]`;
}

/** `path` extended by `key` (`nodes` + `P1` → `nodes.P1`; a leading segment has no dot). */
export function joinPath(path: string, key: string | number): string {
  const part = pathKey(key);
  return path === '' && part.startsWith('.') ? part.slice(1) : `${path}${part}`;
}

function nodeWords(doc: HeadrouteDocument, id: Id): string {
  const node = doc.nodes[id];
  const label = nodeLabel(node);
  return label === id ? `${NODE_KIND_LABEL[node.kind]} ${id}` : `"${label}" (${id})`;
}

const COLLECTION_WORD = { nodes: 'Node', pipes: 'Pipe', cases: 'Case', routes: 'Route' } as const;

/** A record of the document in words, e.g. `Pump "Transfer pump" (P1)` or `Pipe L2`. */
export function recordWords(
  doc: HeadrouteDocument,
  collection: keyof typeof COLLECTION_WORD,
  key: Id,
): string {
  const record = doc[collection][key];
  const word =
    collection === 'nodes'
      ? NODE_KIND_LABEL[(record as SheetNode).kind]
      : COLLECTION_WORD[collection];
  const name = record.name.trim();
  return name !== '' && name !== key ? `${word} "${name}" (${key})` : `${word} ${key}`;
}

/** Every link problem in a schema-valid document (empty when the document is sound). */
export function checkIntegrity(doc: HeadrouteDocument): DocumentProblem[] {
  const problems: DocumentProblem[] = [];
  const seen = new Map<Id, string>();
  const collections = ['nodes', 'pipes', 'cases', 'routes'] as const;
  for (const collection of collections) {
    for (const [key, record] of Object.entries(doc[collection])) {
      const path = `${collection}${pathKey(key)}`;
      if (record.id !== key) {
        problems.push({
          path: `${path}.id`,
          element: recordWords(doc, collection, key),
          message: `The record is stored under "${key}" but its id is "${record.id}"; they must be the same.`,
        });
      }
      const earlier = seen.get(key);
      if (earlier) {
        problems.push({
          path,
          element: recordWords(doc, collection, key),
          message: `The id "${key}" is used twice (in ${earlier} and in ${collection}); ids must be unique.`,
        });
      } else seen.set(key, collection);
    }
  }

  for (const [key, node] of Object.entries(doc.nodes)) {
    if (node.kind !== 'vessel') continue;
    const ids = new Set<string>();
    node.nozzles.forEach((nozzle, i) => {
      if (ids.has(nozzle.id)) {
        problems.push({
          path: `nodes${pathKey(key)}.nozzles[${i}].id`,
          element: nodeWords(doc, key),
          message: `Two nozzles are named "${nozzle.id}"; nozzle names must differ within a vessel.`,
        });
      }
      ids.add(nozzle.id);
    });
  }

  const portUse = new Map<string, Id>();
  for (const [key, pipe] of Object.entries(doc.pipes)) {
    const element = recordWords(doc, 'pipes', key);
    const ends: Array<['from' | 'to', PortRef]> = [
      ['from', pipe.from],
      ['to', pipe.to],
    ];
    for (const [end, ref] of ends) {
      const path = `pipes${pathKey(key)}.${end}`;
      const node = Object.hasOwn(doc.nodes, ref.node) ? doc.nodes[ref.node] : undefined;
      if (!node) {
        problems.push({
          path: `${path}.node`,
          element,
          message: `The pipe's ${end === 'from' ? 'start' : 'end'} names node "${ref.node}", which is not in the project.`,
        });
        continue;
      }
      if (!hasPort(node, ref.port)) {
        problems.push({
          path: `${path}.port`,
          element,
          message: `The pipe's ${end === 'from' ? 'start' : 'end'} names port "${ref.port}" on ${nodeWords(doc, ref.node)}, which has no such port.`,
        });
        continue;
      }
      if (!isMultiPort(node, ref.port)) {
        const portKey = `${ref.node}\u0000${ref.port}`;
        const other = portUse.get(portKey);
        if (other !== undefined) {
          problems.push({
            path,
            element,
            message: `Port "${ref.port}" of ${nodeWords(doc, ref.node)} already has pipe ${other}; a port takes one pipe.`,
          });
        } else portUse.set(portKey, key);
      }
    }
    if (pipe.from.node === pipe.to.node) {
      problems.push({
        path: `pipes${pathKey(key)}.to.node`,
        element,
        message: 'The pipe starts and ends on the same node; a pipe must join two different nodes.',
      });
    }
  }

  for (const [key, route] of Object.entries(doc.routes)) {
    route.nodes.forEach((id, i) => {
      if (!Object.hasOwn(doc.nodes, id)) {
        problems.push({
          path: `routes${pathKey(key)}.nodes[${i}]`,
          element: recordWords(doc, 'routes', key),
          message: `The route passes node "${id}", which is not in the project.`,
        });
      }
    });
  }

  for (const [key, c] of Object.entries(doc.cases)) {
    for (const [field, kind] of CASE_NODE_GROUPS) {
      const map = c.overrides[field];
      if (!map) continue;
      for (const id of Object.keys(map)) {
        const node = Object.hasOwn(doc.nodes, id) ? doc.nodes[id] : undefined;
        if (!node || node.kind !== kind) {
          problems.push({
            path: `cases${pathKey(key)}.overrides.${field}${pathKey(id)}`,
            element: recordWords(doc, 'cases', key),
            message: `The case changes ${kind} "${id}", but there is no ${kind} with that id.`,
          });
        }
      }
    }
  }
  return problems;
}

/** True when `id` is free in the document */
export function isFreeId(doc: HeadrouteDocument, id: Id): boolean {
  return !idInUse(doc, id);
}
