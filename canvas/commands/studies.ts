// Editing the studies kept in the sketch file (format version 2): operating cases, combinations,
// saved sweeps and the required factors of safety.
import type { SketchFile } from "@/solver/schema";
import { defineCommand, edit } from "./define";

type StudyKey = "cases" | "combinations" | "sweeps" | "stability";

const WORDS: Record<StudyKey, string> = {
  cases: "the operating cases",
  combinations: "the combinations",
  sweeps: "the saved sweeps",
  stability: "the required factors of safety",
};

export const setStudy = defineCommand<{ key: StudyKey; value: SketchFile[StudyKey] | undefined }>({
  name: "setStudy",
  label: ({ key }) => `Change ${WORDS[key]}`,
  undoable: true,
  run: (sketch, { key, value }) =>
    edit(sketch, (d) => {
      const empty = value === undefined || (Array.isArray(value) && value.length === 0);
      if (empty) delete (d as Record<string, unknown>)[key];
      else (d as Record<string, unknown>)[key] = value;
    }),
});
