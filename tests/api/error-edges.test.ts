// The REST routes at their edges, as a script or a tab left open meets them: a session cookie that
// no longer names a session says so (not only "sign in"), and a viewer refused a save, a comment,
// a sign-off step or a fork is told the role they hold and who may.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import * as forkRoute from "@/app/api/sketches/[id]/fork/route";
import * as versionsRoute from "@/app/api/sketches/[id]/versions/route";
import * as commentsRoute from "@/app/api/sketches/[id]/versions/[number]/comments/route";
import * as signoffRoute from "@/app/api/sketches/[id]/versions/[number]/signoff/route";
import * as membersRoute from "@/app/api/workspaces/[id]/members/route";
import { db } from "@/db";
import { session, sketchVersion } from "@/db/schema";
import { createSketch } from "@/lib/sketches";
import { sessionTokenOf, call, makeTeam, signIn, type Person } from "./helpers";
import { fixture, parsedFixture } from "./sketch-fixtures";

const ENDED = "Your session has ended (it expired, you signed out, or your password was changed): sign in again.";
let owner: Person;
let viewer: Person;
let ws: string;
let sketchId: string;

beforeAll(async () => {
  ({ ws, owner, viewer } = await makeTeam("Edges bay", { owner: "owner", viewer: "viewer" }, { prefix: "edges" }));
  sketchId = (await createSketch(ws, owner, { title: "Edges skid", document: parsedFixture("pump-skid-discharge"), message: "v1" })).sketch.id;
});


describe("401: the session", () => {
  it("none sent: 'Sign in to continue.'", async () => {
    const res = await call(sketchRoute.GET, { params: { id: sketchId } });
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ error: { code: "unauthenticated", message: "Sign in to continue." } });
  });

  it("expired: the cookie is still sent, and the 401 says the session ended, on a read and on a save", async () => {
    const cookie = await signIn(owner.email);
    await db.update(session).set({ expiresAt: new Date(Date.now() - 60_000) }).where(eq(session.token, sessionTokenOf(cookie)));
    const read = await call(sketchRoute.GET, { params: { id: sketchId }, cookie });
    expect(read.status).toBe(401);
    expect(read.body.error).toEqual({ code: "unauthenticated", message: ENDED, reason: "session_ended" });
    const save = await call(versionsRoute.POST, { method: "POST", params: { id: sketchId }, cookie, body: { baseVersion: 1, document: fixture("pump-skid-discharge") } });
    expect(save.status).toBe(401);
    expect(save.body.error.reason).toBe("session_ended");
    expect(await db.select({ n: sketchVersion.number }).from(sketchVersion).where(eq(sketchVersion.sketchId, sketchId))).toEqual([{ n: 1 }]);
  });

  it("signed out elsewhere (the session row gone): the same words, on a workspace route too", async () => {
    const cookie = await signIn(owner.email);
    await db.delete(session).where(eq(session.token, sessionTokenOf(cookie)));
    const res = await call(membersRoute.GET, { params: { id: ws }, cookie });
    expect(res.status).toBe(401);
    expect(res.body.error).toMatchObject({ code: "unauthenticated", message: ENDED });
  });
});

describe("403: a viewer is told the role they hold", () => {
  it("saving a version", async () => {
    const res = await call(versionsRoute.POST, { method: "POST", params: { id: sketchId }, cookie: viewer.cookie, body: { baseVersion: 1, document: fixture("pump-skid-discharge") } });
    expect(res.status).toBe(403);
    expect(res.body.error.message).toBe("As a viewer in this workspace you may not save versions: that is for owners and editors.");
  });

  it("writing a comment", async () => {
    const res = await call(commentsRoute.POST, { method: "POST", params: { id: sketchId, number: "1" }, cookie: viewer.cookie, body: { body: "Looks light" } });
    expect(res.status).toBe(403);
    expect(res.body.error.message).toBe("As a viewer in this workspace you may not write comments: that is for owners, editors and checkers.");
  });

  it("each sign-off step", async () => {
    const words = {
      submit: "You are a viewer in this workspace: submitting is for the version's author, editors and owners.",
      check: "You are a viewer in this workspace: checking is for checkers and owners.",
      return: "You are a viewer in this workspace: returning a version is for checkers and owners.",
      approve: "You are a viewer in this workspace: approval is for owners of the workspace.",
      withdraw: "You are a viewer in this workspace: withdrawing an approval is for owners of the workspace.",
    };
    for (const [step, message] of Object.entries(words)) {
      const res = await call(signoffRoute.POST, { method: "POST", params: { id: sketchId, number: "1" }, cookie: viewer.cookie, body: { step, note: "A reason" } });
      expect(res.status, step).toBe(403);
      expect(res.body.error.message, step).toBe(message);
    }
  });

  it("forking into the workspace where they only read", async () => {
    const res = await call(forkRoute.POST, { method: "POST", params: { id: sketchId }, cookie: viewer.cookie, body: { workspaceId: ws } });
    expect(res.status).toBe(403);
    expect(res.body.error.message).toBe("As a viewer in that workspace you may not fork sketches into it: that is for owners and editors.");
  });
});
