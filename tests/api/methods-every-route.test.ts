// Every route handler file under app/api, read from disk: a method it does not serve answers 405
// with the JSON error and an `Allow` header naming what it does serve (RFC 9110 §15.5.6: a 405
// must send Allow), and OPTIONS answers 204 with the same Allow. A route file that leaves a method
// to Next (a bare 405 with no body and no Allow) fails the first test.
import { describe, expect, it } from "vitest";
import { call } from "./helpers";
import type { Handler } from "./matrix-types";
import { isNotAllowed, routeFiles, routePath } from "./route-files";

const METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE"] as const;

type RouteMethods = { path: string; served: string[]; refused: Map<string, Handler>; options: Handler | undefined };

/** The catch-all of addresses no route serves: every method answers its JSON 404 (tested below). */
const UNKNOWN_ADDRESS = "/api/[...path]";

async function routes(): Promise<RouteMethods[]> {
  return Promise.all(
    routeFiles().filter((file) => routePath(file) !== UNKNOWN_ADDRESS).map(async (file) => {
      const mod = (await import(file)) as Record<string, unknown>;
      const served = METHODS.filter((m) => typeof mod[m] === "function" && !isNotAllowed(mod[m]));
      const refused = new Map(METHODS.filter((m) => isNotAllowed(mod[m])).map((m) => [m, mod[m] as Handler]));
      return { path: routePath(file), served, refused, options: isNotAllowed(mod.OPTIONS) ? (mod.OPTIONS as Handler) : undefined };
    }),
  );
}

describe("methods a route does not serve", () => {
  it("every route answers every method: served, or refused with 405 (GET brings HEAD)", async () => {
    const all = await routes();
    expect(all.length).toBeGreaterThan(25);
    for (const r of all) {
      const covered = new Set([...r.served, ...r.refused.keys(), ...(r.served.includes("GET") ? ["HEAD"] : [])]);
      expect([r.path, [...covered].sort(), Boolean(r.options)]).toEqual([r.path, [...METHODS].sort(), true]);
      expect(r.served.length, r.path).toBeGreaterThan(0);
    }
  });

  it("405 is JSON naming the methods served, in the message, in error.allow and in Allow; OPTIONS says the same", async () => {
    for (const r of await routes()) {
      const allow = [...METHODS.filter((m) => r.served.includes(m) || (m === "HEAD" && r.served.includes("GET"))), "OPTIONS"];
      for (const [method, handler] of r.refused) {
        const { status, body, res } = await call(handler, { method, path: r.path });
        expect([r.path, method, status, res.headers.get("allow")]).toEqual([r.path, method, 405, allow.join(", ")]);
        if (method === "HEAD") continue;
        expect(body.error).toEqual({
          code: "method_not_allowed",
          message: `${method} is not a method of this address: it takes ${allow.filter((m) => m !== "OPTIONS").join(", ")}.`,
          allow,
        });
      }
      const { status, res } = await call(r.options!, { method: "OPTIONS", path: r.path });
      expect([r.path, status, res.headers.get("allow")]).toEqual([r.path, 204, allow.join(", ")]);
    }
  });

  it("an address no route serves answers every method with the API's JSON 404 naming the path, not Next's HTML page", async () => {
    const mod = (await import("@/app/api/[...path]/route")) as unknown as Record<string, Handler>;
    for (const method of ["GET", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"]) {
      const { status, body, res } = await call(mod[method], { method, path: "/api/sketches/6d656d6f-0000-4000-8000-0000000000a1/version", body: method === "GET" || method === "OPTIONS" ? undefined : {} });
      expect([method, status, res.headers.get("content-type")]).toEqual([method, 404, "application/json"]);
      expect(body).toEqual({
        error: {
          code: "not_found",
          message: "There is no API address /api/sketches/6d656d6f-0000-4000-8000-0000000000a1/version. Check the spelling; the README lists the addresses of the API.",
        },
      });
    }
  });

  it("the solve endpoint, asked with GET by a script, is told to POST", async () => {
    const solve = (await routes()).find((r) => r.path === "/api/solve")!;
    const { status, body, res } = await call(solve.refused.get("GET")!, { path: "/api/solve" });
    expect(status).toBe(405);
    expect(res.headers.get("allow")).toBe("POST, OPTIONS");
    expect(body.error.message).toBe("GET is not a method of this address: it takes POST.");
  });
});
