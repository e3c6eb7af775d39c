// Making an older version the latest again: a new version on top with that version's drawing (the
// sketch keeps its present title), its message saying which version it restores; a stale base is a
// 409 as any save's is, the latest version has nothing to restore, and a reader cannot restore.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { auditEvent } from "@/db/schema";
import * as restoreRoute from "@/app/api/sketches/[id]/versions/[number]/restore/route";
import * as versionRoute from "@/app/api/sketches/[id]/versions/[number]/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { call, makeAccount, makeWorkspace, type Person } from "./helpers";
import { edited } from "./sketch-fixtures";

let eddie: Person;
let chen: Person;
let id: string;

const restore = (who: Person, number: number, body: Record<string, unknown>) => call(restoreRoute.POST, { method: "POST", params: { id, number: String(number) }, cookie: who.cookie, body });
const version = async (number: number) => (await call(versionRoute.GET, { params: { id, number: String(number) }, cookie: eddie.cookie })).body.version;

beforeAll(async () => {
  eddie = await makeAccount("eddie", { name: "Eddie Restore" });
  chen = await makeAccount("chen", { name: "Chen Restore" });
  const ws = await makeWorkspace("Restores", [
    [eddie, "editor"],
    [chen, "checker"],
  ]);
  const made = await call(sketchesRoute.POST, {
    method: "POST",
    params: { id: ws },
    cookie: eddie.cookie,
    body: { title: "Bend", message: "anchor block as quoted", document: edited("pipe-bend-anchor", (d) => (d.description = "as quoted")) },
  });
  id = made.body.sketch.id;
  const v2 = await call(versionsRoute.POST, {
    method: "POST",
    params: { id },
    cookie: eddie.cookie,
    body: { baseVersion: 1, message: "smaller block", document: edited("pipe-bend-anchor", (d) => (d.description = "smaller block")) },
  });
  expect(v2.status).toBe(201);
  // renamed since: a restore brings back the drawing, not the old name
  expect((await call(sketchRoute.PATCH, { method: "PATCH", params: { id }, cookie: eddie.cookie, body: { title: "Bend DN150" } })).status).toBe(200);
});

describe("restoring a version", () => {
  it("saves the old drawing as the new latest, under the present title, and says so in its message", async () => {
    const res = await restore(eddie, 1, { baseVersion: 2 });
    expect(res.status).toBe(201);
    expect(res.body.version).toMatchObject({ number: 3, restoredFrom: 1, message: "Restored v1 — anchor block as quoted", sketchTitle: "Bend DN150" });
    const v3 = await version(3);
    expect(v3.document.description).toBe("as quoted");
    expect(v3.document.title).toBe("Bend DN150");
    // the same drawing: the same solve summary as v1's (nothing else changed)
    const v1 = await version(1);
    expect(v3.largestReaction).toBe(v1.largestReaction);
    expect(v3.status).toBe(v1.status);
    // the versions in between stay
    expect((await version(2)).document.description).toBe("smaller block");
    // the sketch's activity says it was a restore
    const saved = await db.select({ detail: auditEvent.detail }).from(auditEvent).where(and(eq(auditEvent.targetId, id), eq(auditEvent.action, "sketch.save")));
    expect(saved.map((r) => r.detail)).toContainEqual(expect.objectContaining({ number: 3, restoredFrom: 1 }));
    const sketch = (await call(sketchRoute.GET, { params: { id }, cookie: eddie.cookie })).body.sketch;
    expect(sketch).toMatchObject({ title: "Bend DN150", latestVersion: 3 });
  });

  it("refuses a stale base with the 409 of any save, naming the newer version", async () => {
    const res = await restore(eddie, 2, { baseVersion: 2 });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("version_conflict");
    expect(res.body.error.latest).toMatchObject({ number: 3, byYou: true });
  });

  it("takes the caller's message", async () => {
    const res = await restore(eddie, 2, { baseVersion: 3, message: "  back to the smaller block: the quote was withdrawn " });
    expect(res.status).toBe(201);
    expect(res.body.version).toMatchObject({ number: 4, message: "back to the smaller block: the quote was withdrawn" });
    expect((await version(4)).document.description).toBe("smaller block");
  });

  it("says the latest version has nothing to restore, naming the field", async () => {
    const res = await restore(eddie, 4, { baseVersion: 4 });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe("Version 4 is already the latest: there is nothing to restore.");
    expect(res.body.error.fields).toEqual([{ path: "number", message: "v4 is the latest version." }]);
  });

  it("answers 404 for a version that does not exist, 400 for a bad body, 403 for a checker", async () => {
    expect((await restore(eddie, 9, { baseVersion: 4 })).status).toBe(404);
    const long = await restore(eddie, 1, { baseVersion: 4, message: "x".repeat(501) });
    expect(long.status).toBe(400);
    expect(long.body.error.fields[0].path).toBe("message");
    const missing = await restore(eddie, 1, {});
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields[0].path).toBe("baseVersion");
    const checker = await restore(chen, 1, { baseVersion: 4 });
    expect(checker.status).toBe(403);
    expect(checker.body.error.code).toBe("forbidden");
  });
});
