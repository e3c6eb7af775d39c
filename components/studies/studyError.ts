// What a study that could not run says: a sketch with input errors names them as the banner does
// (the element, the form's field and words), not by the file's paths; any other failure as it is.
import type { SketchFile } from "@/solver/schema";
import { inputErrorsInWords } from "@/components/results/errorPlace";
import { SketchInputError } from "@/canvas/studies/run";
import type { FieldError } from "@/solver/types";

/** A run of "In every case" that could not be searched: its input errors in the form's words
 *  ("Case Storm — change of v: has no unit; …"), or the message as it came. */
export function runErrorWords(sketch: SketchFile | null, result: { error: string; fields?: FieldError[] }): string {
  const said = result.fields ? inputErrorsInWords(sketch, result.fields) : null;
  return said ? said.words : result.error;
}

/** "The sketch has an input error: Inlet p1: needs a mass flow: give mass flow ṁ, …", or the error's
 *  message; a case or combination that does not read, by its name: "In case Storm, the sketch has
 *  an input error: Case Storm — change of v: has no unit; …". */
export function studyErrorWords(sketch: SketchFile | null, err: unknown): string {
  if (err instanceof SketchInputError) {
    const said = inputErrorsInWords(sketch, err.fields);
    // a case's own change that does not read names the case already ("Case Storm — change of v")
    const named = err.fields.some((f) => f.path.startsWith("cases[") || f.path.startsWith("combinations["));
    if (said) return err.on && !named ? `In ${err.on}, the sketch has ${said.words}.` : `The sketch has ${said.words}.`;
  }
  return err instanceof Error ? err.message : String(err);
}
