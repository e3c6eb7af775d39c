// A member removed or demoted loses the rights at once: their very next request, with the same
// session, is refused, and nothing it asked for is written. Two owners demoting each other at
// the same moment still leave one owner.
import { count, eq } from "drizzle-orm";
import sharp from "sharp";
import { beforeEach, describe, expect, it } from "vitest";
import * as commentsRoute from "@/app/api/sketches/[id]/versions/[number]/comments/route";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as uploadRoute from "@/app/api/uploads/[uploadId]/route";
import * as memberRoute from "@/app/api/workspaces/[id]/members/[userId]/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import * as workspacesRoute from "@/app/api/workspaces/route";
import { db } from "@/db";
import { comment, sketchVersion, upload } from "@/db/schema";
import { createUnderlay } from "@/lib/uploads/service";
import { call, makeAccount, makeTeam, makeWorkspace, roleOf, type Person } from "./helpers";
import { edited } from "./sketch-fixtures";
import { postSketch } from "./sketch-setup";

let owner: Person;
let member: Person;
let ws: string;
let sketchId: string;
let uploadId: string;
let png: Buffer;

beforeEach(async () => {
  ({ ws, owner, member } = await makeTeam("Revocation bay", { owner: "owner", member: "editor" }, { prefix: "revoke" }));
  sketchId = await postSketch(ws, member, "Skid");
  png = await sharp({ create: { width: 8, height: 6, channels: 3, background: "#ffffff" } }).png().toBuffer();
  uploadId = (await createUnderlay(sketchId, member, async () => ({ bytes: png, name: "ga.png" }))).id;
});

const versions = async () => Number((await db.select({ n: count() }).from(sketchVersion).where(eq(sketchVersion.sketchId, sketchId)))[0].n);
const comments = async () => Number((await db.select({ n: count() }).from(comment).where(eq(comment.body, "still here?")))[0].n);
const save = (base: number) =>
  call(versionsRoute.POST, { method: "POST", params: { id: sketchId }, cookie: member.cookie, body: { baseVersion: base, message: "after", document: edited("pump-skid-discharge", (d) => (d.title = "after")) } });
const fileStatus = async () => (await uploadRoute.GET(new Request(`http://127.0.0.1/api/uploads/${uploadId}`, { headers: { cookie: member.cookie } }), { params: Promise.resolve({ uploadId }) })).status;

describe("a member removed from the workspace", () => {
  it("is refused on the very next request with the same session: read, save, comment, files, listings", async () => {
    // with access: each of these works
    expect((await call(sketchRoute.GET, { params: { id: sketchId }, cookie: member.cookie })).status).toBe(200);
    expect(await fileStatus()).toBe(200);
    expect((await save(1)).status).toBe(201);

    expect((await call(memberRoute.DELETE, { method: "DELETE", params: { id: ws, userId: member.id }, cookie: owner.cookie })).status).toBe(200);
    expect(await roleOf(ws, member.id)).toBeNull();

    const before = { versions: await versions(), comments: await comments() };
    const answers = {
      sketch: (await call(sketchRoute.GET, { params: { id: sketchId }, cookie: member.cookie })).status,
      list: (await call(sketchesRoute.GET, { params: { id: ws }, cookie: member.cookie })).status,
      save: (await save(2)).status,
      comment: (await call(commentsRoute.POST, { method: "POST", params: { id: sketchId, number: "1" }, cookie: member.cookie, body: { body: "still here?" } })).status,
      file: await fileStatus(),
    };
    // 404, not 403: a former member is told nothing about the workspace any more
    expect(answers).toEqual({ sketch: 404, list: 404, save: 404, comment: 404, file: 404 });
    expect({ versions: await versions(), comments: await comments() }).toEqual(before);
    // still signed in, but the workspace is gone from their list
    const mine = await call(workspacesRoute.GET, { cookie: member.cookie });
    expect(mine.status).toBe(200);
    expect(JSON.stringify(mine.body)).not.toContain(ws);
  });
});

describe("a member demoted to viewer", () => {
  it("still reads, but the next save and upload are refused with 403 and write nothing", async () => {
    expect((await call(memberRoute.PATCH, { method: "PATCH", params: { id: ws, userId: member.id }, cookie: owner.cookie, body: { role: "viewer" } })).status).toBe(200);
    const before = await versions();
    const refused = await save(1);
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe("forbidden");
    expect(await versions()).toBe(before);
    const uploads = async () => Number((await db.select({ n: count() }).from(upload).where(eq(upload.sketchId, sketchId)))[0].n);
    const filesBefore = await uploads();
    await expect(createUnderlay(sketchId, member, async () => ({ bytes: png, name: "late.png" }))).rejects.toMatchObject({ code: "forbidden" });
    expect(await uploads()).toBe(filesBefore);
    expect((await call(sketchRoute.GET, { params: { id: sketchId }, cookie: member.cookie })).status).toBe(200);
    expect(await fileStatus()).toBe(200);
  });
});

describe("the last owner", () => {
  it("two owners demoting each other at the same moment: one succeeds, one owner remains", async () => {
    const other = await makeAccount("revoke-second-owner");
    const bay = await makeWorkspace("Two owners", [
      [owner, "owner"],
      [other, "owner"],
    ]);
    const [a, b] = await Promise.all([
      call(memberRoute.PATCH, { method: "PATCH", params: { id: bay, userId: other.id }, cookie: owner.cookie, body: { role: "viewer" } }),
      call(memberRoute.PATCH, { method: "PATCH", params: { id: bay, userId: owner.id }, cookie: other.cookie, body: { role: "viewer" } }),
    ]);
    expect([a.status, b.status].filter((s) => s === 200)).toHaveLength(1);
    // the loser was no longer an owner when its turn came (403), or was the last one (409)
    expect([403, 409]).toContain(a.status === 200 ? b.status : a.status);
    const roles = [await roleOf(bay, owner.id), await roleOf(bay, other.id)].sort();
    expect(roles).toEqual(["owner", "viewer"]);
  });

  it("two owners leaving at the same moment: one may go, one stays", async () => {
    const other = await makeAccount("revoke-leaver");
    const bay = await makeWorkspace("Two leavers", [
      [owner, "owner"],
      [other, "owner"],
    ]);
    const results = await Promise.all([
      call(memberRoute.DELETE, { method: "DELETE", params: { id: bay, userId: owner.id }, cookie: owner.cookie }),
      call(memberRoute.DELETE, { method: "DELETE", params: { id: bay, userId: other.id }, cookie: other.cookie }),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    expect([await roleOf(bay, owner.id), await roleOf(bay, other.id)].filter(Boolean)).toEqual(["owner"]);
  });
});
