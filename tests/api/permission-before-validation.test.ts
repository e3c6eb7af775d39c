// The write routes under /api/sketches ask who the caller is before what they sent: a member whose
// role may not take the action gets 403, and a non-member 404, whatever the body (invalid fields,
// malformed JSON, not JSON at all); only a caller who may act is told what is wrong with the body.
import { count, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import * as forkRoute from "@/app/api/sketches/[id]/fork/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as commentsRoute from "@/app/api/sketches/[id]/versions/[number]/comments/route";
import * as signoffRoute from "@/app/api/sketches/[id]/versions/[number]/signoff/route";
import { db } from "@/db";
import { comment, signOff, sketchVersion } from "@/db/schema";
import { call, withMailFake, makeAccount, makeTeam, type Person } from "./helpers";
import type { Handler } from "./matrix-types";
import { edited, fixture } from "./sketch-fixtures";
import { postSketch } from "./sketch-setup";

let editor: Person, checker: Person, viewer: Person, outsider: Person;
let ws: string;
let sketchId: string;

withMailFake();
beforeAll(async () => {
  ({ ws, editor, checker, viewer } = await makeTeam("Permission first bay", { owner: "owner", editor: "editor", checker: "checker", viewer: "viewer" }, { prefix: "pbv" }));
  outsider = await makeAccount("pbv-outsider");
  sketchId = await postSketch(ws, editor, "Permission first skid");
});

/** A version whose document breaks two fields (a velocity in kg, a support on no body). */
const invalidVersion = () => ({
  baseVersion: 1,
  message: "broken",
  document: edited("pump-skid-discharge", (d) => {
    (d.ports as Array<Record<string, unknown>>)[1].velocity = "24 kg";
    (d.supports as Array<Record<string, unknown>>)[0].body = "nowhere";
  }),
});
const validVersion = () => ({ baseVersion: 1, message: "fine", document: fixture("pump-skid-discharge") });

type Send = { body?: unknown; rawBody?: string; headers?: Record<string, string> };
const BAD_BODIES: Array<[string, (invalid: unknown) => Send]> = [
  ["invalid fields", (invalid) => ({ body: invalid })],
  ["malformed JSON", () => ({ rawBody: '{"baseVersion": 1, "document": {' })],
  ["a body that is not JSON", () => ({ rawBody: "document=1", headers: { "content-type": "application/x-www-form-urlencoded" } })],
];

const V = () => ({ id: sketchId, number: "1" });
const S = () => ({ id: sketchId });

/** Each write route under /api/sketches that reads a JSON body: an invalid body, and who may not act on it. */
const ROUTES: Array<{ name: string; handler: Handler; method: string; params: () => Record<string, string>; invalid: unknown; refused: Array<[() => Person, number]>; invalidPaths: string[]; allowed: () => Person }> = [
  {
    name: "POST /api/sketches/[id]/versions",
    handler: versionsRoute.POST,
    method: "POST",
    params: S,
    invalid: invalidVersion(),
    refused: [
      [() => viewer, 403],
      [() => checker, 403],
      [() => outsider, 404],
    ],
    invalidPaths: ["document.ports[1].velocity", "document.supports[0].body"],
    allowed: () => editor,
  },
  {
    name: "PATCH /api/sketches/[id]",
    handler: sketchRoute.PATCH,
    method: "PATCH",
    params: S,
    invalid: { title: 42 },
    refused: [
      [() => viewer, 403],
      [() => checker, 403],
      [() => outsider, 404],
    ],
    invalidPaths: ["title"],
    allowed: () => editor,
  },
  {
    name: "POST /api/sketches/[id]/versions/[number]/comments",
    handler: commentsRoute.POST,
    method: "POST",
    params: V,
    invalid: { body: "" },
    refused: [
      [() => viewer, 403],
      [() => outsider, 404],
    ],
    invalidPaths: ["body"],
    allowed: () => checker,
  },
  {
    name: "POST /api/sketches/[id]/versions/[number]/signoff",
    handler: signoffRoute.POST,
    method: "POST",
    params: V,
    invalid: { step: "rubber-stamp" },
    refused: [
      [() => viewer, 403],
      [() => outsider, 404],
    ],
    invalidPaths: ["step"],
    allowed: () => checker,
  },
  {
    // any member may fork what they read (the target workspace is checked once the body is read)
    name: "POST /api/sketches/[id]/fork",
    handler: forkRoute.POST,
    method: "POST",
    params: S,
    invalid: { workspaceId: "not-a-workspace" },
    refused: [[() => outsider, 404]],
    invalidPaths: ["workspaceId"],
    allowed: () => viewer,
  },
];

async function written() {
  const rows = async (t: typeof sketchVersion | typeof comment | typeof signOff) => Number((await db.select({ n: count() }).from(t))[0].n);
  return { versions: await rows(sketchVersion), comments: await rows(comment), signOffs: await rows(signOff) };
}

describe("a write under /api/sketches checks the caller before the body", () => {
  it("a viewer saving a version: 403 with an invalid document as with a valid one, and nothing saved", async () => {
    const before = await written();
    for (const body of [invalidVersion(), validVersion()]) {
      const res = await call(versionsRoute.POST, { method: "POST", params: S(), cookie: viewer.cookie, body });
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe("forbidden");
      expect(res.body.error.fields ?? []).toEqual([]);
    }
    const checkerTry = await call(versionsRoute.POST, { method: "POST", params: S(), cookie: checker.cookie, body: invalidVersion() });
    expect(checkerTry.status).toBe(403);
    expect(await written()).toEqual(before);
    const [v] = await db.select({ latest: count() }).from(sketchVersion).where(eq(sketchVersion.sketchId, sketchId));
    expect(v.latest).toBe(1);
  });

  for (const r of ROUTES) {
    for (const [what, send] of BAD_BODIES) {
      it(`${r.name} with ${what}: refused callers get their 403/404, the caller who may act gets the body's error`, async () => {
        const before = await written();
        for (const [who, status] of r.refused) {
          const res = await call(r.handler, { method: r.method, params: r.params(), cookie: who().cookie, ...send(r.invalid) });
          expect(res.status, `${who().name}: ${JSON.stringify(res.body)}`).toBe(status);
          expect(res.body.error.code).toBe(status === 403 ? "forbidden" : "not_found");
          // a non-member learns nothing of the sketch
          if (status === 404) expect(JSON.stringify(res.body)).not.toContain("Permission first skid");
        }
        const res = await call(r.handler, { method: r.method, params: r.params(), cookie: r.allowed().cookie, ...send(r.invalid) });
        if (what === "invalid fields") {
          expect(res.status).toBe(400);
          expect(res.body.error.code).toBe("validation_failed");
          expect(res.body.error.fields.map((f: { path: string }) => f.path)).toEqual(expect.arrayContaining(r.invalidPaths));
        } else if (what === "malformed JSON") {
          expect([res.status, res.body.error.code]).toEqual([400, "invalid_json"]);
        } else {
          expect([res.status, res.body.error.code]).toEqual([415, "unsupported_media_type"]);
        }
        expect(await written()).toEqual(before);
      });
    }
  }

  it("a valid sign-off body from a viewer still gets the rule's own reason, naming the viewer's role", async () => {
    const res = await call(signoffRoute.POST, { method: "POST", params: V(), cookie: viewer.cookie, body: { step: "check" } });
    expect(res.status).toBe(403);
    expect(res.body.error.message).toBe("You are a viewer in this workspace: checking is for checkers and owners.");
  });
});
