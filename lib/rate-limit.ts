import "server-only";
import { lt, sql } from "drizzle-orm";
import { db } from "@/db";
import { appRateLimit } from "@/db/schema";
import { AppError } from "./errors";

/**
 * A fixed-window request budget per client address, counted in PostgreSQL so every app server
 * behind a balancer spends one budget (better-auth counts sign-ins the same way, in its own
 * table). One statement per request: the key's row is created, restarted when its window is
 * over, or counted; now and then rows whose window has ended are cleared.
 */
export function createRateLimiter(name: string) {
  return {
    /** Count one request; throws 429 (with Retry-After) once `max` were made in the last `windowSeconds`. */
    async hit(address: string, max: number, windowSeconds: number, now = Date.now()): Promise<void> {
      const span = windowSeconds * 1000;
      const over = sql`${appRateLimit.windowEnd} <= ${now}`;
      const [row] = await db
        .insert(appRateLimit)
        .values({ key: `${name}:${address}`, count: 1, windowStart: now, windowEnd: now + span })
        .onConflictDoUpdate({
          target: appRateLimit.key,
          set: {
            count: sql`case when ${over} then 1 else ${appRateLimit.count} + 1 end`,
            windowStart: sql`case when ${over} then ${now} else ${appRateLimit.windowStart} end`,
            windowEnd: sql`case when ${over} then ${now + span} else ${appRateLimit.windowEnd} end`,
          },
        })
        .returning({ count: appRateLimit.count, end: appRateLimit.windowEnd });
      if (Math.random() < 0.02) await db.delete(appRateLimit).where(lt(appRateLimit.windowEnd, now));
      if (row.count > max) {
        const retry = Math.max(1, Math.ceil((Number(row.end) - now) / 1000));
        throw new AppError("rate_limited", `Too many ${name} requests from this address: at most ${max} every ${windowSeconds} s. Try again in ${retry} s.`, {
          headers: { "Retry-After": String(retry) },
        });
      }
    },
  };
}

// the address a budget is counted against (X-Forwarded-For read as TRUSTED_PROXIES says)
export { clientAddress } from "./client-address";
