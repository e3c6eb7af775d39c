// The app's own request budgets (POST /api/solve): counted in PostgreSQL, so two app servers
// spend one budget per client address; a window that is over starts afresh.
import { describe, expect, it } from "vitest";
import { eq, like } from "drizzle-orm";
import { db } from "@/db";
import { appRateLimit } from "@/db/schema";
import { createRateLimiter } from "@/lib/rate-limit";

async function status(p: Promise<void>): Promise<number | string> {
  try {
    await p;
    return 200;
  } catch (err) {
    return (err as { code?: string }).code ?? "threw";
  }
}

describe("request budgets shared by app servers", () => {
  it("counts requests made through any server against one budget per address, then starts afresh", async () => {
    // the probe's rows from an earlier run on the same database would be counted too
    await db.delete(appRateLimit).where(like(appRateLimit.key, "probe:%"));
    const serverA = createRateLimiter("probe");
    const serverB = createRateLimiter("probe");
    const t0 = 1_900_000_000_000;
    const seen = [
      await status(serverA.hit("198.51.100.9", 3, 60, t0)),
      await status(serverB.hit("198.51.100.9", 3, 60, t0 + 1_000)),
      await status(serverA.hit("198.51.100.9", 3, 60, t0 + 2_000)),
      await status(serverB.hit("198.51.100.9", 3, 60, t0 + 3_000)),
    ];
    expect(seen).toEqual([200, 200, 200, "rate_limited"]);
    // another address has its own budget
    expect(await status(serverB.hit("198.51.100.10", 3, 60, t0 + 3_000))).toBe(200);
    // the refusal says when to come back: the window began at t0, so 60 − 4 = 56 s
    const refusal = await serverA.hit("198.51.100.9", 3, 60, t0 + 4_000).catch((e: unknown) => e as { message: string; headers?: Record<string, string> });
    expect(refusal).toMatchObject({ headers: { "Retry-After": "56" } });
    // once the window is over, the budget starts afresh
    expect(await status(serverA.hit("198.51.100.9", 3, 60, t0 + 60_000))).toBe(200);
    const [row] = await db.select().from(appRateLimit).where(eq(appRateLimit.key, "probe:198.51.100.9"));
    expect(row).toMatchObject({ count: 1, windowStart: t0 + 60_000, windowEnd: t0 + 120_000 });
  });
});
