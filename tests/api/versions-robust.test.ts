// Ten saves racing on one base version; malformed, mistyped, invalid and oversized requests
// (4xx with field paths, never 500, nothing written); the public solve endpoint.
import { count, eq, like, sql } from "drizzle-orm";
import { afterEach, beforeAll, beforeEach, describe, expect, it } from "vitest";
import * as solveRoute from "@/app/api/solve/route";
import * as compareRoute from "@/app/api/sketches/[id]/compare/route";
import * as forkRoute from "@/app/api/sketches/[id]/fork/route";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { db } from "@/db";
import { appRateLimit, auditEvent, sketch, sketchVersion } from "@/db/schema";
import { solveFile } from "@/solver";
import { call, makeTeam, type Person } from "./helpers";
import { edited, fixture } from "./sketch-fixtures";
import { postSketch } from "./sketch-setup";

let eddie: Person;
let olivia: Person;
let ws: string;

beforeAll(async () => {
  ({ ws, olivia, eddie } = await makeTeam("Race track", { olivia: "owner", eddie: "editor" }));
});

async function newSketch(title: string): Promise<string> {
  return postSketch(ws, eddie, title);
}

async function counts(sketchId: string) {
  const [v] = await db.select({ n: count() }).from(sketchVersion).where(eq(sketchVersion.sketchId, sketchId));
  const [a] = await db.select({ n: count() }).from(auditEvent).where(eq(auditEvent.targetId, sketchId));
  return { versions: Number(v.n), audit: Number(a.n) };
}

describe("ten saves on the same base version at once", () => {
  it("lets exactly one win (201), answers the nine others 409, stores the winner's document, and leaves no gap", async () => {
    const id = await newSketch("Race");
    const docs = Array.from({ length: 10 }, (_, i) => edited("pump-skid-discharge", (d) => (d.title = `attempt ${i}`)));
    const results = await Promise.all(
      docs.map((document, i) =>
        call(versionsRoute.POST, { method: "POST", params: { id }, cookie: i % 2 ? eddie.cookie : olivia.cookie, body: { baseVersion: 1, message: `attempt ${i}`, document } }),
      ),
    );
    const statuses = results.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(9);
    const winner = results.findIndex((r) => r.status === 201);
    for (const r of results.filter((x) => x.status === 409)) expect(r.body.error.latest).toMatchObject({ number: 2, message: `attempt ${winner}` });

    const rows = await db.select().from(sketchVersion).where(eq(sketchVersion.sketchId, id)).orderBy(sketchVersion.number);
    expect(rows.map((r) => r.number)).toEqual([1, 2]);
    expect(rows[1].document.title).toBe(`attempt ${winner}`);
    expect(rows[1].message).toBe(`attempt ${winner}`);
    const [s] = await db.select().from(sketch).where(eq(sketch.id, id));
    expect(s.latestVersion).toBe(2);
    // the winner's drawing title names the sketch: its save and that rename are logged, no more
    expect(s.title).toBe(`attempt ${winner}`);
    expect(await counts(id)).toEqual({ versions: 2, audit: 3 });

    // the next round goes on from 2 with no gap
    const next = await Promise.all(
      [0, 1, 2].map((i) => call(versionsRoute.POST, { method: "POST", params: { id }, cookie: eddie.cookie, body: { baseVersion: 2, message: `round 2 #${i}`, document: docs[i] } })),
    );
    expect(next.map((r) => r.status).sort()).toEqual([201, 409, 409]);
    const numbers = (await db.select({ n: sketchVersion.number }).from(sketchVersion).where(eq(sketchVersion.sketchId, id))).map((r) => r.n).sort();
    expect(numbers).toEqual([1, 2, 3]);
  });
});

describe("the database holds the numbering rules itself", () => {
  it("refuses a second version with a number already taken, and a number below 1; the listing indexes exist", async () => {
    const id = await newSketch("Numbering held by the database");
    const [v1] = await db.select().from(sketchVersion).where(eq(sketchVersion.sketchId, id));
    const { id: _id, createdAt: _at, ...copy } = v1;
    await expect(db.insert(sketchVersion).values({ ...copy, number: 1 })).rejects.toThrow();
    await expect(db.insert(sketchVersion).values({ ...copy, number: 0 })).rejects.toThrow();
    expect(await counts(id)).toMatchObject({ versions: 1 });
    const rows = await db.execute<{ indexname: string }>(sql`select indexname from pg_indexes where tablename in ('sketch', 'sketch_version')`);
    const names = rows.rows.map((r) => r.indexname);
    for (const n of ["sketch_workspace_updated_idx", "sketch_workspace_title_idx", "sketch_tags_idx", "sketch_version_number_idx", "sketch_version_review_idx"]) expect(names).toContain(n);
  });
});

describe("bad input is refused with field paths, never a 500, and writes nothing", () => {
  let id: string;
  beforeAll(async () => {
    id = await newSketch("Target of bad requests");
  });

  const post = (opts: { body?: unknown; rawBody?: string; headers?: Record<string, string> }) =>
    call(versionsRoute.POST, { method: "POST", params: { id }, cookie: eddie.cookie, ...opts });

  const cases: Array<{ name: string; run: () => ReturnType<typeof call>; status: number; code: string; paths?: string[] }> = [
    { name: "malformed JSON", run: () => post({ rawBody: '{"baseVersion": 1, "document": {' }), status: 400, code: "invalid_json" },
    { name: "no body", run: () => post({ rawBody: "" }), status: 400, code: "invalid_json" },
    { name: "not JSON", run: () => post({ rawBody: "document=1", headers: { "content-type": "application/x-www-form-urlencoded" } }), status: 415, code: "unsupported_media_type" },
    {
      name: "wrong types",
      run: () => post({ body: { baseVersion: "one", message: 42, document: fixture("pipe-bend-anchor") } }),
      status: 400,
      code: "validation_failed",
      paths: ["baseVersion", "message"],
    },
    { name: "a missing document", run: () => post({ body: { baseVersion: 1 } }), status: 400, code: "validation_failed", paths: ["document"] },
    { name: "an unknown field", run: () => post({ body: { baseVersion: 1, document: fixture("pipe-bend-anchor"), overwrite: true } }), status: 400, code: "validation_failed", paths: ["overwrite"] },
    {
      name: "an invalid sketch",
      run: () =>
        post({
          body: {
            baseVersion: 1,
            document: edited("pump-skid-discharge", (d) => {
              (d.ports as Array<Record<string, unknown>>)[1].velocity = "24 kg";
              (d.supports as Array<Record<string, unknown>>)[0].body = "nowhere";
            }),
          },
        }),
      status: 400,
      code: "validation_failed",
      paths: ["document.ports[1].velocity", "document.supports[0].body"],
    },
    { name: "a document that is not a sketch", run: () => post({ body: { baseVersion: 1, document: { hello: "world" } } }), status: 400, code: "validation_failed", paths: ["document.format"] },
    { name: "a newer format version", run: () => post({ body: { baseVersion: 1, document: { ...fixture("pipe-bend-anchor"), version: 99 } } }), status: 400, code: "validation_failed", paths: ["document.version"] },
    {
      name: "a body over 1 MB",
      run: () => post({ body: { baseVersion: 1, document: { ...fixture("pipe-bend-anchor"), description: "x".repeat(1024 * 1024 + 10) } } }),
      status: 413,
      code: "payload_too_large",
    },
    {
      name: "a body over 1 MB that claims to be small",
      run: () => post({ rawBody: JSON.stringify({ baseVersion: 1, document: { ...fixture("pipe-bend-anchor"), description: "y".repeat(1_100_000) } }), headers: { "content-length": "10" } }),
      status: 413,
      code: "payload_too_large",
    },
  ];

  for (const c of cases) {
    it(`${c.name} → ${c.status} ${c.code}`, async () => {
      const before = await counts(id);
      const res = await c.run();
      expect(res.status).toBe(c.status);
      expect(res.body.error.code).toBe(c.code);
      expect(res.body.error.message.length).toBeGreaterThan(5);
      if (c.paths) expect(res.body.error.fields.map((f: { path: string }) => f.path).sort()).toEqual([...c.paths].sort());
      expect(await counts(id)).toEqual(before);
    });
  }

  it("the 413 says the limit", async () => {
    const res = await post({ body: { baseVersion: 1, document: { ...fixture("pipe-bend-anchor"), description: "x".repeat(1024 * 1024 + 10) } } });
    expect(res.body.error.message).toBe("The request body is larger than the 1 MB this endpoint accepts.");
  });

  // PostgreSQL's integer stops at 2 147 483 647: a larger number once reached it and came back as a 500
  it("version numbers past any real version → 400 naming the field, never a 500", async () => {
    const [{ n: before }] = await db.select({ n: count() }).from(sketch).where(eq(sketch.workspaceId, ws));
    const fork = await call(forkRoute.POST, { method: "POST", params: { id }, cookie: eddie.cookie, body: { workspaceId: ws, version: 3_000_000_000 } });
    expect(fork.status).toBe(400);
    expect(fork.body.error.fields).toEqual([{ path: "version", message: "There are at most 1000000 versions." }]);
    const save = await post({ body: { baseVersion: 3_000_000_000, document: fixture("pipe-bend-anchor") } });
    expect(save.status).toBe(400);
    expect(save.body.error.fields.map((f: { path: string }) => f.path)).toEqual(["baseVersion"]);
    for (const [from, to, field] of [
      ["3000000000", "1", "query.from"],
      ["1", "99999999999999", "query.to"],
    ]) {
      const res = await call(compareRoute.GET, { path: `/api/sketches/${id}/compare?from=${from}&to=${to}`, params: { id }, cookie: eddie.cookie });
      expect(res.status).toBe(400);
      expect(res.body.error.fields).toEqual([{ path: field, message: "There are at most 1000000 versions." }]);
    }
    const [{ n: after }] = await db.select({ n: count() }).from(sketch).where(eq(sketch.workspaceId, ws));
    expect(after).toBe(before);
  });

  it("bad creates, renames and ids write nothing either", async () => {
    const [{ n: before }] = await db.select({ n: count() }).from(sketch).where(eq(sketch.workspaceId, ws));
    const bad = [
      await call(sketchesRoute.POST, { method: "POST", params: { id: ws }, cookie: eddie.cookie, body: { title: "", tags: ["ok", "<b>"] } }),
      await call(sketchesRoute.POST, { method: "POST", params: { id: ws }, cookie: eddie.cookie, body: { document: [1, 2, 3] } }),
      await call(sketchesRoute.POST, { method: "POST", params: { id: ws }, cookie: eddie.cookie, body: { tags: "pumps" } }),
      await call(sketchRoute.PATCH, { method: "PATCH", params: { id }, cookie: eddie.cookie, body: {} }),
      await call(sketchRoute.PATCH, { method: "PATCH", params: { id }, cookie: eddie.cookie, body: { title: "x".repeat(200) } }),
    ];
    expect(bad.map((r) => r.status)).toEqual([400, 400, 400, 400, 400]);
    expect(bad[0].body.error.fields.map((f: { path: string }) => f.path)).toEqual(["title", "tags.1"]);
    expect(bad[1].body.error.fields[0].path).toBe("document");
    expect((await call(sketchRoute.GET, { params: { id: "not-a-uuid" }, cookie: eddie.cookie })).status).toBe(404);
    const [{ n: after }] = await db.select({ n: count() }).from(sketch).where(eq(sketch.workspaceId, ws));
    expect(after).toBe(before);
    const [s] = await db.select().from(sketch).where(eq(sketch.id, id));
    expect(s.title).toBe("Target of bad requests");
  });
});

describe("POST /api/solve", () => {
  const saved = { ...process.env };
  // budgets outlive a run by their window: a rerun within a minute starts from a clean count
  beforeEach(async () => {
    await db.delete(appRateLimit).where(like(appRateLimit.key, "solve:203.0.113.%"));
  });
  afterEach(() => {
    for (const k of ["SOLVE_RATE_LIMIT_MAX", "SOLVE_RATE_LIMIT_WINDOW"]) {
      if (saved[k] === undefined) delete process.env[k];
      else process.env[k] = saved[k];
    }
  });
  const solve = (body: unknown, ip = "198.51.100.20", raw?: string) =>
    call(solveRoute.POST, { method: "POST", body, rawBody: raw, origin: null, headers: { "x-forwarded-for": ip } });

  it("answers what `npm run solve` prints, without signing in", async () => {
    const doc = fixture("thrust-stand-tips");
    const res = await solve(doc);
    expect(res.status).toBe(200);
    expect(res.body).toEqual(JSON.parse(JSON.stringify(solveFile(doc))));
    expect(res.body.bodies.stand.status).toBe("tips");
  });

  it("names the invalid fields, refuses bodies over 1 MB, and refuses non-JSON", async () => {
    const bad = await solve(edited("thrust-stand-tips", (d) => (d.gravity = "9.81 m")));
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual([{ path: "gravity", message: expect.stringContaining("") }]);
    expect((await solve({ ...fixture("thrust-stand-tips"), description: "z".repeat(1024 * 1024) })).status).toBe(413);
    expect((await solve(undefined, "198.51.100.20", "not json")).status).toBe(400);
    expect((await solve(null)).status).toBe(400);
  });

  it("rate-limits each address: SOLVE_RATE_LIMIT_MAX per SOLVE_RATE_LIMIT_WINDOW seconds, then 429 with Retry-After", async () => {
    process.env.SOLVE_RATE_LIMIT_MAX = "3";
    process.env.SOLVE_RATE_LIMIT_WINDOW = "60";
    const doc = fixture("pipe-bend-anchor");
    const statuses = [];
    for (let i = 0; i < 4; i++) statuses.push((await solve(doc, "203.0.113.50")).status);
    expect(statuses).toEqual([200, 200, 200, 429]);
    const limited = await solve(doc, "203.0.113.50");
    expect(limited.body.error.code).toBe("rate_limited");
    expect(Number(limited.res.headers.get("retry-after"))).toBeGreaterThan(50);
    expect((await solve(doc, "203.0.113.51")).status).toBe(200);
  });

  it("counts malformed, non-JSON and oversized requests against the budget too", async () => {
    process.env.SOLVE_RATE_LIMIT_MAX = "3";
    process.env.SOLVE_RATE_LIMIT_WINDOW = "60";
    const ip = "203.0.113.60";
    const statuses = [
      (await solve(undefined, ip, '{"format": ')).status,
      (await call(solveRoute.POST, { method: "POST", rawBody: "x=1", origin: null, headers: { "x-forwarded-for": ip, "content-type": "text/plain" } })).status,
      (await solve({ ...fixture("thrust-stand-tips"), description: "z".repeat(1024 * 1024) }, ip)).status,
      (await solve(fixture("pipe-bend-anchor"), ip)).status,
    ];
    expect(statuses).toEqual([400, 415, 413, 429]);
  });
});
