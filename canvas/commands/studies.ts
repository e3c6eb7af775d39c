// Editing the studies kept in the sketch file (format version 2): operating cases, combinations,
// saved sweeps and the required factors of safety.
import type { SketchFile } from "@/solver/schema";
import type { Draft } from "immer";
import { defineCommand, edit } from "./define";

type StudyKey = "cases" | "combinations" | "sweeps" | "stability";

const WORDS: Record<StudyKey, string> = {
  cases: "the operating cases",
  combinations: "the combinations",
  sweeps: "the saved sweeps",
  stability: "the required factors of safety",
};

/** Put a study list or setting in the draft; an empty list or none leaves the field out. */
function putStudy(d: Draft<SketchFile>, key: StudyKey, value: SketchFile[StudyKey] | undefined) {
  const empty = value === undefined || (Array.isArray(value) && value.length === 0);
  if (empty) delete (d as Record<string, unknown>)[key];
  else (d as Record<string, unknown>)[key] = value;
}

export const setStudy = defineCommand<{ key: StudyKey; value: SketchFile[StudyKey] | undefined }>({
  name: "setStudy",
  label: ({ key }) => `Change ${WORDS[key]}`,
  undoable: true,
  run: (sketch, { key, value }) => edit(sketch, (d) => putStudy(d, key, value)),
});

/** What removing a case takes with it: its terms in combinations (a combination left with none
 *  goes too) and the kept sweeps run on it or on a combination that goes. */
export function caseRemovalEffects(sketch: SketchFile, caseId: string): { combinationsChanged: string[]; combinationsRemoved: string[]; sweepsRemoved: string[] } {
  const combos = sketch.combinations ?? [];
  const hit = combos.filter((k) => k.terms.some((t) => t.case === caseId));
  const removed = hit.filter((k) => k.terms.every((t) => t.case === caseId)).map((k) => k.id);
  const changed = hit.map((k) => k.id).filter((id) => !removed.includes(id));
  const sweeps = (sketch.sweeps ?? []).filter((s) => s.case === caseId || (s.combination !== undefined && removed.includes(s.combination))).map((s) => s.id);
  return { combinationsChanged: changed, combinationsRemoved: removed, sweepsRemoved: sweeps };
}

export const removeCase = defineCommand<{ id: string }>({
  name: "removeCase",
  label: ({ id }, sketch) => `Remove case ${sketch.cases?.find((c) => c.id === id)?.name ?? id}`,
  undoable: true,
  run: (sketch, { id }) => {
    const { combinationsChanged, combinationsRemoved, sweepsRemoved } = caseRemovalEffects(sketch, id);
    return edit(sketch, (d) => {
      putStudy(d, "cases", (sketch.cases ?? []).filter((c) => c.id !== id));
      if (combinationsChanged.length || combinationsRemoved.length)
        putStudy(
          d,
          "combinations",
          (sketch.combinations ?? []).filter((k) => !combinationsRemoved.includes(k.id)).map((k) => (k.terms.some((t) => t.case === id) ? { ...k, terms: k.terms.filter((t) => t.case !== id) } : k)),
        );
      if (sweepsRemoved.length) putStudy(d, "sweeps", (sketch.sweeps ?? []).filter((s) => !sweepsRemoved.includes(s.id)));
    });
  },
});

/** Removing a combination takes the kept sweeps run on it. */
export const removeCombination = defineCommand<{ id: string }>({
  name: "removeCombination",
  label: ({ id }, sketch) => `Remove combination ${sketch.combinations?.find((k) => k.id === id)?.name ?? id}`,
  undoable: true,
  run: (sketch, { id }) =>
    edit(sketch, (d) => {
      putStudy(d, "combinations", (sketch.combinations ?? []).filter((k) => k.id !== id));
      putStudy(d, "sweeps", (sketch.sweeps ?? []).filter((s) => s.combination !== id));
    }),
});
