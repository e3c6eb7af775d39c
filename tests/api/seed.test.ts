// The demo seed: one person per role in the demo workspace, all able to sign in; running it
// again changes nothing.
import { and, eq, inArray, isNull } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db";
import { invitation, membership, user, workspace } from "@/db/schema";
import { DEMO_PASSWORD, DEMO_USERS, DEMO_WORKSPACE_ID, DEMO_WORKSPACE_NAME, seedDemo } from "@/db/seed";
import { getAuth } from "@/lib/auth";

describe("demo seed", () => {
  it("makes the demo workspace with owner, editor, checker and viewer, idempotently", async () => {
    await seedDemo();
    await seedDemo();

    const [ws] = await db.select().from(workspace).where(eq(workspace.id, DEMO_WORKSPACE_ID));
    expect(ws.name).toBe(DEMO_WORKSPACE_NAME);
    const members = await db
      .select({ email: user.email, role: membership.role, verified: user.emailVerified })
      .from(membership)
      .innerJoin(user, eq(user.id, membership.userId))
      .where(eq(membership.workspaceId, DEMO_WORKSPACE_ID));
    expect(members.sort((a, b) => a.email.localeCompare(b.email))).toEqual([
      { email: "chen.checker@demo.counterpoise.local", role: "checker", verified: true },
      { email: "eddie.editor@demo.counterpoise.local", role: "editor", verified: true },
      { email: "olivia.owner@demo.counterpoise.local", role: "owner", verified: true },
      { email: "vera.viewer@demo.counterpoise.local", role: "viewer", verified: true },
    ]);

    const personal = await db.select({ of: workspace.personalOf }).from(workspace).where(inArray(workspace.personalOf, DEMO_USERS.map((u) => u.id)));
    expect(personal).toHaveLength(4);
    const pending = await db
      .select({ email: invitation.email })
      .from(invitation)
      .where(and(eq(invitation.workspaceId, DEMO_WORKSPACE_ID), isNull(invitation.acceptedAt), isNull(invitation.withdrawnAt)));
    expect(pending).toEqual([{ email: "pat.pending@demo.counterpoise.local" }]);
  });

  it("lets each demo person sign in with the demo password", async () => {
    for (const u of DEMO_USERS) {
      const res = await getAuth().api.signInEmail({ body: { email: u.email, password: DEMO_PASSWORD } });
      expect(res.user.email).toBe(u.email);
    }
  });
});
