// Deleting a workspace: owners only, the name typed again; its sketches go the way a deleted sketch
// goes (an audit record each, so links say "deleted"), its files leave the store, its members are
// told by mail and lose it, its open invitations stop working, and the row stays as a tombstone so
// the audit log, the record of what was done in it, survives.
import { and, arrayContains, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as workspaceRoute from "@/app/api/workspaces/[id]/route";
import * as workspacesRoute from "@/app/api/workspaces/route";
import * as invitationRoute from "@/app/api/invitations/[token]/route";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import * as sketchUploadsRoute from "@/app/api/sketches/[id]/uploads/route";
import * as commentsRoute from "@/app/api/sketches/[id]/versions/[number]/comments/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import * as exportRoute from "@/app/api/workspaces/[id]/export/route";
import { db } from "@/db";
import { auditEvent, comment, devMail, invitation, membership, sketch, sketchVersion, upload, workspace } from "@/db/schema";
import { appOrigin } from "@/lib/env";
import { hashInvitationToken, newInvitationToken } from "@/lib/invitations";
import { objectExists } from "@/lib/storage";
import { markedDrawing } from "../fixtures/uploads";
import { call, makeAccount, makeTeam, uniqueEmail, waitForMail, withMailFake, type Json, type Person } from "./helpers";
import { postSketch } from "./sketch-setup";

withMailFake();

const remove = (ws: string, who: Person, confirmName: unknown) => call(workspaceRoute.DELETE, { method: "DELETE", params: { id: ws }, cookie: who.cookie, body: { confirmName } });

async function underlay(sketchId: string, who: Person): Promise<Json> {
  const form = new FormData();
  form.set("file", new Blob([new Uint8Array(await markedDrawing())], { type: "image/png" }), "ga.png");
  const req = new Request(`${appOrigin()}/api/sketches/${sketchId}/uploads`, { method: "POST", headers: { cookie: who.cookie, origin: appOrigin() }, body: form });
  const res = await (sketchUploadsRoute.POST as unknown as (r: Request, c: { params: Promise<Record<string, string>> }) => Promise<Response>)(req, { params: Promise.resolve({ id: sketchId }) });
  expect(res.status).toBe(201);
  return (await res.json()).upload;
}

describe("deleting a workspace", () => {
  let ws: string;
  let olivia: Person, eddie: Person, chen: Person, vera: Person, outsider: Person;
  let sketchA: string, sketchB: string;
  let keys: string[];
  let invitationToken: string;
  let startedAt: number;

  beforeAll(async () => {
    ({ ws, olivia, eddie, chen, vera } = await makeTeam("Pump house 7", {
      olivia: { role: "owner", name: "Olivia Closer" },
      eddie: { role: "editor", name: "Eddie Drafter" },
      chen: "checker",
      vera: "viewer",
    }));
    outsider = await makeAccount("ws-del-outsider");
    sketchA = await postSketch(ws, eddie, "Discharge bend", "pipe-bend-anchor");
    sketchB = await postSketch(ws, eddie, "Skid frame", "pump-skid-discharge");
    expect((await call(commentsRoute.POST, { method: "POST", params: { id: sketchA, number: "1" }, cookie: chen.cookie, body: { body: "Check the anchor bolts." } })).status).toBe(201);
    await underlay(sketchA, eddie);
    const rows = await db.select().from(upload).where(eq(upload.workspaceId, ws));
    keys = rows.flatMap((r) => [r.storageKey, r.thumbnailKey]);
    expect(keys).toHaveLength(2);
    for (const k of keys) expect(await objectExists(k)).toBe(true);
    invitationToken = newInvitationToken();
    await db.insert(invitation).values({ workspaceId: ws, email: uniqueEmail("ws-del-invitee"), role: "viewer", tokenHash: hashInvitationToken(invitationToken), invitedBy: olivia.id, expiresAt: new Date(Date.now() + 3600_000) });
  });

  it("is refused to every role but owner, and to outsiders as a workspace they cannot see", async () => {
    for (const who of [eddie, chen, vera]) {
      const out = await remove(ws, who, "Pump house 7");
      expect(out.status).toBe(403);
      expect(out.body.error.message).toMatch(/may not delete the workspace: that is for owners\.$/);
    }
    expect((await remove(ws, outsider, "Pump house 7")).status).toBe(404);
    const [row] = await db.select().from(workspace).where(eq(workspace.id, ws));
    expect(row.deletedAt).toBeNull();
  });

  it("asks for the name typed again, naming the field, and deletes nothing otherwise", async () => {
    const missing = await call(workspaceRoute.DELETE, { method: "DELETE", params: { id: ws }, cookie: olivia.cookie, body: {} });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields).toEqual([expect.objectContaining({ path: "confirmName" })]);
    const wrong = await remove(ws, olivia, "Pump house 8");
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields).toEqual([{ path: "confirmName", message: "Type “Pump house 7” to confirm." }]);
    const caseDiffers = await remove(ws, olivia, "pump house 7");
    expect(caseDiffers.status).toBe(400);
    expect(await db.select().from(sketch).where(eq(sketch.workspaceId, ws))).toHaveLength(2);
  });

  it("lets the owner take the copy the dialog offers first: the export holds every sketch", async () => {
    const copy = await call(exportRoute.GET, { params: { id: ws }, cookie: olivia.cookie });
    expect(copy.status).toBe(200);
    expect(copy.body.sketches.map((s: Json) => s.title)).toEqual(["Discharge bend", "Skid frame"]);
  });

  it("deletes it for the owner: sketches, versions, comments, files, members; says what went", async () => {
    startedAt = Date.now();
    const out = await remove(ws, olivia, "  Pump house   7 ");
    expect(out.status).toBe(200);
    expect(out.body.workspace).toMatchObject({ id: ws, name: "Pump house 7", deleted: true, contents: { sketches: 2, versions: 2, approved: 0, comments: 1, uploads: 1, members: 4 } });
    expect(await db.select().from(sketch).where(eq(sketch.workspaceId, ws))).toHaveLength(0);
    expect(await db.select().from(sketchVersion).where(eq(sketchVersion.sketchId, sketchA))).toHaveLength(0);
    expect(await db.select().from(comment).innerJoin(sketchVersion, eq(sketchVersion.id, comment.versionId)).where(eq(sketchVersion.sketchId, sketchA))).toHaveLength(0);
    expect(await db.select().from(upload).where(eq(upload.workspaceId, ws))).toHaveLength(0);
    for (const k of keys) expect(await objectExists(k)).toBe(false);
    expect(await db.select().from(membership).where(eq(membership.workspaceId, ws))).toHaveLength(0);
    // the tombstone: name kept, when and by whom
    const [row] = await db.select().from(workspace).where(eq(workspace.id, ws));
    expect(row).toMatchObject({ name: "Pump house 7", deletedBy: olivia.id, personalOf: null });
    expect(row.deletedAt!.getTime()).toBeGreaterThanOrEqual(startedAt - 1000);
  });

  it("keeps the audit log: each sketch's deletion and the workspace's, with its counts and members", async () => {
    const events = await db.select().from(auditEvent).where(eq(auditEvent.workspaceId, ws));
    expect(events.filter((e) => e.action === "sketch.create")).toHaveLength(2);
    const sketchDeletes = events.filter((e) => e.action === "sketch.delete");
    expect(sketchDeletes.map((e) => e.targetId).sort()).toEqual([sketchA, sketchB].sort());
    expect(sketchDeletes[0].detail).toMatchObject({ withWorkspace: true });
    const [del] = events.filter((e) => e.action === "workspace.delete");
    expect(del).toMatchObject({ actorId: olivia.id, actorEmail: olivia.email, targetType: "workspace", targetId: ws });
    expect(del.detail).toMatchObject({ name: "Pump house 7", sketches: 2, versions: 2, comments: 1, uploads: 1, members: 4 });
    expect((del.detail.memberIds as string[]).sort()).toEqual([olivia.id, eddie.id, chen.id, vera.id].sort());
    expect(del.detail.formerMembers).toContainEqual({ email: eddie.email, name: "Eddie Drafter", role: "editor" });
  });

  it("mails every other member, naming who deleted it and what went", async () => {
    for (const who of [eddie, chen, vera]) {
      const mail = await waitForMail(who.email, { subject: /"Pump house 7" was deleted/ });
      expect(mail.text).toContain('Olivia Closer deleted the workspace "Pump house 7"');
      expect(mail.text).toContain("Its 2 sketches with their 2 versions, comments, sign-offs and uploaded files were deleted");
    }
    // the one who deleted it is not mailed (all mails went out before the answer)
    const toOlivia = await db.select().from(devMail).where(arrayContains(devMail.to, [olivia.email.toLowerCase()]));
    expect(toOlivia.filter((m) => m.subject.includes("was deleted"))).toEqual([]);
  });

  it("tells a former member what happened on its addresses and its sketches' (a 404 with who and when)", async () => {
    const got = await call(workspaceRoute.GET, { params: { id: ws }, cookie: vera.cookie });
    expect(got.status).toBe(404);
    expect(got.body.error.message).toMatch(/^The workspace “Pump house 7” was deleted by Olivia Closer on \d{1,2} \w{3} \d{4}, \d\d:\d\d UTC, with its sketches, their versions, comments and files\.$/);
    expect(got.body.error.workspaceDeleted).toMatchObject({ workspaceId: ws, name: "Pump house 7", deletedBy: "Olivia Closer" });
    const list = await call(sketchesRoute.GET, { params: { id: ws }, cookie: eddie.cookie });
    expect(list.status).toBe(404);
    expect(list.body.error.workspaceDeleted).toBeDefined();
    const s = await call(sketchRoute.GET, { params: { id: sketchA }, cookie: chen.cookie });
    expect(s.status).toBe(404);
    expect(s.body.error.message).toMatch(/^“Discharge bend” was deleted by Olivia Closer on .* UTC with the workspace it was in, and all its versions\./);
  });

  it("is final at once: no copy can be had afterwards, not even by the owner who deleted it", async () => {
    const late = await call(exportRoute.GET, { params: { id: ws }, cookie: olivia.cookie });
    expect(late.status).toBe(404);
    expect(late.body.error.workspaceDeleted).toMatchObject({ workspaceId: ws, deletedBy: "Olivia Closer" });
    expect(late.res.headers.get("content-disposition")).toBeNull();
    // and it cannot be undone by deleting again with the right name (there is nothing left to act on)
    expect((await remove(ws, olivia, "Pump house 7")).status).toBe(404);
  });

  it("tells an outsider nothing: the words of a workspace and a sketch that never were", async () => {
    const got = await call(workspaceRoute.GET, { params: { id: ws }, cookie: outsider.cookie });
    expect(got.status).toBe(404);
    expect(got.body.error.message).toBe("No such workspace, or you are not a member of it.");
    const s = await call(sketchRoute.GET, { params: { id: sketchA }, cookie: outsider.cookie });
    expect(JSON.stringify(s.body)).not.toContain("Discharge bend");
  });

  it("leaves it off every former member's list, withdraws its open invitations, and cannot be deleted twice", async () => {
    for (const who of [olivia, eddie]) {
      const mine = await call(workspacesRoute.GET, { cookie: who.cookie });
      expect(mine.body.workspaces.map((w: Json) => w.id)).not.toContain(ws);
    }
    const [inv] = await db.select().from(invitation).where(and(eq(invitation.workspaceId, ws), eq(invitation.tokenHash, hashInvitationToken(invitationToken))));
    expect(inv.withdrawnAt).not.toBeNull();
    // the link says why it no longer works
    const link = await call(invitationRoute.GET, { params: { token: invitationToken } });
    expect(link.status).toBe(410);
    expect(link.body.error).toMatchObject({ code: "invitation_withdrawn", workspaceDeleted: true, workspaceName: "Pump house 7" });
    expect(link.body.error.message).toBe('This workspace was deleted. "Pump house 7" was deleted after this invitation was sent, so there is nothing to join. Olivia Closer invited you, if you want to ask why.');
    const again = await remove(ws, olivia, "Pump house 7");
    expect(again.status).toBe(404);
  });
});

describe("deleting a workspace with an approved version", () => {
  it("counts the approved versions among what goes (they go with their sign-off records)", async () => {
    const { ws, olivia, eddie } = await makeTeam("Approved bay", { olivia: "owner", eddie: "editor" }, { prefix: "ws-del-appr" });
    const id = await postSketch(ws, eddie, "Anchor block", "pipe-bend-anchor");
    await db.update(sketchVersion).set({ reviewState: "approved" }).where(eq(sketchVersion.sketchId, id));
    const out = await remove(ws, olivia, "Approved bay");
    expect(out.status).toBe(200);
    expect(out.body.workspace.contents).toMatchObject({ sketches: 1, versions: 1, approved: 1, members: 2 });
  });
});
