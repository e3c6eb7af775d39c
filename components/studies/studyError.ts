// What a study that could not run says: a sketch with input errors names them as the banner does
// (the element, the form's field and words), not by the file's paths; any other failure as it is.
import type { SketchFile } from "@/solver/schema";
import { inputErrorsInWords } from "@/components/results/errorPlace";
import { SketchInputError } from "@/canvas/studies/run";

/** "The sketch has an input error: Inlet p1: needs a mass flow: give mass flow ṁ, …", or the error's message. */
export function studyErrorWords(sketch: SketchFile | null, err: unknown): string {
  if (err instanceof SketchInputError) {
    const said = inputErrorsInWords(sketch, err.fields);
    if (said) return `The sketch has ${said.words}.`;
  }
  return err instanceof Error ? err.message : String(err);
}
