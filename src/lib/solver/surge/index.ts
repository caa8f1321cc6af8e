/**
 * Surge screening: a valve closure or a pump trip along a route, by the method of
 * characteristics with steady friction and discrete vapour cavities.
 */
export { runSurge } from './run';
export * from './types';
export { isClosableValve } from './line';
