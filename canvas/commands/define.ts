// A command is a pure function (sketch, args) → sketch, named for what the user does. It says
// whether it enters the undo history and, optionally, what to select afterwards. The store's
// `apply` is the only way a command changes the document.
import { produce, type Draft } from "immer";
import type { SketchFile } from "@/solver/schema";

export interface CommandDef<A> {
  /** camelCase name, e.g. "moveElement" */
  name: string;
  /** the undo history's words, e.g. "Move 3 elements" */
  label: (args: A, sketch: SketchFile) => string;
  /** false for changes that are not the user's edits (none yet: every command here is undoable) */
  undoable: boolean;
  /** true when the command puts a whole other sketch in place: applying, undoing or redoing it asks
   *  the canvas to fit the view, since the old zoom and pan may show nothing of the new drawing */
  replacesSketch?: boolean;
  run: (sketch: SketchFile, args: A) => SketchFile;
  /** the selection after the command, when it changes it (new elements, deleted ones) */
  select?: (before: SketchFile, after: SketchFile, args: A, selection: readonly string[]) => string[];
}

/** A command with its arguments, ready for `apply`. */
export interface Command<A = unknown> {
  def: CommandDef<A>;
  args: A;
}

/** Any command, whatever the type of its arguments (what the store accepts). */
export interface AnyCommand {
  def: CommandDef<never>;
  args: unknown;
}

export type CommandFactory<A> = ((args: A) => Command<A>) & { def: CommandDef<A>; run: CommandDef<A>["run"] };

export function defineCommand<A>(def: CommandDef<A>): CommandFactory<A> {
  const make = ((args: A) => ({ def, args })) as CommandFactory<A>;
  make.def = def;
  make.run = def.run;
  return make;
}

/** Run an immer recipe on a sketch (structural sharing keeps untouched elements identical). */
export function edit(sketch: SketchFile, recipe: (draft: Draft<SketchFile>) => void): SketchFile {
  return produce(sketch, recipe);
}

/** Apply a command to a sketch outside the store (tests, scripts). */
export function runCommand<A>(sketch: SketchFile, cmd: Command<A>): SketchFile {
  return cmd.def.run(sketch, cmd.args);
}

export const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
