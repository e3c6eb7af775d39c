// Version 4 → 5: a sketch may give the direction gravity acts in (`gravityAngle`, degrees; −90 —
// down the page — when absent, as every earlier file assumed), for a body on a slope or a
// tilt-table check. Nothing else changes meaning: the step only records the version.
import type { Migration } from "./index";

export const gravityDirection: Migration = {
  from: 4,
  description: "adds an optional direction of gravity (−90° when absent: down the page)",
  up: (doc) => ({ ...doc }),
};
