// Every command the editor applies. Each is a pure (sketch, args) → sketch named for what the user does.
export { defineCommand, runCommand, type AnyCommand, type Command, type CommandDef, type CommandFactory } from "./define";
export { addElement, attachToBody, deleteElements, duplicateElements, newIds, pasteElements, planDuplicate } from "./elements";
export { moveElement, moveCentreOfGravity, shiftElement, bodyOf, type ValueOf, type MoveArgs } from "./move";
export { mirrorElements, mirrorLine, mirroredIds, type MirrorAxis, type MirrorArgs } from "./mirror";
export { rotateElement, reshapeBody, setOutline, insertCorner, removeCorner, type RotateArgs, type ReshapeArgs } from "./shape";
export {
  setField,
  setForceForm,
  setSketchField,
  setMotion,
  setParameter,
  deleteParameter,
  renameParameter,
  replaceSketch,
  type FieldPath,
  type FieldValue,
} from "./fields";
