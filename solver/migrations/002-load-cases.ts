// Version 1 → 2: load groups, operating cases, combinations, saved sweeps and stability
// requirements arrive as optional fields. Nothing in a version-1 file changes meaning, so the step only records the
// new version; a version-1 file solves exactly as before.
import type { Migration } from "./index";

export const loadCases: Migration = {
  from: 1,
  description: "adds optional load groups, operating cases, combinations, saved sweeps and stability requirements",
  up: (doc) => ({ ...doc }),
};
