/** The one catalogue of command errors: stable codes and their messages. */
import type { CommandError } from './command';
import type { Id } from '../types';

function error(code: string, message: string, elements: Id[] = []): CommandError {
  return { code, message, elements };
}

/** Builders for every command error. */
export const commandErrors = {
  nodeMissing: (id: Id) => error('node-missing', `There is no node "${id}".`, [id]),
  pipeMissing: (id: Id) => error('pipe-missing', `There is no pipe "${id}".`, [id]),
  caseMissing: (id: Id) => error('case-missing', `There is no case "${id}".`, [id]),
  routeMissing: (id: Id) => error('route-missing', `There is no route "${id}".`, [id]),
  portMissing: (node: Id, label: string, port: string) =>
    error('port-missing', `${label} has no port "${port}".`, [node]),
  sameNode: (node: Id, label: string) =>
    error('same-node', `A pipe must join two different parts; both ends are on ${label}.`, [node]),
  portTaken: (node: Id, label: string, port: string, pipe: Id) =>
    error(
      'port-taken',
      `Port "${port}" of ${label} already has pipe ${pipe}; a port takes one pipe (only a junction takes several).`,
      [node, pipe],
    ),
  idTaken: (id: Id) => error('id-taken', `The id "${id}" is already used.`, [id]),
  fixedField: (id: Id, field: string) =>
    error('fixed-field', `The ${field} of "${id}" cannot be changed.`, [id]),
  invalid: (id: Id, message: string) => error('invalid-value', message, id ? [id] : []),
  nozzleInUse: (node: Id, label: string, nozzle: string, pipe: Id) =>
    error(
      'nozzle-in-use',
      `Nozzle "${nozzle}" of ${label} has pipe ${pipe}; delete or move the pipe before removing the nozzle.`,
      [node, pipe],
    ),
  routeTooShort: (id: Id) =>
    error('route-too-short', 'A route needs at least two nodes.', id ? [id] : []),
  tooMany: (what: string, limit: number) =>
    error('too-many', `The project cannot hold more than ${limit} ${what}.`),
  nothingToPaste: () => error('nothing-to-paste', 'There is nothing to paste.'),
};
