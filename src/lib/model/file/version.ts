/**
 * The project-file format version this build writes; older versions are migrated on load.
 * Every change to the file's shape, an added optional field included, bumps it
 * (see ./migrations.ts for what each version changed).
 */
export const CURRENT_VERSION = 3;

/** The format tag every project file carries. */
export const FORMAT_TAG = 'headroute';
