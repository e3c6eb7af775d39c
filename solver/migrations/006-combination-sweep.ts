// Version 5 → 6: a saved sweep may run on a combination (`combination`, the id of one) instead
// of a case: each point is then solved as the combination's factored load set. Nothing else
// changes meaning: the step only records the version.
import type { Migration } from "./index";

export const combinationSweep: Migration = {
  from: 5,
  description: "lets a saved sweep run on a combination",
  up: (doc) => ({ ...doc }),
};
