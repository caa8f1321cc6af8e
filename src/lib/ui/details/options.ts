/** Option lists for the details pickers, in the words the user reads. */
import { FITTING_TYPE_NAMES } from '../../model/labels';
import type { FittingType, LossMethod, ValveCharacteristic } from '../../model/types';

/** Fitting types in words, in picker order (the one list is in model/labels.ts). */
export const FITTING_TYPES = FITTING_TYPE_NAMES;

/** What a header / draw-off holds (the file's boundary kind). */
export const BOUNDARY_HOLDS: ReadonlyArray<readonly ['pressure' | 'flow', string]> = [
  ['pressure', 'Fixed pressure (header)'],
  ['flow', 'Fixed flow (draw-off / supply)'],
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
