/**
 * Migrations of older project files, one version step at a time, on raw JSON before the
 * schema sees it. Add-only: never edit a published step; add the next one.
 *
 * Version 0 is the pre-release draft format, written only by development builds before the
 * first release. It differed from version 1 in these ways:
 * - `nodes` and `pipes` were arrays of records instead of objects keyed by id;
 * - a node's elevation was called `elevation` (now `z`);
 * - a pipe had a typed `innerDiameter` in metres (now `bore`), no `kind`, and no design pressure;
 * - `settings.liquid` was a library id string and the temperature was `temperatureC`, in °C;
 * - there was no typed atmospheric pressure, NPSH margin or velocity guidance in the settings;
 * - there were no cases or stored routes.
 */
import { defaultSettings, ZERO_CELSIUS } from '../defaults';
import type { DocumentProblem } from '../integrity';

type Json = Record<string, unknown>;

/** Outcome of one migration step. */
export type MigrationResult = { ok: true; value: Json } | { ok: false; errors: DocumentProblem[] };

/** One step from version `from` to `from + 1`. */
export interface Migration {
  from: number;
  to: number;
  description: string;
  migrate(raw: Json): MigrationResult;
}

function isObject(value: unknown): value is Json {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** Turn a list of records into an object keyed by their ids, reporting clashes. */
function keyById(
  list: unknown,
  collection: string,
  errors: DocumentProblem[],
  convert: (record: Json) => Json,
): unknown {
  if (!Array.isArray(list)) return list;
  const out: Json = {};
  list.forEach((record, i) => {
    const key = isObject(record) && typeof record.id === 'string' ? record.id : `#${i + 1}`;
    if (Object.hasOwn(out, key)) {
      errors.push({
        path: `${collection}[${i}].id`,
        element: `${collection.slice(0, -1)} ${key}`,
        message: `Two ${collection} have the id "${key}"; ids must be unique.`,
      });
      return;
    }
    out[key] = isObject(record) ? convert(record) : record;
  });
  return out;
}

const draftToV1: Migration = {
  from: 0,
  to: 1,
  description: 'pre-release draft format → version 1',
  migrate(raw) {
    const errors: DocumentProblem[] = [];
    const defaults = defaultSettings();
    const old = isObject(raw.settings) ? raw.settings : {};
    const { temperatureC, ...restSettings } = old;
    const settings: Json = {
      ...restSettings,
      liquid: typeof old.liquid === 'string' ? { kind: 'library', id: old.liquid } : old.liquid,
      temperature: typeof temperatureC === 'number' ? temperatureC + ZERO_CELSIUS : temperatureC,
      atmosphericPressureOverride: old.atmosphericPressureOverride ?? null,
      npshMargin: old.npshMargin ?? defaults.npshMargin,
      velocityGuidance: old.velocityGuidance ?? defaults.velocityGuidance,
    };
    const nodes = keyById(raw.nodes, 'nodes', errors, (node) => {
      const { elevation, ...rest } = node;
      return { ...rest, z: elevation };
    });
    const pipes = keyById(raw.pipes, 'pipes', errors, (pipe) => {
      const { innerDiameter, ...rest } = pipe;
      return {
        ...rest,
        kind: 'pipe',
        bore: { mode: 'typed', innerDiameter },
        roughness: rest.roughness ?? null,
        designPressureGauge: null,
      };
    });
    if (errors.length > 0) return { ok: false, errors };
    return {
      ok: true,
      value: { ...raw, version: 1, settings, nodes, pipes, cases: {}, routes: {} },
    };
  },
};

/**
 * Version 2 adds optional fields only: a pipe's fittings list (`fittings`), a pump's suction
 * and discharge flange elevations, a branch point's draw-off (`outflow`), and the case
 * overrides `valves` (manual valves open or shut) and `junctions` (a branch point's draw-off).
 * A version 1 file has none of them, which means: no fittings on any pipe, both flanges at the
 * pump's z, no draw-offs at branch points, and cases that change none of these.
 */
const v1ToV2: Migration = {
  from: 1,
  to: 2,
  description: 'version 1 → 2: fittings on pipes, pump flange elevations, branch-point draw-offs',
  migrate(raw) {
    return { ok: true, value: { ...raw, version: 2 } };
  },
};

/**
 * Version 2 → 3. Version 3 is the first strict version: a key the schema does not know is
 * refused with its path, not dropped. It also records, with a version of their own, fields
 * that builds writing version 1 had added without a bump:
 * - a boundary's `holds` ('pressure' | 'flow'; absent means 'pressure') and `outflow` (m³/s);
 * - a case's `overrides.boundaries` (a boundary's `pressureAbs` or `outflow`).
 * A version 1 or 2 file may carry them (written by those builds) or not (older ones); both
 * read the same in version 3, so the step only stamps the version. An older file with any other
 * key unknown to version 3 is refused by the strict schema after this step, as a version-3
 * file is.
 */
const v2ToV3: Migration = {
  from: 2,
  to: 3,
  description: 'version 2 → 3: strict keys; boundary holds/outflow and case boundary overrides',
  migrate(raw) {
    return { ok: true, value: { ...raw, version: 3 } };
  },
};

/** All migrations, in order; `MIGRATIONS[i]` upgrades version i to i + 1. */
export const MIGRATIONS: readonly Migration[] = [draftToV1, v1ToV2, v2ToV3];

/** Upgrade `raw` from `version` to the newest version, one step at a time. */
export function migrate(raw: Json, version: number): MigrationResult {
  let value = raw;
  for (let v = version; v < MIGRATIONS.length; v++) {
    const step = MIGRATIONS[v];
    const result = step.migrate(value);
    if (!result.ok) return result;
    value = result.value;
  }
  return { ok: true, value };
}
