/** Size limits on a project file, so a hostile or broken file cannot exhaust the browser. */

/** Largest project file accepted, characters of JSON text (about 20 MB). */
export const MAX_FILE_CHARS = 20 * 1024 * 1024;
/** Most nodes plus pipes per document (project file limit) */
export const MAX_ELEMENTS = 20_000;
/** Most cases, and most stored routes, per document (project file limit) */
export const MAX_CASES = 500;
export const MAX_ROUTES = 500;
/** Longest name (document, node, pipe, case, route), characters. */
export const MAX_NAME_LENGTH = 200;
/** Longest short text field (catalogue size, schedule, material key, liquid id). */
export const MAX_SHORT_TEXT = 40;
/** Most points on one pump curve, nozzles on a vessel, rows in a liquid table. */
export const MAX_CURVE_POINTS = 50;
export const MAX_NOZZLES = 50;
export const MAX_TABLE_ROWS = 200;
/** Deepest nesting of objects and arrays in the JSON text. */
export const MAX_DEPTH = 16;
/** Largest magnitude of a sheet coordinate, sheet units, and of an elevation, m. */
export const MAX_COORDINATE = 1e7;
export const MAX_ELEVATION = 1e4;
/** Most lines in one pipe's fittings list, and most fittings on one line. */
export const MAX_PIPE_FITTING_LINES = 50;
export const MAX_FITTING_COUNT = 1000;
/** Most entries in one object or list of the file (the largest is a record collection). */
export const MAX_ENTRIES = MAX_ELEMENTS;
/**
 * Most objects and lists in the whole file. A file at the size limit written by Headroute holds
 * far fewer (each object takes tens of characters); a file of millions of tiny lists is refused
 * before `JSON.parse` builds them.
 */
export const MAX_CONTAINERS = 1_000_000;
