// What a script writer is told when a request is wrong: the field or query parameter by name, a
// field left out said to be required, a mistyped query parameter refused instead of ignored, and
// where a JSON body stops being JSON. Nothing is written on any of them.
import { count, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { sketchVersion } from "@/db/schema";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as compareRoute from "@/app/api/sketches/[id]/compare/route";
import * as workspacesRoute from "@/app/api/workspaces/route";
import * as solveRoute from "@/app/api/solve/route";
import { createSketch } from "@/lib/sketches";
import { call, makeAccount, makeWorkspace, type Person } from "./helpers";
import { fixture as sketchFile, parsedFixture } from "./sketch-fixtures";

describe("errors an integrator can act on", () => {
  let owner: Person;
  let ws = "";
  let sketchId = "";

  beforeAll(async () => {
    owner = await makeAccount("integrator");
    ws = await makeWorkspace("Integrator bay", [[owner, "owner"]]);
    sketchId = (await createSketch(ws, owner, { title: "Integrator skid", document: parsedFixture("pump-skid-discharge") })).sketch.id;
  });

  it("a query parameter the endpoint does not read is named, with the ones it does", async () => {
    const { status, body } = await call(sketchesRoute.GET, { path: `/api/workspaces/${ws}/sketches?limit=5&sort=title`, params: { id: ws }, cookie: owner.cookie });
    expect(status).toBe(400);
    expect(body.error.fields).toEqual([
      { path: "query.limit", message: "Is not a query parameter here (check the spelling): this address reads q, tag, status, sort, dir, page, pageSize." },
    ]);
    const ok = await call(sketchesRoute.GET, { path: `/api/workspaces/${ws}/sketches?pageSize=5&sort=title`, params: { id: ws }, cookie: owner.cookie });
    expect([ok.status, ok.body.pageSize]).toEqual([200, 5]);
  });

  it("a page that is not a number says what a page is", async () => {
    const { status, body } = await call(sketchesRoute.GET, { path: `/api/workspaces/${ws}/sketches?page=abc&pageSize=0`, params: { id: ws }, cookie: owner.cookie });
    expect(status).toBe(400);
    expect(body.error.fields).toEqual([
      { path: "query.page", message: "A page is a whole number from 1." },
      { path: "query.pageSize", message: "pageSize is a whole number from 1 to 100." },
    ]);
  });

  it("a version left out of a comparison is required, not 'not a whole number'", async () => {
    const { status, body } = await call(compareRoute.GET, { path: `/api/sketches/${sketchId}/compare?from=1`, params: { id: sketchId }, cookie: owner.cookie });
    expect(status).toBe(400);
    expect(body.error.fields).toEqual([{ path: "query.to", message: "Required: a version number is a whole number." }]);
  });

  it("a save without its base version says the field is required, and writes nothing", async () => {
    const versions = async () => Number((await db.select({ n: count() }).from(sketchVersion).where(eq(sketchVersion.sketchId, sketchId)))[0].n);
    const before = await versions();
    const { status, body } = await call(versionsRoute.POST, { method: "POST", params: { id: sketchId }, cookie: owner.cookie, body: { message: "no base", document: sketchFile("pump-skid-discharge") } });
    expect(status).toBe(400);
    expect(body.error.fields).toEqual([{ path: "baseVersion", message: "Required: a version number is a whole number." }]);
    expect(await versions()).toBe(before);
  });

  it("a body that is not an object, and one with a field left out", async () => {
    const array = await call(workspacesRoute.POST, { method: "POST", cookie: owner.cookie, rawBody: "[]" });
    expect([array.status, array.body.error.fields]).toEqual([400, [{ path: "(root)", message: 'Send a JSON object ({ "name": value, … }), not an array.' }]]);
    const empty = await call(workspacesRoute.POST, { method: "POST", cookie: owner.cookie, body: {} });
    expect([empty.status, empty.body.error.fields]).toEqual([400, [{ path: "name", message: "Required." }]]);
  });

  it("malformed JSON says where the parser stopped", async () => {
    const { status, body } = await call(solveRoute.POST, { method: "POST", rawBody: '{"format": bad}', headers: { "x-forwarded-for": "192.0.2.78" } });
    expect(status).toBe(400);
    expect(body.error.code).toBe("invalid_json");
    expect(body.error.message).toMatch(/^The request body is not valid JSON: .*'b'/);
  });
});
