/**
 * The fitting types and loss methods the fittings library knows. Physics owns them; the
 * document (model/types.ts) re-exports them.
 */

/** Fitting types known to the loss library. */
export type FittingType =
  | 'elbow-90-standard'
  | 'elbow-90-long-radius'
  | 'elbow-45-standard'
  | 'elbow-45-long-radius'
  | 'tee-run'
  | 'tee-branch'
  | 'gate-valve'
  | 'globe-valve'
  | 'ball-valve'
  | 'butterfly-valve'
  | 'swing-check-valve'
  | 'lift-check-valve'
  | 'strainer'
  | 'flow-meter'
  | 'reducer'
  | 'expander'
  | 'restriction-orifice';

/** How a fitting's loss coefficient is found. */
export type LossMethod = 'fixed' | '2K' | '3K';
