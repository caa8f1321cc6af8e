/** The document model: types, defaults, ports, commands, history and the project file. */
export type * from './types';
export {
  createDocument,
  createNode,
  createPipe,
  defaultSettings,
  STANDARD_ATMOSPHERE,
  ZERO_CELSIUS,
} from './defaults';
export { ID_PATTERN, ID_PREFIX, idInUse, nextId } from './ids';
export { NODE_KIND_LABEL, nodeLabel } from './labels';
export {
  portsOf,
  portElevation,
  portPosition,
  hasPort,
  isMultiPort,
  HUB_PORT,
  VESSEL_WIDTH,
  VESSEL_HEIGHT,
  INLINE_PORT_OFFSET,
  WAYPOINT_PORT_OFFSET,
  BOUNDARY_PORT_OFFSET,
} from './ports';
export { checkIntegrity, type DocumentProblem } from './integrity';
export { History, type HistoryStep } from './history';
export * from './commands/index';
export {
  parseProjectFile,
  serializeProject,
  projectFileName,
  validateDocument,
  CURRENT_VERSION,
  FORMAT_TAG,
  MIGRATIONS,
  type ParseResult,
} from './file/index';
export { EXAMPLES, exampleUrl, loadExample, type ExampleProject } from './examples';
