/** The project-file format version this build writes; older versions are migrated on load. */
export const CURRENT_VERSION = 2;

/** The format tag every project file carries. */
export const FORMAT_TAG = 'headroute';
