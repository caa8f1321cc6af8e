/**
 * Importing a surveyed profile onto a pipe, or onto the run of pipes through waypoints that the
 * pipe belongs to: the run's pipes and interior waypoints give way to one waypoint for each
 * surveyed point kept by the thinning (every high and low point exactly) and one pipe between
 * each two, whose length is the developed length of the survey between them.
 */
import { createNode, createPipe } from '../defaults';
import { MAX_ELEMENTS } from '../file/limits';
import { NodeSchema, PipeSchema } from '../file/schema';
import { ID_PREFIX, idInUse, nextId } from '../ids';
import { portPosition } from '../ports';
import { simplifyProfile } from '../survey/simplifyProfile';
import type { SurveyPoint } from '../survey/parseSurvey';
import { pipeRun } from '../pipeRun';
import type { HeadrouteDocument, Id, Pipe, PipeFittings, PortRef, SheetNode } from '../types';
import type { Command } from './command';
import { assignPatch, plain, validateRecord } from './check';
import { commandErrors } from './errors';
import { forgetNodes } from './nodes';

/** Hands out fresh ids for one prefix: one scan of the document, then counting up. */
function idCounter(doc: HeadrouteDocument, prefix: string): () => Id {
  const first = nextId(doc, prefix);
  let n = Number(first.slice(prefix.length));
  return () => {
    let id = `${prefix}${n++}`;
    while (idInUse(doc, id)) id = `${prefix}${n++}`;
    return id;
  };
}

/** Developed (slope) length of the survey between points a and b, m. */
function developedLength(points: readonly SurveyPoint[], a: number, b: number): number {
  let length = 0;
  for (let k = a; k < b; k++) {
    length += Math.hypot(
      points[k + 1].chainage - points[k].chainage,
      points[k + 1].elevation - points[k].elevation,
    );
  }
  return length;
}

/** Pipe fields that stay with each new piece (all but identity, ends, length and fittings). */
function pipeTemplate(pipe: Pipe): Record<string, unknown> {
  const {
    id: _id,
    name: _name,
    from: _from,
    to: _to,
    length: _length,
    fittings: _fittings,
    ...rest
  } = plain(pipe);
  return structuredClone(rest) as Record<string, unknown>;
}

/**
 * The fittings of every pipe of the run, gathered for the first new pipe: all items, the
 * lumped Ks added, acting where the selected pipe's act (spread along it where that was one
 * chainage, which no longer means the same place). Undefined when the run had none.
 */
export function runFittings(pipes: readonly Pipe[], selected: Pipe): PipeFittings | undefined {
  const lists = pipes.map((p) => p.fittings).filter((f): f is PipeFittings => f !== undefined);
  if (lists.length === 0) return undefined;
  const place = selected.fittings?.place ?? lists[0].place;
  return {
    items: lists.flatMap((f) => f.items.map((i) => ({ ...i }))),
    lumpedK: lists.reduce((sum, f) => sum + f.lumpedK, 0),
    place: place === 'chainage' ? 'spread' : place,
  };
}

/**
 * Lay a surveyed profile onto the run of `pipeId` (see `pipeRun`). `points` start at chainage 0
 * at the run's start; they are thinned by `simplifyProfile` with `tolerance` metres. The run's
 * end parts keep their own elevations. The first new pipe keeps `pipeId` and its name, and
 * carries the run's fittings (`runFittings`); each pipe takes the selected pipe's bore,
 * material, roughness and design pressure.
 */
export function importSurvey(
  pipeId: Id,
  points: readonly SurveyPoint[],
  tolerance: number,
): Command {
  const command: Command = {
    label: 'Import surveyed profile',
    run(draft) {
      command.created = [];
      if (!Object.hasOwn(draft.pipes, pipeId)) return commandErrors.pipeMissing(pipeId);
      if (points.length < 2)
        return commandErrors.invalid(pipeId, 'A survey needs at least two points.');
      if (!(tolerance >= 0) || !Number.isFinite(tolerance)) {
        return commandErrors.invalid(pipeId, 'The thinning tolerance must be zero or more metres.');
      }
      const doc = draft as unknown as HeadrouteDocument;
      const run = pipeRun(doc, pipeId);
      if (!run) {
        return commandErrors.invalid(
          pipeId,
          'This pipe lies on a ring of waypoints with no other part; a survey needs a start and an end.',
        );
      }
      const kept = simplifyProfile(points, tolerance);
      const interior = kept.length - 2;
      const count = Object.keys(draft.nodes).length + Object.keys(draft.pipes).length;
      const after = count - run.pipes.length - run.waypoints.length + interior * 2 + 1;
      if (after > MAX_ELEMENTS) return commandErrors.tooMany('elements', MAX_ELEMENTS);

      const template = pipeTemplate(draft.pipes[pipeId]);
      const fittings = runFittings(
        run.pipes.map((id) => plain(draft.pipes[id]) as Pipe),
        plain(draft.pipes[pipeId]) as Pipe,
      );
      const name = draft.pipes[pipeId].name;
      const removed = new Set(run.waypoints);
      for (const id of run.pipes) delete draft.pipes[id];
      for (const id of run.waypoints) delete draft.nodes[id];
      forgetNodes(draft, removed);

      const a = portPosition(plain(draft.nodes[run.start.node]) as SheetNode, run.start.port);
      const b = portPosition(plain(draft.nodes[run.end.node]) as SheetNode, run.end.port);
      const total = points[points.length - 1].chainage;
      const created: Id[] = [];
      const waypointId = idCounter(doc, ID_PREFIX.waypoint);
      const pipeIdNext = idCounter(doc, ID_PREFIX.pipe);
      let from: PortRef = run.start;
      for (let k = 1; k < kept.length; k++) {
        const last = k === kept.length - 1;
        let to: PortRef = run.end;
        if (!last) {
          const p = points[kept[k]];
          const t = p.chainage / total;
          const id = waypointId();
          const node = createNode(
            'waypoint',
            { x: a.x + (b.x - a.x) * t, y: a.y + (b.y - a.y) * t },
            id,
            draft.settings.unitSystem,
          ) as unknown as Record<string, unknown>;
          node.z = p.elevation;
          const invalid = validateRecord(NodeSchema, node, id);
          if (invalid) return invalid;
          draft.nodes[id] = node as unknown as SheetNode;
          created.push(id);
          to = { node: id, port: 'in' };
        }
        const id = k === 1 ? pipeId : pipeIdNext();
        const pipe = createPipe(from, to, id, draft.settings.unitSystem) as unknown as Record<
          string,
          unknown
        >;
        assignPatch(pipe, {
          ...structuredClone(template),
          name: k === 1 ? name : id,
          length: developedLength(points, kept[k - 1], kept[k]),
          ...(k === 1 && fittings ? { fittings: structuredClone(fittings) } : {}),
        });
        const invalid = validateRecord(PipeSchema, pipe, id);
        if (invalid) return invalid;
        draft.pipes[id] = pipe as unknown as Pipe;
        if (k !== 1) created.push(id);
        if (!last) from = { node: to.node, port: 'out' };
      }
      command.created = created;
    },
  };
  return command;
}
