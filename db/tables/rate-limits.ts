// The app's own request budgets (better-auth keeps its sign-in budgets in `rate_limit`, with
// its tables in auth.ts).
import { bigint, index, integer, pgTable, text } from "drizzle-orm/pg-core";

/** The app's own request budgets (POST /api/solve) per "<name>:<client address>", shared by every app server. */
export const appRateLimit = pgTable(
  "app_rate_limit",
  {
    key: text("key").primaryKey(),
    count: integer("count").notNull(),
    /** the current window, in ms since the epoch */
    windowStart: bigint("window_start", { mode: "number" }).notNull(),
    windowEnd: bigint("window_end", { mode: "number" }).notNull(),
  },
  (t) => [index("app_rate_limit_window_end_idx").on(t.windowEnd)],
);
