/** The project file: read (with migrations and validation) and write. */
export { parseProjectFile, type ParseResult } from './parse';
export { FORBIDDEN_KEYS, scanJsonText } from './textScan';
export { serializeProject, projectFileName } from './serialize';
export { MIGRATIONS, migrate, type Migration, type MigrationResult } from './migrations';
export { validateDocument, MAX_REPORTED_PROBLEMS, type ValidationResult } from './validate';
export { CURRENT_VERSION, FORMAT_TAG } from './version';
export * as limits from './limits';
