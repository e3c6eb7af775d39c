// An owner who may not approve a checked version hears why from the sign-off read: they prepared
// it (or checked it), and, when no other owner of the workspace could approve it, how to get one.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as signoffRoute from "@/app/api/sketches/[id]/versions/[number]/signoff/route";
import { db } from "@/db";
import { membership } from "@/db/schema";
import { call, withMailFake, makeAccount, makeWorkspace, type Person } from "./helpers";
import { postSketch } from "./sketch-setup";

const PREPARED = "You prepared this version: another owner must approve it.";
const CHECKED = "You checked this version: another owner must approve it.";
const NO_OTHER_OWNER = "This workspace has no other owner: make a colleague an owner on the Members page to approve it.";

let olivia: Person, owen: Person, chen: Person, eddie: Person;

withMailFake();
beforeAll(async () => {
  [olivia, owen, chen, eddie] = await Promise.all(["appr-olivia", "appr-owen", "appr-chen", "appr-eddie"].map((n) => makeAccount(n)));
});

async function sketchIn(ws: string, who: Person, title: string): Promise<string> {
  return postSketch(ws, who, title, "pipe-bend-anchor");
}
const step = async (sketchId: string, who: Person, s: string) => {
  const r = await call(signoffRoute.POST, { method: "POST", params: { id: sketchId, number: "1" }, cookie: who.cookie, body: { step: s } });
  expect(r.status, `${s}: ${JSON.stringify(r.body)}`).toBe(200);
};
const read = async (sketchId: string, who: Person) => {
  const r = await call(signoffRoute.GET, { params: { id: sketchId, number: "1" }, cookie: who.cookie });
  expect(r.status).toBe(200);
  return r.body;
};

describe("why an owner may not approve a checked version", () => {
  it("the workspace's only owner prepared it: the reason, and that another owner is needed, until there is one", async () => {
    const ws = await makeWorkspace("Sole owner bay", [
      [olivia, "owner"],
      [chen, "checker"],
      [eddie, "editor"],
    ]);
    const id = await sketchIn(ws, olivia, "Sole owner's anchor");
    // before it is checked there is nothing to approve, so nothing to explain
    expect((await read(id, olivia)).approval).toBeNull();
    await step(id, olivia, "submit");
    await step(id, chen, "check");

    const mine = await read(id, olivia);
    expect(mine).toMatchObject({ state: "checked", sentence: "Checked; waiting for approval.", allowed: [] });
    expect(mine.approval).toEqual({ reason: PREPARED, remedy: NO_OTHER_OWNER, membersPath: `/workspaces/${ws}/members` });
    // the same reason the server gives when the step is tried
    const tried = await call(signoffRoute.POST, { method: "POST", params: { id, number: "1" }, cookie: olivia.cookie, body: { step: "approve" } });
    expect(tried.status).toBe(403);
    expect(tried.body.error.message).toBe(mine.approval.reason);
    // people who are not owners are not told about approving
    expect((await read(id, chen)).approval).toBeNull();
    expect((await read(id, eddie)).approval).toBeNull();

    // a colleague made an owner can approve it: the author hears only the reason now
    await db.update(membership).set({ role: "owner" }).where(and(eq(membership.workspaceId, ws), eq(membership.userId, eddie.id)));
    expect((await read(id, olivia)).approval).toEqual({ reason: PREPARED, remedy: null, membersPath: `/workspaces/${ws}/members` });
    const theirs = await read(id, eddie);
    expect(theirs.allowed).toEqual(["approve"]);
    expect(theirs.approval).toBeNull();
    await step(id, eddie, "approve");
    expect((await read(id, olivia)).approval).toBeNull();
  });

  it("two owners, one prepared it and the other checked it: each is told nobody else may approve it", async () => {
    const ws = await makeWorkspace("Two owner bay", [
      [olivia, "owner"],
      [owen, "owner"],
    ]);
    const id = await sketchIn(ws, olivia, "Two owners' anchor");
    await step(id, olivia, "submit");
    await step(id, owen, "check");
    expect((await read(id, olivia)).approval).toMatchObject({
      reason: PREPARED,
      remedy: "This workspace's only other owner checked this version: make another colleague an owner on the Members page to approve it.",
    });
    expect((await read(id, owen)).approval).toMatchObject({
      reason: CHECKED,
      remedy: "This workspace's only other owner prepared this version: make another colleague an owner on the Members page to approve it.",
    });
  });
});
