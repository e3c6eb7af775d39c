// Version 5 → 6: a saved sweep may run on a combination (`combination`, the id of one) instead
// of a case: each point is then solved as the combination's factored load set; and a case may be
// a load case solved only as part of combinations (`onlyInCombinations`); and a combination may
// set its own required factors of safety (`stability`). Nothing else changes
// meaning (absent, a case is solved on its own as before): the step only records the version.
import type { Migration } from "./index";

export const combinationStudies: Migration = {
  from: 5,
  description: "lets a saved sweep run on a combination, a case be solved only in combinations, and a combination set its own required factors of safety",
  up: (doc) => ({ ...doc }),
};
