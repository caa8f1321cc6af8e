/** Every document edit, as command factories. Apply them with `applyCommand` or `History`. */
export { applyCommand, type ApplyResult, type Command, type CommandError } from './command';
export { commandErrors } from './errors';
export { pipeOnPort, checkConnection } from './check';
export {
  addNode,
  moveNodes,
  setNodePosition,
  updateNode,
  deleteElements,
  type NodePatch,
} from './nodes';
export { connect, updatePipe, type PipePatch } from './pipes';
export { copyElements, pasteElements, duplicateElements, type Clip } from './clipboard';
export { addCase, renameCase, duplicateCase, deleteCase, updateCaseOverrides } from './cases';
export { addRoute, updateRoute, deleteRoute } from './routes';
export { updateSettings, renameDocument } from './project';
export { importSurvey } from './survey';
export { setRunBore } from './runBore';
