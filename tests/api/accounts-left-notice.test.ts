// After "Leave", the workspaces list says which workspace was left. The page is given only the
// workspace's id and finds the name in the person's own "left the workspace" audit event, so an
// address made up by someone else cannot make it name a workspace.
import { describe, expect, it } from "vitest";
import * as memberRoute from "@/app/api/workspaces/[id]/members/[userId]/route";
import { leftWorkspaceName } from "@/lib/members";
import { call, makeAccount, makeWorkspace } from "./helpers";

describe("the name of a workspace just left", () => {
  it("is found for the person who left it, from their own leaving", async () => {
    const owner = await makeAccount("left-owner");
    const member = await makeAccount("left-member");
    const ws = await makeWorkspace("Weir Gate Actuators", [[owner, "owner"], [member, "checker"]]);
    expect(await leftWorkspaceName(member.id, ws)).toBeNull(); // still a member, never left

    const left = await call(memberRoute.DELETE, { method: "DELETE", params: { id: ws, userId: member.id }, cookie: member.cookie });
    expect(left.status).toBe(200);
    expect(await leftWorkspaceName(member.id, ws)).toBe("Weir Gate Actuators");
    // nobody else's leaving names it
    expect(await leftWorkspaceName(owner.id, ws)).toBeNull();
  });

  it("is not found for someone removed by an owner, nor for a malformed or unknown id", async () => {
    const owner = await makeAccount("left-owner-2");
    const member = await makeAccount("left-removed");
    const ws = await makeWorkspace("Culvert Screens", [[owner, "owner"], [member, "viewer"]]);
    const removed = await call(memberRoute.DELETE, { method: "DELETE", params: { id: ws, userId: member.id }, cookie: owner.cookie });
    expect(removed.status).toBe(200);
    expect(await leftWorkspaceName(member.id, ws)).toBeNull();
    expect(await leftWorkspaceName(member.id, "not-a-uuid")).toBeNull();
    expect(await leftWorkspaceName(member.id, undefined)).toBeNull();
    expect(await leftWorkspaceName(member.id, "6d656d6f-0000-4000-8000-0000000000ff")).toBeNull();
  });
});
