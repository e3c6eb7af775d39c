// The built app as served in production: a client talking to it directly cannot buy a fresh rate-limit
// budget by writing a new X-Forwarded-For on every request (scripts/serve.mjs appends the real peer).
import { describe, expect, it } from "vitest";
import { BASE_URL } from "./browser";

describe("rate limits count the connecting address", () => {
  it("refuses the solve budget's next request even when every request forges another address", async () => {
    const max = Number(process.env.SOLVE_RATE_LIMIT_MAX) > 0 ? Number(process.env.SOLVE_RATE_LIMIT_MAX) : 60;
    const statuses: number[] = [];
    for (let i = 0; i <= max; i++) {
      // an empty object is refused as an invalid sketch, but it spends the budget like any request
      const res = await fetch(`${BASE_URL}/api/solve`, {
        method: "POST",
        headers: { "content-type": "application/json", "x-forwarded-for": `198.51.100.${i % 250}, 203.0.113.${i % 250}` },
        body: "{}",
      });
      statuses.push(res.status);
      if (res.status === 429) {
        const body = await res.json();
        expect(body.error.code).toBe("rate_limited");
        break;
      }
    }
    expect(statuses.slice(0, -1).every((s) => s === 400)).toBe(true);
    expect(statuses.at(-1)).toBe(429);
    expect(statuses.length).toBeLessThanOrEqual(max + 1);
  });
});
