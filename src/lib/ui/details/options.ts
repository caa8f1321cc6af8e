/** Option lists for the details pickers, in the words the user reads. */
import type { FittingType, LossMethod, ValveCharacteristic } from '../../model/types';

export const FITTING_TYPES: ReadonlyArray<readonly [FittingType, string]> = [
  ['elbow-90-standard', '90° elbow, standard'],
  ['elbow-90-long-radius', '90° elbow, long radius'],
  ['elbow-45-standard', '45° elbow, standard'],
  ['elbow-45-long-radius', '45° elbow, long radius'],
  ['tee-run', 'Tee, flow through run'],
  ['tee-branch', 'Tee, flow through branch'],
  ['gate-valve', 'Gate valve'],
  ['globe-valve', 'Globe valve'],
  ['ball-valve', 'Ball valve'],
  ['butterfly-valve', 'Butterfly valve'],
  ['swing-check-valve', 'Swing check valve'],
  ['lift-check-valve', 'Lift check valve'],
  ['strainer', 'Strainer'],
  ['flow-meter', 'Flow meter'],
  ['reducer', 'Reducer'],
  ['expander', 'Expander'],
  ['restriction-orifice', 'Restriction orifice'],
];

/** What a boundary holds. */
export const BOUNDARY_HOLDS: ReadonlyArray<readonly ['pressure' | 'flow', string]> = [
  ['pressure', 'Pressure (header)'],
  ['flow', 'Flow (draw-off)'],
];

export const LOSS_METHODS: ReadonlyArray<readonly [LossMethod, string]> = [
  ['fixed', 'Fixed K'],
  ['2K', '2-K (Hooper)'],
  ['3K', '3-K (Darby)'],
];

export const CHARACTERISTICS: ReadonlyArray<readonly [ValveCharacteristic, string]> = [
  ['linear', 'Linear'],
  ['equal-percentage', 'Equal percentage'],
  ['quick-opening', 'Quick opening'],
];

/** Fitting types that are manual valves (can be shut). */
export const SHUTTABLE = new Set<FittingType>([
  'gate-valve',
  'globe-valve',
  'ball-valve',
  'butterfly-valve',
]);
