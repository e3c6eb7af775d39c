// A saved version comes back exactly as saved, key order included: the parameters are a
// name → expression map in the order the user entered them (the properties panel, the sweep list
// and the calc sheet show them in that order), and a case's overrides likewise. The column is
// json, not jsonb (jsonb would hand the keys back shortest first).
import { eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as forkRoute from "@/app/api/sketches/[id]/fork/route";
import * as versionRoute from "@/app/api/sketches/[id]/versions/[number]/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { db } from "@/db";
import { getVersion } from "@/db/queries/versions";
import { sketchVersion } from "@/db/schema";
import { CURRENT_VERSION, parseSketch } from "@/solver";
import { call, makeAccount, makeWorkspace, type Person } from "./helpers";
import { edited } from "./sketch-fixtures";

/** The user's order: neither alphabetical nor by length (jsonb would give Q, A1, D1, rho, mdot). */
const PARAMETER_ORDER = ["rho", "Q", "D1", "A1", "mdot"];
/** A case's overrides in the user's order (jsonb would give Q, rho, mdot). */
const OVERRIDE_ORDER = ["mdot", "rho", "Q"];

function orderedDocument(title: string) {
  return edited("pump-skid-discharge", (d) => {
    d.version = CURRENT_VERSION;
    d.title = title;
    d.parameters = { rho: "998 kg/m^3", Q: "0.012 m^3/s", D1: "0.08 m", A1: "pi * D1^2 / 4", mdot: "rho * Q" };
    d.cases = [
      { id: "hot", name: "Hot water", parameters: { mdot: "11 kg/s", rho: "958 kg/m^3", Q: "0.0115 m^3/s" } },
      { id: "cold", name: "Cold water", parameters: { Q: "0.013 m^3/s", mdot: "13 kg/s" } },
    ];
  });
}

let eddie: Person;
let ws: string;
let otherWs: string;

beforeAll(async () => {
  eddie = await makeAccount("eddie");
  ws = await makeWorkspace("Key order", [[eddie, "editor"]]);
  otherWs = await makeWorkspace("Key order, forks", [[eddie, "editor"]]);
});

async function create(title: string): Promise<string> {
  const res = await call(sketchesRoute.POST, { method: "POST", params: { id: ws }, cookie: eddie.cookie, body: { title, document: orderedDocument(title) } });
  expect(res.status).toBe(201);
  return res.body.sketch.id;
}

async function read(id: string, number: number) {
  const res = await call(versionRoute.GET, { params: { id, number: String(number) }, cookie: eddie.cookie });
  expect(res.status).toBe(200);
  return res.body.version.document;
}

function expectOrder(doc: { parameters?: object; cases?: Array<{ id: string; parameters?: object }> }) {
  expect(Object.keys(doc.parameters ?? {})).toEqual(PARAMETER_ORDER);
  expect(doc.cases?.map((c) => [c.id, Object.keys(c.parameters ?? {})])).toEqual([
    ["hot", OVERRIDE_ORDER],
    ["cold", ["Q", "mdot"]],
  ]);
}

describe("a saved version keeps the key order it was saved with", () => {
  it("reads back version 1 (created with the sketch) with the parameters and case overrides in the saved order", async () => {
    const id = await create("Order on create");
    expectOrder(await read(id, 1));
  });

  it("reads back a saved version exactly as saved, through the route and the query", async () => {
    const id = await create("Order on save");
    const document = orderedDocument("Order on save, v2");
    const saved = await call(versionsRoute.POST, { method: "POST", params: { id }, cookie: eddie.cookie, body: { baseVersion: 1, message: "v2", document } });
    expect(saved.status).toBe(201);

    const doc = await read(id, 2);
    expectOrder(doc);
    // the whole record, every key in its place, is the file as validated and migrated
    const parsed = parseSketch(document);
    expect(parsed.ok).toBe(true);
    if (parsed.ok) expect(JSON.stringify(doc)).toBe(JSON.stringify(parsed.file));

    const viaQuery = await getVersion(id, 2, eddie.id);
    expectOrder(viaQuery!.document);
    expect(JSON.stringify(viaQuery!.document)).toBe(JSON.stringify(doc));
  });

  it("a fork keeps the source's order", async () => {
    const id = await create("Order forked");
    const fork = await call(forkRoute.POST, { method: "POST", params: { id }, cookie: eddie.cookie, body: { workspaceId: otherWs, version: 1 } });
    expect(fork.status).toBe(201);
    expectOrder(await read(fork.body.sketch.id, 1));
  });

  it("still refuses a change to the document and still lets the sign-off state move", async () => {
    const id = await create("Order, immutable");
    const where = eq(sketchVersion.sketchId, id);
    // the same document with its keys reordered is a change too
    const reordered = { ...orderedDocument("Order, immutable"), parameters: { Q: "0.012 m^3/s", A1: "pi * D1^2 / 4", D1: "0.08 m", rho: "998 kg/m^3", mdot: "rho * Q" } };
    await expect(db.update(sketchVersion).set({ document: reordered as never }).where(where)).rejects.toThrow();
    await expect(db.update(sketchVersion).set({ document: sql`${sketchVersion.document}::jsonb::json` }).where(where)).rejects.toThrow();
    await db.update(sketchVersion).set({ reviewState: "submitted" }).where(where);
    const [row] = await db.select().from(sketchVersion).where(where);
    expect(row.reviewState).toBe("submitted");
    expectOrder(row.document);
  });
});
