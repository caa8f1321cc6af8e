/**
 * The valibot schema of the document (current version). It checks shapes, types, finite numbers,
 * signs and sizes; links between records (pipe ends, route nodes, case targets) are checked by
 * ../integrity.ts after this schema passes.
 */
import * as v from 'valibot';
import { ID_PATTERN } from '../ids';
import {
  MAX_CASES,
  MAX_COORDINATE,
  MAX_CURVE_POINTS,
  MAX_ELEVATION,
  MAX_NAME_LENGTH,
  MAX_NOZZLES,
  MAX_ROUTES,
  MAX_SHORT_TEXT,
  MAX_TABLE_ROWS,
  MAX_ELEMENTS,
  MAX_FITTING_COUNT,
  MAX_PIPE_FITTING_LINES,
} from './limits';
import { CURRENT_VERSION } from './version';
import type {
  Case,
  HeadrouteDocument,
  Pipe,
  PipeFittingType,
  ProjectSettings,
  Route,
  SheetNode,
} from '../types';

const finite = v.pipe(v.number(), v.finite());
const positive = v.pipe(v.number(), v.finite(), v.gtValue(0));
const nonNegative = v.pipe(v.number(), v.finite(), v.minValue(0));
const fraction = v.pipe(v.number(), v.finite(), v.minValue(0), v.maxValue(1));
const coordinate = v.pipe(
  v.number(),
  v.finite(),
  v.minValue(-MAX_COORDINATE),
  v.maxValue(MAX_COORDINATE),
);
const elevation = v.pipe(
  v.number(),
  v.finite(),
  v.minValue(-MAX_ELEVATION),
  v.maxValue(MAX_ELEVATION),
);
const name = v.pipe(v.string(), v.maxLength(MAX_NAME_LENGTH));
const shortText = v.pipe(v.string(), v.minLength(1), v.maxLength(MAX_SHORT_TEXT));

/** An element id. */
export const IdSchema = v.pipe(v.string(), v.regex(ID_PATTERN));

const isPlainObject = (value: unknown): value is Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

/** Records keyed by id (an object, never a list), with at most `max` entries. */
function recordOf<TValue extends v.GenericSchema>(value: TValue, max: number) {
  return v.pipe(
    v.custom<Record<string, unknown>>(isPlainObject),
    v.record(IdSchema, value),
    v.maxEntries(max),
  );
}

const portRef = v.strictObject({ node: IdSchema, port: IdSchema });

const nodeBase = { id: IdSchema, name, x: coordinate, y: coordinate, z: elevation };

const nozzle = v.strictObject({
  id: IdSchema,
  z: elevation,
  entranceK: nonNegative,
  exitK: nonNegative,
  side: v.optional(v.picklist(['left', 'right'])),
});

const pumpPoint = v.strictObject({ flow: nonNegative, value: nonNegative });
const curve = (min: number) =>
  v.pipe(v.array(pumpPoint), v.minLength(min), v.maxLength(MAX_CURVE_POINTS));

const VesselSchema = v.strictObject({
  ...nodeBase,
  kind: v.literal('vessel'),
  open: v.boolean(),
  gasPressureAbs: positive,
  liquidLevel: elevation,
  height: nonNegative,
  nozzles: v.pipe(v.array(nozzle), v.minLength(1), v.maxLength(MAX_NOZZLES)),
});

const PumpSchema = v.strictObject({
  ...nodeBase,
  kind: v.literal('pump'),
  headCurve: curve(1),
  npshrCurve: curve(0),
  efficiencyCurve: v.pipe(
    v.array(v.strictObject({ flow: nonNegative, value: fraction })),
    v.maxLength(MAX_CURVE_POINTS),
  ),
  ratedSpeed: positive,
  speed: positive,
  running: v.boolean(),
  mode: v.picklist(['rating', 'duty']),
  dutyFlow: nonNegative,
  suctionElevation: v.optional(elevation),
  dischargeElevation: v.optional(elevation),
});

/** Fitting types known to the loss library. */
export const FITTING_TYPES = [
  'elbow-90-standard',
  'elbow-90-long-radius',
  'elbow-45-standard',
  'elbow-45-long-radius',
  'tee-run',
  'tee-branch',
  'gate-valve',
  'globe-valve',
  'ball-valve',
  'butterfly-valve',
  'swing-check-valve',
  'lift-check-valve',
  'strainer',
  'flow-meter',
  'reducer',
  'expander',
  'restriction-orifice',
] as const;

const FittingSchema = v.strictObject({
  ...nodeBase,
  kind: v.literal('fitting'),
  fittingType: v.picklist(FITTING_TYPES),
  lossMethod: v.picklist(['fixed', '2K', '3K']),
  fixedK: nonNegative,
  closed: v.boolean(),
  inletDiameter: v.optional(positive),
  outletDiameter: v.optional(positive),
  coneAngle: v.optional(v.pipe(v.number(), v.finite(), v.gtValue(0), v.maxValue(180))),
  boreDiameter: v.optional(positive),
});

const ControlValveSchema = v.strictObject({
  ...nodeBase,
  kind: v.literal('control-valve'),
  ratedCoefficient: positive,
  coefficientUnit: v.picklist(['Kv', 'Cv']),
  characteristic: v.picklist(['linear', 'equal-percentage', 'quick-opening']),
  rangeability: v.pipe(v.number(), v.finite(), v.gtValue(1)),
  opening: fraction,
  pressureRecoveryFactor: v.pipe(v.number(), v.finite(), v.gtValue(0), v.maxValue(1)),
});

const WaypointSchema = v.strictObject({ ...nodeBase, kind: v.literal('waypoint') });
const JunctionSchema = v.strictObject({
  ...nodeBase,
  kind: v.literal('junction'),
  outflow: v.optional(finite),
});
const BoundarySchema = v.strictObject({
  ...nodeBase,
  kind: v.literal('boundary'),
  pressureAbs: positive,
  holds: v.optional(v.picklist(['pressure', 'flow'])),
  outflow: v.optional(finite),
});

/** Any node, told apart by `kind`. */
export const NodeSchema = v.variant('kind', [
  VesselSchema,
  PumpSchema,
  FittingSchema,
  ControlValveSchema,
  WaypointSchema,
  JunctionSchema,
  BoundarySchema,
]);

const bore = v.variant('mode', [
  v.strictObject({ mode: v.literal('catalogue'), nominalSize: shortText, schedule: shortText }),
  v.strictObject({ mode: v.literal('typed'), innerDiameter: positive }),
]);

/** Fitting types a pipe's fittings list may carry (see PipeFittingType). */
export const PIPE_FITTING_TYPES = FITTING_TYPES.filter(
  (t): t is PipeFittingType =>
    t !== 'reducer' &&
    t !== 'expander' &&
    t !== 'restriction-orifice' &&
    t !== 'swing-check-valve' &&
    t !== 'lift-check-valve',
);

const pipeFittingItem = v.strictObject({
  fittingType: v.picklist(PIPE_FITTING_TYPES),
  count: v.pipe(v.number(), v.integer(), v.minValue(1), v.maxValue(MAX_FITTING_COUNT)),
  lossMethod: v.picklist(['fixed', '2K', '3K']),
  fixedK: nonNegative,
});

const pipeFittings = v.strictObject({
  items: v.pipe(v.array(pipeFittingItem), v.maxLength(MAX_PIPE_FITTING_LINES)),
  lumpedK: nonNegative,
  place: v.picklist(['inlet', 'outlet', 'spread', 'chainage']),
  chainage: v.optional(nonNegative),
});

/** A pipe record. */
export const PipeSchema = v.strictObject({
  id: IdSchema,
  kind: v.literal('pipe'),
  name,
  from: portRef,
  to: portRef,
  length: positive,
  bore,
  material: shortText,
  roughness: v.nullable(nonNegative),
  designPressureGauge: v.nullable(finite),
  fittings: v.optional(pipeFittings),
});

const userLiquidRow = v.strictObject({
  temperature: positive,
  density: positive,
  viscosity: positive,
  vapourPressure: nonNegative,
});

const liquid = v.variant('kind', [
  v.strictObject({ kind: v.literal('library'), id: shortText }),
  v.strictObject({
    kind: v.literal('user'),
    name,
    table: v.pipe(v.array(userLiquidRow), v.minLength(1), v.maxLength(MAX_TABLE_ROWS)),
    criticalPressure: v.optional(positive),
  }),
]);

/** Project settings. */
export const SettingsSchema = v.strictObject({
  liquid,
  temperature: positive,
  siteElevation: elevation,
  atmosphericPressureOverride: v.nullable(positive),
  unitSystem: v.picklist(['SI', 'US']),
  npshMargin: v.strictObject({
    ratio: v.pipe(v.number(), v.finite(), v.minValue(1)),
    metres: nonNegative,
  }),
  velocityGuidance: v.strictObject({
    suctionMax: positive,
    dischargeMin: nonNegative,
    dischargeMax: positive,
  }),
});

const overrides = v.strictObject({
  liquid: v.optional(liquid),
  temperature: v.optional(positive),
  atmosphericPressure: v.optional(positive),
  vessels: v.optional(
    v.record(
      IdSchema,
      v.strictObject({ liquidLevel: v.optional(elevation), gasPressureAbs: v.optional(positive) }),
    ),
  ),
  pumps: v.optional(
    v.record(
      IdSchema,
      v.strictObject({
        running: v.optional(v.boolean()),
        speed: v.optional(positive),
        mode: v.optional(v.picklist(['rating', 'duty'])),
        dutyFlow: v.optional(nonNegative),
      }),
    ),
  ),
  controlValves: v.optional(v.record(IdSchema, v.strictObject({ opening: v.optional(fraction) }))),
  boundaries: v.optional(
    v.record(
      IdSchema,
      v.strictObject({ pressureAbs: v.optional(positive), outflow: v.optional(finite) }),
    ),
  ),
  valves: v.optional(v.record(IdSchema, v.strictObject({ closed: v.optional(v.boolean()) }))),
  junctions: v.optional(v.record(IdSchema, v.strictObject({ outflow: v.optional(finite) }))),
});

/** A case (named overrides). */
export const CaseSchema = v.strictObject({ id: IdSchema, name, overrides });

/** A stored route. */
export const RouteSchema = v.strictObject({
  id: IdSchema,
  name,
  nodes: v.pipe(v.array(IdSchema), v.minLength(2), v.maxLength(MAX_ELEMENTS)),
});

/** The whole document, current version. */
export const DocumentSchema = v.strictObject({
  format: v.literal('headroute'),
  version: v.literal(CURRENT_VERSION),
  name,
  settings: SettingsSchema,
  nodes: recordOf(NodeSchema, MAX_ELEMENTS),
  pipes: recordOf(PipeSchema, MAX_ELEMENTS),
  cases: recordOf(CaseSchema, MAX_CASES),
  routes: recordOf(RouteSchema, MAX_ROUTES),
});

// Compile-time check that the schema's output is the contract's document type (both ways).
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
const _nodeMatches: Same<v.InferOutput<typeof NodeSchema>, SheetNode> = true;
const _pipeMatches: Same<v.InferOutput<typeof PipeSchema>, Pipe> = true;
const _settingsMatch: Same<v.InferOutput<typeof SettingsSchema>, ProjectSettings> = true;
const _caseMatches: Same<v.InferOutput<typeof CaseSchema>, Case> = true;
const _routeMatches: Same<v.InferOutput<typeof RouteSchema>, Route> = true;
const _docMatches: [v.InferOutput<typeof DocumentSchema>] extends [
  Omit<HeadrouteDocument, 'format' | 'version'> & { format: 'headroute'; version: number },
]
  ? true
  : false = true;
