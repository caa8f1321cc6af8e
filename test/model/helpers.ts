import { expect } from 'vitest';
import { applyPatches } from 'immer';
import { addNode, applyCommand, connect, type Command } from '../../src/lib/model/commands';
import { createDocument } from '../../src/lib/model/defaults';
import { validateDocument } from '../../src/lib/model/file/validate';
import type { HeadrouteDocument } from '../../src/lib/model/types';

/** Apply a command that must succeed; checks its patches replay and reverse, and validity. */
export function ok(doc: HeadrouteDocument, command: Command) {
  const result = applyCommand(doc, command);
  if (!result.ok) throw new Error(`${command.label} failed: ${result.error.message}`);
  expect(applyPatches(doc, result.patches)).toEqual(result.doc);
  expect(applyPatches(result.doc, result.inversePatches)).toEqual(doc);
  const valid = validateDocument(result.doc);
  if (!valid.ok) throw new Error(JSON.stringify(valid.errors));
  return result;
}

/** Apply a command that must be refused; returns its error and checks nothing changed. */
export function refused(doc: HeadrouteDocument, command: Command) {
  const result = applyCommand(doc, command);
  if (result.ok) throw new Error(`${command.label} was expected to fail`);
  return result.error;
}

/** Apply commands that must succeed, one after another. */
export function build(doc: HeadrouteDocument, ...commands: Command[]): HeadrouteDocument {
  for (const command of commands) {
    const result = applyCommand(doc, command);
    if (!result.ok) throw new Error(`${command.label} failed: ${result.error.message}`);
    doc = result.doc;
  }
  return doc;
}

/** A small document: tank V1 → pipe L1 → pump P1 → pipe L2 → tank V2, and junction J1 alone. */
export function sampleDocument(): HeadrouteDocument {
  return build(
    createDocument('Sample'),
    addNode('vessel', { x: 0, y: 0 }),
    addNode('pump', { x: 200, y: 0 }),
    addNode('vessel', { x: 400, y: 0 }),
    addNode('junction', { x: 200, y: 200 }),
    connect({ node: 'V1', port: 'N1' }, { node: 'P1', port: 'suction' }),
    connect({ node: 'P1', port: 'discharge' }, { node: 'V2', port: 'N2' }),
  );
}
