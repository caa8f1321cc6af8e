/** Commands on stored routes (the nodes a profile passes, in order of flow). */
import { ID_PREFIX, nextId } from '../ids';
import { MAX_ROUTES } from '../file/limits';
import { RouteSchema } from '../file/schema';
import type { HeadrouteDocument, Id, Route } from '../types';
import type { Draft } from 'immer';
import type { Command } from './command';
import { validateRecord } from './check';
import { commandErrors } from './errors';

function checkRoute(draft: Draft<HeadrouteDocument>, route: Route) {
  if (route.nodes.length < 2) return commandErrors.routeTooShort(route.id);
  for (const node of route.nodes) {
    if (!Object.hasOwn(draft.nodes, node)) return commandErrors.nodeMissing(node);
  }
  return validateRecord(RouteSchema, route, route.id);
}

/** Store a route named `name` through `nodes` (at least two existing nodes). */
export function addRoute(name: string, nodes: readonly Id[]): Command {
  const command: Command = {
    label: 'Add route',
    run(draft) {
      command.created = [];
      if (Object.keys(draft.routes).length >= MAX_ROUTES) {
        return commandErrors.tooMany('routes', MAX_ROUTES);
      }
      const id = nextId(draft, ID_PREFIX.route);
      const route: Route = { id, name, nodes: [...nodes] };
      const invalid = checkRoute(draft, route);
      if (invalid) return invalid;
      draft.routes[id] = route;
      command.created = [id];
    },
  };
  return command;
}

/** Rename a stored route or change the nodes it passes. */
export function updateRoute(id: Id, patch: { name?: string; nodes?: readonly Id[] }): Command {
  return {
    label: 'Edit route',
    run(draft) {
      if (!Object.hasOwn(draft.routes, id)) return commandErrors.routeMissing(id);
      const old = draft.routes[id];
      const route: Route = {
        id,
        name: patch.name ?? old.name,
        nodes: patch.nodes ? [...patch.nodes] : [...old.nodes],
      };
      const invalid = checkRoute(draft, route);
      if (invalid) return invalid;
      if (patch.name !== undefined) old.name = patch.name;
      if (patch.nodes !== undefined) old.nodes = [...patch.nodes];
    },
  };
}

/** Delete a stored route. */
export function deleteRoute(id: Id): Command {
  return {
    label: 'Delete route',
    run(draft) {
      if (!Object.hasOwn(draft.routes, id)) return commandErrors.routeMissing(id);
      delete draft.routes[id];
    },
  };
}
