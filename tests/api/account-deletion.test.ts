// Deleting one's account: the password typed again; refused, naming the workspace, while the person
// is the last owner of a workspace others are in; workspaces only they are in go with it; their row
// stays as a tombstone so their name stays on what they did ("former member: <name>"), and their
// password, sessions and memberships go.
import { and, eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as accountRoute from "@/app/api/account/route";
import * as membersRoute from "@/app/api/workspaces/[id]/members/[userId]/route";
import * as commentsRoute from "@/app/api/sketches/[id]/versions/[number]/comments/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as workspacesRoute from "@/app/api/workspaces/route";
import { db } from "@/db";
import { account, auditEvent, membership, session, sketch, user, workspace } from "@/db/schema";
import { getAuth } from "@/lib/auth";
import { call, makeAccount, makeWorkspace, PASSWORD, waitForMail, withMailFake, type Json, type Person } from "./helpers";
import { postSketch } from "./sketch-setup";

withMailFake();

const remove = (who: Person, body: Record<string, unknown>) => call(accountRoute.DELETE, { method: "DELETE", cookie: who.cookie, body });
const personalOf = async (userId: string) => (await db.select().from(workspace).where(eq(workspace.personalOf, userId)))[0];

describe("deleting an account", () => {
  let olivia: Person, eddie: Person, vera: Person;
  let shared: string;
  let sketchId: string;
  let eddiePersonal: { id: string; name: string };

  beforeAll(async () => {
    olivia = await makeAccount("acct-del-olivia", { name: "Olivia Lead" });
    eddie = await makeAccount("acct-del-eddie", { name: "Eddie Drafter" });
    vera = await makeAccount("acct-del-vera", { name: "Vera Reader" });
    shared = await makeWorkspace("Penstock 3", [
      [olivia, "owner"],
      [eddie, "editor"],
      [vera, "viewer"],
    ]);
    sketchId = await postSketch(shared, eddie, "Penstock anchor", "pipe-bend-anchor");
    expect((await call(commentsRoute.POST, { method: "POST", params: { id: sketchId, number: "1" }, cookie: eddie.cookie, body: { body: "Thrust block sized for the surge case." } })).status).toBe(201);
    const mine = await personalOf(eddie.id);
    expect(mine).toBeDefined();
    eddiePersonal = { id: mine.id, name: mine.name };
    await postSketch(mine.id, eddie, "Scratch bracket", "pipe-bend-anchor");
  });

  it("is refused while they are the only owner of a workspace with other members, naming it; nothing changes", async () => {
    const out = await remove(olivia, { password: PASSWORD });
    expect(out.status).toBe(409);
    expect(out.body.error.code).toBe("last_owner");
    expect(out.body.error.message).toBe("You are the only owner of “Penstock 3”, which has other members: make one of them an owner, or delete the workspace, before deleting your account.");
    expect(out.body.error.workspaces).toEqual([{ id: shared, name: "Penstock 3", members: 3 }]);
    expect((await call(workspacesRoute.GET, { cookie: olivia.cookie })).status).toBe(200);
  });

  it("asks for the password, naming the field, and deletes nothing on a wrong one", async () => {
    const none = await remove(eddie, {});
    expect(none.status).toBe(400);
    expect(none.body.error.fields).toEqual([{ path: "password", message: "Required: type your password to confirm." }]);
    const wrong = await remove(eddie, { password: "not-the-password" });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields).toEqual([{ path: "password", message: "That is not your password." }]);
    const [row] = await db.select().from(user).where(eq(user.id, eddie.id));
    expect(row).toMatchObject({ name: "Eddie Drafter", email: eddie.email, deletedAt: null });
    expect((await call(workspacesRoute.GET, { cookie: eddie.cookie })).status).toBe(200);
  });

  it("deletes it with the password: workspaces only they were in go, they leave the others, their sessions end", async () => {
    const out = await remove(eddie, { password: PASSWORD });
    expect(out.status).toBe(200);
    expect(out.body.account).toEqual({ deleted: true, workspacesDeleted: [eddiePersonal.name], left: ["Penstock 3"] });
    // signed out everywhere: the cookie's session is gone
    const after = await call(workspacesRoute.GET, { cookie: eddie.cookie });
    expect(after.status).toBe(401);
    expect(await db.select().from(session).where(eq(session.userId, eddie.id))).toEqual([]);
    expect(await db.select().from(account).where(eq(account.userId, eddie.id))).toEqual([]);
    expect(await db.select().from(membership).where(eq(membership.userId, eddie.id))).toEqual([]);
    const [ws] = await db.select().from(workspace).where(eq(workspace.id, eddiePersonal.id));
    expect(ws.deletedAt).not.toBeNull();
    // the old address and password no longer sign in
    await expect(getAuth().api.signInEmail({ body: { email: eddie.email, password: PASSWORD } })).rejects.toThrow();
  });

  it("keeps the row as a tombstone: the name as a former member, the address freed", async () => {
    const [row] = await db.select().from(user).where(eq(user.id, eddie.id));
    expect(row.name).toBe("former member: Eddie Drafter");
    expect(row.email).toBe(`deleted-${eddie.id.toLowerCase()}@deleted.invalid`);
    expect(row.emailNotifications).toBe(false);
    expect(row.deletedAt).not.toBeNull();
  });

  it("leaves their name on their versions and comments in the shared workspace", async () => {
    const versions = await call(versionsRoute.GET, { params: { id: sketchId }, cookie: olivia.cookie });
    expect(versions.status).toBe(200);
    expect(versions.body.versions.map((v: Json) => v.authorName)).toEqual(["former member: Eddie Drafter"]);
    const comments = await call(commentsRoute.GET, { params: { id: sketchId, number: "1" }, cookie: vera.cookie });
    expect(JSON.stringify(comments.body)).toContain("former member: Eddie Drafter");
  });

  it("records it in the audit log: a leave in each shared workspace, and the deletion itself", async () => {
    const leave = await db.select().from(auditEvent).where(and(eq(auditEvent.workspaceId, shared), eq(auditEvent.action, "member.leave"), eq(auditEvent.actorId, eddie.id)));
    expect(leave).toHaveLength(1);
    expect(leave[0].detail).toMatchObject({ email: eddie.email, name: "Eddie Drafter", role: "editor", accountDeleted: true });
    const [del] = await db.select().from(auditEvent).where(and(eq(auditEvent.action, "auth.account_delete"), eq(auditEvent.targetId, eddie.id)));
    expect(del).toMatchObject({ actorId: eddie.id, actorEmail: eddie.email });
    expect(del.detail).toMatchObject({ name: "Eddie Drafter", workspacesDeleted: [eddiePersonal.name], left: [{ id: shared, name: "Penstock 3", role: "editor" }] });
  });

  it("mails the old address what happened", async () => {
    const mail = await waitForMail(eddie.email, { subject: /^Your Counterpoise account was deleted$/ });
    expect(mail.text).toContain(`The workspaces only you were in were deleted with it: "${eddiePersonal.name}".`);
    expect(mail.text).toContain('under the name "former member: Eddie Drafter"');
  });

  it("goes through for the last owner once another member is made an owner", async () => {
    expect((await call(membersRoute.PATCH, { method: "PATCH", params: { id: shared, userId: vera.id }, cookie: olivia.cookie, body: { role: "owner" } })).status).toBe(200);
    const out = await remove(olivia, { password: PASSWORD });
    expect(out.status).toBe(200);
    expect(out.body.account.left).toEqual(["Penstock 3"]);
    expect(await db.select({ userId: membership.userId, role: membership.role }).from(membership).where(eq(membership.workspaceId, shared))).toEqual([{ userId: vera.id, role: "owner" }]);
  });
});

describe("a deletion refused at its last look", () => {
  it("deletes nothing, not even the workspace only they were in, when the other owner steps down while it waits", async () => {
    const ada = await makeAccount("acct-del-race-ada", { name: "Ada Sizer" });
    const ben = await makeAccount("acct-del-race-ben", { name: "Ben Checker" });
    const cal = await makeAccount("acct-del-race-cal", { name: "Cal Drafter" });
    const shared = await makeWorkspace("Spillway 2", [
      [ada, "owner"],
      [ben, "owner"],
      [cal, "editor"],
    ]);
    const mine = await personalOf(ada.id);
    const solo = await postSketch(mine.id, ada, "Gate hoist frame", "pipe-bend-anchor");

    // Ben steps down in a transaction that holds his membership row until the deletion waits on it
    let release!: () => void;
    const released = new Promise<void>((resolve) => (release = resolve));
    let blockerPid!: number;
    let stepped!: () => void;
    const steppedDown = new Promise<void>((resolve) => (stepped = resolve));
    const blocker = db.transaction(async (tx) => {
      await tx.update(membership).set({ role: "editor" }).where(and(eq(membership.workspaceId, shared), eq(membership.userId, ben.id)));
      blockerPid = Number((await tx.execute<{ pid: number }>(sql`select pg_backend_pid() as pid`)).rows[0].pid);
      stepped();
      await released;
    });
    await steppedDown;
    const deletion = remove(ada, { password: PASSWORD });
    // the deletion's transaction waits for Ben's row (its first look, before the lock, still saw two owners)
    for (;;) {
      const { rows } = await db.execute<{ n: number }>(sql`select count(*)::int as n from pg_stat_activity where ${blockerPid}::int = any(pg_blocking_pids(pid))`);
      if (Number(rows[0].n) > 0) break;
      await new Promise((resolve) => setTimeout(resolve, 20));
    }
    release();
    await blocker;

    const out = await deletion;
    expect(out.status).toBe(409);
    expect(out.body.error.code).toBe("last_owner");
    expect(out.body.error.workspaces).toEqual([{ id: shared, name: "Spillway 2", members: 3 }]);
    // all or nothing: the solo workspace and its sketch are still there, and so is the account
    const [ws] = await db.select().from(workspace).where(eq(workspace.id, mine.id));
    expect(ws.deletedAt).toBeNull();
    const [kept] = await db.select().from(sketch).where(eq(sketch.id, solo));
    expect(kept.title).toBe("Gate hoist frame");
    expect(await db.select().from(auditEvent).where(and(eq(auditEvent.workspaceId, mine.id), eq(auditEvent.action, "workspace.delete")))).toEqual([]);
    const [row] = await db.select().from(user).where(eq(user.id, ada.id));
    expect(row).toMatchObject({ name: "Ada Sizer", email: ada.email, deletedAt: null });
    expect((await call(workspacesRoute.GET, { cookie: ada.cookie })).status).toBe(200);
    expect((await db.select({ role: membership.role }).from(membership).where(and(eq(membership.workspaceId, shared), eq(membership.userId, ada.id))))[0].role).toBe("owner");
  });
});
