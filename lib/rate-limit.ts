import "server-only";
import { AppError } from "./errors";

type Window = { start: number; count: number };

/**
 * A fixed-window request budget per key (the client address), kept in this process's memory.
 * Enough for one app server; several servers behind a balancer each keep their own budget.
 */
export function createRateLimiter(name: string) {
  const windows = new Map<string, Window>();
  return {
    /** Count one request; throws 429 (with Retry-After) once `max` were made in the last `windowSeconds`. */
    hit(key: string, max: number, windowSeconds: number, now = Date.now()): void {
      const span = windowSeconds * 1000;
      let w = windows.get(key);
      if (!w || now - w.start >= span) {
        w = { start: now, count: 0 };
        windows.set(key, w);
        if (windows.size > 10_000) for (const [k, v] of windows) if (now - v.start >= span) windows.delete(k);
      }
      w.count += 1;
      if (w.count > max) {
        const retry = Math.max(1, Math.ceil((w.start + span - now) / 1000));
        throw new AppError("rate_limited", `Too many ${name} requests from this address: at most ${max} every ${windowSeconds} s. Try again in ${retry} s.`, {
          headers: { "Retry-After": String(retry) },
        });
      }
    },
    reset(): void {
      windows.clear();
    },
  };
}

/** The client address as the reverse proxy reports it (first X-Forwarded-For entry), or "local". */
export function clientAddress(req: Request): string {
  return req.headers.get("x-forwarded-for")?.split(",")[0]?.trim() || req.headers.get("x-real-ip") || "local";
}
