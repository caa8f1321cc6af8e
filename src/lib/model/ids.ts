/**
 * Element identifiers. Ids are short tags ("P1", "L12") unique across the whole document,
 * chosen deterministically from the document so a command gives the same ids every time it
 * runs on the same document (which keeps patches replayable and tests repeatable).
 */
import type { HeadrouteDocument, Id, NodeKind } from './types';

/** What an id may look like: a letter or digit first, then letters, digits, '_', '-', '.'. */
export const ID_PATTERN = /^[A-Za-z0-9][A-Za-z0-9_.-]{0,63}$/;

/** Tag prefix for each kind of element (process-diagram style tags). */
export const ID_PREFIX: Record<NodeKind | 'pipe' | 'case' | 'route', string> = {
  vessel: 'V',
  pump: 'P',
  fitting: 'F',
  'control-valve': 'CV',
  waypoint: 'W',
  junction: 'J',
  boundary: 'B',
  pipe: 'L',
  case: 'C',
  route: 'R',
};

/** True when `id` is used by any node, pipe, case or route of the document */
export function idInUse(doc: HeadrouteDocument, id: Id): boolean {
  return (
    Object.hasOwn(doc.nodes, id) ||
    Object.hasOwn(doc.pipes, id) ||
    Object.hasOwn(doc.cases, id) ||
    Object.hasOwn(doc.routes, id)
  );
}

/**
 * The next free id for `prefix`: one more than the highest number already used with that
 * prefix, skipping any id in `reserved` (ids handed out earlier in the same command).
 */
export function nextId(
  doc: HeadrouteDocument,
  prefix: string,
  reserved: ReadonlySet<Id> = new Set(),
): Id {
  const pattern = new RegExp(`^${prefix}(\\d+)$`);
  let highest = 0;
  for (const collection of [doc.nodes, doc.pipes, doc.cases, doc.routes]) {
    for (const id of Object.keys(collection)) {
      const m = pattern.exec(id);
      if (m) highest = Math.max(highest, Number(m[1]));
    }
  }
  for (const id of reserved) {
    const m = pattern.exec(id);
    if (m) highest = Math.max(highest, Number(m[1]));
  }
  let n = highest + 1;
  while (idInUse(doc, `${prefix}${n}`) || reserved.has(`${prefix}${n}`)) n++;
  return `${prefix}${n}`;
}
