// Comments on a version: threads pinned to an element, a point or the whole version; replies;
// resolve and reopen; editing and deleting your own while your role may comment, each in the
// sketch's activity; @mentions mailed through the SMTP fake unless the member turned mail off;
// an approved version takes no new comments.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as commentRoute from "@/app/api/comments/[commentId]/route";
import * as commentsRoute from "@/app/api/sketches/[id]/versions/[number]/comments/route";
import * as signoffRoute from "@/app/api/sketches/[id]/versions/[number]/signoff/route";
import * as activityRoute from "@/app/api/sketches/[id]/activity/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import { db } from "@/db";
import { devMail, membership, user } from "@/db/schema";
import { call, withMailFake, makeAccount, makeTeam, waitForMail, type Person, type Json } from "./helpers";
import { authPoster } from "./auth-setup";
import { fixture } from "./sketch-fixtures";
import { postSketch } from "./sketch-setup";

let eddie: Person;
let chen: Person;
let olivia: Person;
let vera: Person;
let quiet: Person;
let ws: string;

withMailFake();
beforeAll(async () => {
  ({ ws, olivia, eddie, chen, vera, quiet } = await makeTeam("Comment bay", {
    olivia: { role: "owner", name: "Olivia Lead" },
    eddie: { role: "editor", name: "Eddie Drafter" },
    chen: { role: "checker", name: "Chen Checkwell" },
    vera: { role: "viewer", name: "Vera Reader" },
    quiet: { role: "checker", name: "Quinn Quiet" },
  }));
  await db.update(user).set({ emailNotifications: false }).where(eq(user.id, quiet.id));
});

async function newSketch(): Promise<string> {
  return postSketch(ws, eddie, "Skid for comments");
}
const p = (sketchId: string) => ({ id: sketchId, number: "1" });
const post = (sketchId: string, who: Person, body: Record<string, unknown>) => call(commentsRoute.POST, { method: "POST", params: p(sketchId), cookie: who.cookie, body });
const list = (sketchId: string, who: Person) => call(commentsRoute.GET, { params: p(sketchId), cookie: who.cookie });
const patch = (id: string, who: Person, body: Record<string, unknown>) => call(commentRoute.PATCH, { method: "PATCH", params: { commentId: id }, cookie: who.cookie, body });

describe("threads", () => {
  it("pins a thread to a support, answers it, resolves and reopens it", async () => {
    const id = await newSketch();
    const made = await post(id, chen, { body: "Is **μ = 0.4** right for steel on concrete?", pin: { kind: "element", elementId: "rear" } });
    expect(made.status).toBe(201);
    const point = await post(id, chen, { body: "Where does the drain channel run?", pin: { kind: "point", at: [1.2, -0.1] } });
    const whole = await post(id, olivia, { body: "Looks tidy overall." });
    expect([point.status, whole.status]).toEqual([201, 201]);
    expect((await post(id, eddie, { body: "Taken from the site survey, table 3.", parentId: made.body.comment.id })).status).toBe(201);

    const read = await list(id, vera);
    expect(read.status).toBe(200);
    expect(read.body.threads.map((t: { pin: unknown; comments: unknown[] }) => [t.pin, t.comments.length])).toEqual([
      [{ kind: "element", elementId: "rear" }, 2],
      [{ kind: "point", at: [1.2, -0.1] }, 1],
      [null, 1],
    ]);
    expect(read.body.threads[0].comments[1]).toMatchObject({ authorName: "Eddie Drafter", body: "Taken from the site survey, table 3.", deleted: false });
    expect(read.body.canComment).toBe(false); // a viewer reads
    expect((await list(id, chen)).body.canComment).toBe(true);

    const threadId = made.body.comment.id;
    expect((await patch(threadId, vera, { resolved: true })).status).toBe(403);
    expect((await patch(threadId, eddie, { resolved: true })).status).toBe(200);
    let t = (await list(id, chen)).body.threads[0];
    expect(t).toMatchObject({ resolvedByName: "Eddie Drafter" });
    expect(t.resolvedAt).not.toBeNull();
    expect((await patch(threadId, chen, { resolved: false })).status).toBe(200);
    t = (await list(id, chen)).body.threads[0];
    expect(t.resolvedAt).toBeNull();
    // a reply is not a thread
    const replyId = (await list(id, chen)).body.threads[0].comments[1].id;
    expect((await patch(replyId, chen, { resolved: true })).status).toBe(400);

    const feed = await call(activityRoute.GET, { params: { id }, cookie: vera.cookie });
    expect(feed.body.events.map((e: { action: string }) => e.action).slice(0, 6)).toEqual([
      "comment.reopen",
      "comment.resolve",
      "comment.create",
      "comment.create",
      "comment.create",
      "comment.create",
    ]);
    expect(feed.body.events.at(-1)).toMatchObject({ action: "sketch.create", actorName: "Eddie Drafter" });
  });

  it("edits and deletes only your own comments; a deleted reply keeps its place", async () => {
    const id = await newSketch();
    const root = (await post(id, chen, { body: "First remark" })).body.comment.id;
    const reply = (await post(id, eddie, { body: "An answer", parentId: root })).body.comment.id;
    expect((await patch(reply, chen, { body: "Not mine to edit" })).status).toBe(403);
    expect((await patch(reply, eddie, { body: "A better answer" })).status).toBe(200);
    expect((await call(commentRoute.DELETE, { method: "DELETE", params: { commentId: reply }, cookie: chen.cookie })).status).toBe(403);
    expect((await call(commentRoute.DELETE, { method: "DELETE", params: { commentId: reply }, cookie: eddie.cookie })).status).toBe(200);
    expect((await patch(reply, eddie, { body: "again" })).status).toBe(410);
    const thread = (await list(id, chen)).body.threads[0];
    expect(thread.comments[1]).toMatchObject({ deleted: true, body: "" });
    expect(thread.comments[0].editedAt).toBeNull();

    // a first comment deleted with no replies disappears
    const lone = (await post(id, chen, { body: "Never mind" })).body.comment.id;
    await call(commentRoute.DELETE, { method: "DELETE", params: { commentId: lone }, cookie: chen.cookie });
    expect((await list(id, chen)).body.threads).toHaveLength(1);
  });

  it("a member demoted to viewer keeps their comments but no longer edits, deletes or resolves them", async () => {
    const id = await newSketch();
    const demoted = await makeAccount("demoted", { name: "Dee Moted" });
    await db.insert(membership).values({ workspaceId: ws, userId: demoted.id, role: "checker" });
    const mine = (await post(id, demoted, { body: "Check the anchor bolts" })).body.comment.id;
    await db.update(membership).set({ role: "viewer" }).where(and(eq(membership.workspaceId, ws), eq(membership.userId, demoted.id)));
    const refused = [await patch(mine, demoted, { body: "rewritten as a viewer" }), await patch(mine, demoted, { resolved: true }), await call(commentRoute.DELETE, { method: "DELETE", params: { commentId: mine }, cookie: demoted.cookie })];
    expect(refused.map((r) => r.status)).toEqual([403, 403, 403]);
    expect(refused[0].body.error.message).toBe("Your role reads comments but does not write them, your own included.");
    const c = (await list(id, chen)).body.threads[0];
    expect(c.comments[0]).toMatchObject({ body: "Check the anchor bolts", deleted: false, editedAt: null });
    expect(c.resolvedAt).toBeNull();
    // promoted back, the author may change it again
    await db.update(membership).set({ role: "editor" }).where(and(eq(membership.workspaceId, ws), eq(membership.userId, demoted.id)));
    expect((await patch(mine, demoted, { body: "Check the anchor bolts (M16)" })).status).toBe(200);
  });

  it("records edits and deletions in the sketch's activity, without the deleted text", async () => {
    const id = await newSketch();
    const root = (await post(id, chen, { body: "Friction taken as 0.3" })).body.comment.id;
    const reply = (await post(id, eddie, { body: "From the site survey", parentId: root })).body.comment.id;
    expect((await patch(root, chen, { body: "Friction taken as 0.4" })).status).toBe(200);
    expect((await call(commentRoute.DELETE, { method: "DELETE", params: { commentId: reply }, cookie: eddie.cookie })).status).toBe(200);
    const feed = await call(activityRoute.GET, { params: { id }, cookie: vera.cookie });
    const [deleted, edited] = feed.body.events;
    expect(deleted).toMatchObject({ action: "comment.delete", actorName: "Eddie Drafter", detail: { number: 1, commentId: reply, reply: true } });
    expect(deleted.detail.note).toBeUndefined();
    expect(edited).toMatchObject({ action: "comment.edit", actorName: "Chen Checkwell", detail: { number: 1, commentId: root, reply: false, note: "Friction taken as 0.4" } });
    // the deleted reply's words leave the feed: its "replied on" entry no longer quotes it
    const posted = feed.body.events.find((e: Json) => e.action === "comment.create" && e.detail.commentId === reply);
    expect(posted).toMatchObject({ detail: { reply: true } });
    expect(posted.detail.note).toBeUndefined();
    expect(feed.body.events.find((e: Json) => e.action === "comment.create" && e.detail.commentId === root).detail.note).toBe("Friction taken as 0.3");
    // a refused change records nothing
    expect((await patch(root, eddie, { body: "not mine" })).status).toBe(403);
    expect((await call(activityRoute.GET, { params: { id }, cookie: vera.cookie })).body.events).toHaveLength(feed.body.events.length);
  });

  it("refuses bad pins, replies to replies, empty text and outsiders", async () => {
    const id = await newSketch();
    const outsider = await makeAccount("outsider");
    const root = (await post(id, chen, { body: "root" })).body.comment.id;
    const reply = (await post(id, chen, { body: "reply", parentId: root })).body.comment.id;
    const cases = [
      [await post(id, chen, { body: "x", pin: { kind: "element", elementId: "nope" } }), 400, "pin.elementId"],
      [await post(id, chen, { body: "x", pin: { kind: "point", at: [1, "a"] } }), 400, "pin.at.1"],
      [await post(id, chen, { body: "x", parentId: reply }), 400, "parentId"],
      [await post(id, chen, { body: "   " }), 400, "body"],
      [await post(id, chen, { body: "x".repeat(4001) }), 400, "body"],
      [await post(id, outsider, { body: "hello" }), 404, null],
      [await post(id, vera, { body: "a viewer writes" }), 403, null],
    ] as const;
    for (const [res, status, path] of cases) {
      expect(res.status).toBe(status);
      if (path) expect(res.body.error.fields.map((f: { path: string }) => f.path)).toContain(path);
    }
    // a number out of range is told so, with the range, not that it is not a number
    const far = await post(id, chen, { body: "x", pin: { kind: "point", at: [1e9, -1e9] } });
    expect(far.status).toBe(400);
    expect(far.body.error.fields).toEqual([
      { path: "pin.at.0", message: "The point is outside the allowed range: each coordinate is from −1,000,000 m to 1,000,000 m." },
      { path: "pin.at.1", message: "The point is outside the allowed range: each coordinate is from −1,000,000 m to 1,000,000 m." },
    ]);
    expect((await post(id, chen, { body: "x", pin: { kind: "point", at: [1, "a"] } })).body.error.fields[0].message).toBe("A coordinate is a number (m).");
    expect((await list(id, chen)).body.threads).toHaveLength(1);
    expect((await call(commentRoute.DELETE, { method: "DELETE", params: { commentId: root }, cookie: outsider.cookie })).status).toBe(404);
  });
});

describe("mentions", () => {
  it("mails the mentioned members, not the author, and nobody who turned mail off", async () => {
    const id = await newSketch();
    const before = (await db.select({ id: devMail.id }).from(devMail).orderBy(devMail.id)).at(-1)?.id ?? 0;
    const made = await post(id, chen, { body: "@Eddie Drafter please check the suction pressure; @olivia FYI; @Quinn Quiet too; and @Chen Checkwell (me)." });
    expect(made.status).toBe(201);
    expect(made.body.comment.mentions.sort()).toEqual([chen.id, eddie.id, olivia.id, quiet.id].sort());
    const toEddie = await waitForMail(eddie.email, { subject: /mentioned you on v1 of "Skid for comments"/, after: before });
    expect(toEddie.subject).toBe('Chen Checkwell mentioned you on v1 of "Skid for comments"');
    expect(toEddie.text).toContain("please check the suction pressure");
    // the link opens the comment's own thread on the version page
    expect(toEddie.text).toContain(`/workspaces/${ws}/sketches/${id}/versions/1#thread-${made.body.comment.id}`);
    await waitForMail(olivia.email, { subject: /mentioned you/, after: before });
    await new Promise((r) => setTimeout(r, 500));
    const rest = await db.select({ to: devMail.to }).from(devMail);
    const addressed = rest.slice(-50).flatMap((m) => m.to);
    expect(addressed).not.toContain(quiet.email.toLowerCase());
    expect((await db.select({ to: devMail.to, id: devMail.id }).from(devMail)).filter((m) => m.id > before && m.to.includes(chen.email.toLowerCase()))).toEqual([]);

    const read = await list(id, vera);
    expect(read.body.threads[0].comments[0].mentions.map((m: { name: string }) => m.name).sort()).toEqual(["Chen Checkwell", "Eddie Drafter", "Olivia Lead", "Quinn Quiet"]);
  });
});

describe("turning mention mail off and on again, from the account", () => {
  it("a member's own switch (POST /api/auth/update-user) stops the mails and starts them again", async () => {
    const vic = await makeAccount("comments-switch", { name: "Vic Switcher" });
    await db.insert(membership).values({ workspaceId: ws, userId: vic.id, role: "checker" });
    const setMail = (on: boolean) => authPoster("192.0.2.81")("/update-user", { emailNotifications: on }, { cookie: vic.cookie });
    const id = await newSketch();
    const mailsToVic = async (after: number) => (await db.select({ to: devMail.to, id: devMail.id }).from(devMail)).filter((m) => m.id > after && m.to.includes(vic.email.toLowerCase()));

    expect((await setMail(false)).status).toBe(200);
    const [row] = await db.select({ on: user.emailNotifications }).from(user).where(eq(user.id, vic.id));
    expect(row.on).toBe(false);
    const before = (await db.select({ id: devMail.id }).from(devMail).orderBy(devMail.id)).at(-1)?.id ?? 0;
    expect((await post(id, chen, { body: "@Vic Switcher, the rear foot please." })).status).toBe(201);
    // a mention of the author as well: once that one arrives, any mail to Vic would have been sent too
    expect((await post(id, chen, { body: "@Eddie Drafter, and the bend." })).status).toBe(201);
    await waitForMail(eddie.email, { subject: /mentioned you/, after: before });
    await new Promise((r) => setTimeout(r, 500));
    expect(await mailsToVic(before)).toEqual([]);

    expect((await setMail(true)).status).toBe(200);
    expect((await post(id, chen, { body: "@Vic Switcher, now the front foot." })).status).toBe(201);
    const mail = await waitForMail(vic.email, { subject: /mentioned you/, after: before });
    expect(mail.text).toContain("now the front foot");
    expect(await mailsToVic(before)).toHaveLength(1);
  });
});

describe("an approved version", () => {
  it("takes no new comments, replies, edits or resolutions, until its approval is withdrawn", async () => {
    const id = await newSketch();
    const root = (await post(id, chen, { body: "Before approval" })).body.comment.id;
    const step = (who: Person, s: string, note?: string) => call(signoffRoute.POST, { method: "POST", params: p(id), cookie: who.cookie, body: { step: s, note } });
    // its thread stays open: the check and the approval say why (a note is required over open threads)
    for (const [who, s, note] of [[eddie, "submit", undefined], [chen, "check", "The thread is a site note."], [olivia, "approve", "Approved with the site note open."]] as const) expect((await step(who, s, note)).status).toBe(200);
    const refused = [
      await post(id, chen, { body: "After approval" }),
      await post(id, chen, { body: "A reply", parentId: root }),
      await patch(root, chen, { body: "changed" }),
      await patch(root, chen, { resolved: true }),
      await call(commentRoute.DELETE, { method: "DELETE", params: { commentId: root }, cookie: chen.cookie }),
    ];
    expect(refused.map((r) => r.status)).toEqual([409, 409, 409, 409, 409]);
    expect(refused[0].body.error.code).toBe("review_state");
    expect(refused[0].body.error.message).toContain("This version is approved");
    const read = await list(id, chen);
    expect(read.body).toMatchObject({ locked: true, canComment: false });
    expect(read.body.threads[0].comments[0].body).toBe("Before approval");

    expect((await step(olivia, "withdraw", "Flow rate was wrong")).status).toBe(200);
    expect((await post(id, chen, { body: "After withdrawal" })).status).toBe(201);
  });
});

describe("threads left open on earlier versions", () => {
  const saveNext = (sketchId: string, base: number) =>
    call(versionsRoute.POST, { method: "POST", params: { id: sketchId }, cookie: eddie.cookie, body: { baseVersion: base, message: `after v${base}`, document: fixture("pump-skid-discharge") } });
  const listOf = (sketchId: string, number: number) => call(commentsRoute.GET, { params: { id: sketchId, number: String(number) }, cookie: chen.cookie });

  it("are counted on a later version, per version, until resolved; a deleted first comment with no replies is no thread", async () => {
    const id = await newSketch();
    const open = (await post(id, chen, { body: "Is the anchor bolt grade stated?" })).body.comment.id;
    const settled = (await post(id, chen, { body: "Check the nozzle load at the flange." })).body.comment.id;
    const slip = (await post(id, chen, { body: "typo" })).body.comment.id;
    expect((await patch(settled, eddie, { resolved: true })).status).toBe(200);
    expect((await call(commentRoute.DELETE, { method: "DELETE", params: { commentId: slip }, cookie: chen.cookie })).status).toBe(200);
    expect((await saveNext(id, 1)).status).toBe(201);
    expect((await listOf(id, 1)).body.earlierOpen).toEqual([]);
    expect((await listOf(id, 2)).body.earlierOpen).toEqual([{ number: 1, open: 1 }]);
    // a thread on v2 is no earlier thread of v2, but is one of v3
    await call(commentsRoute.POST, { method: "POST", params: { id, number: "2" }, cookie: chen.cookie, body: { body: "And the pad thickness?" } });
    expect((await saveNext(id, 2)).status).toBe(201);
    expect((await listOf(id, 2)).body.earlierOpen).toEqual([{ number: 1, open: 1 }]);
    expect((await listOf(id, 3)).body.earlierOpen).toEqual([{ number: 1, open: 1 }, { number: 2, open: 1 }]);
    expect((await patch(open, eddie, { resolved: true })).status).toBe(200);
    expect((await listOf(id, 3)).body.earlierOpen).toEqual([{ number: 2, open: 1 }]);
  });

  it("leave out an approved version's threads: they are locked and its approval stands", async () => {
    const id = await newSketch();
    await post(id, chen, { body: "Noted for the next revision." });
    const step = (who: Person, s: string, note?: string) => call(signoffRoute.POST, { method: "POST", params: p(id), cookie: who.cookie, body: { step: s, note } });
    // approved over its open thread, with the note that asks for
    for (const [who, s, note] of [[eddie, "submit", undefined], [chen, "check", "Noted for the next revision."], [olivia, "approve", "The thread is for the next revision."]] as const) expect((await step(who, s, note)).status).toBe(200);
    expect((await saveNext(id, 1)).status).toBe(201);
    expect((await listOf(id, 2)).body.earlierOpen).toEqual([]);
  });
});
