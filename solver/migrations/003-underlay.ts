// Version 2 → 3: a sketch may carry an underlay (an uploaded drawing or photo with its scale).
// The field is optional and nothing else changes meaning, so the step only records the version.
import type { Migration } from "./index";

export const underlay: Migration = {
  from: 2,
  description: "adds an optional underlay: an uploaded drawing or photo placed and scaled under the sketch",
  up: (doc) => ({ ...doc }),
};
