/** The project file: read (with migrations and validation) and write. */
export { parseProjectFile, FORBIDDEN_KEYS, type ParseResult } from './parse';
export { serializeProject, projectFileName } from './serialize';
export { MIGRATIONS, migrate, type Migration, type MigrationResult } from './migrations';
export { validateDocument, MAX_REPORTED_PROBLEMS, type ValidationResult } from './validate';
export { CURRENT_VERSION, FORMAT_TAG } from './version';
export * as limits from './limits';
