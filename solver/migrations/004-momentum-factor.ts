// Version 3 → 4: a port may carry a momentum-flux correction factor `beta` (β = 1 when absent, the
// uniform flow every earlier file assumed), so nothing else changes meaning: the step only records
// the version.
import type { Migration } from "./index";

export const momentumFactor: Migration = {
  from: 3,
  description: "adds an optional momentum-flux factor β per port (1 when absent: flow uniform across the port)",
  up: (doc) => ({ ...doc }),
};
