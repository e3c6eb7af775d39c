// Each role's allowed and refused actions on members, invitations, the audit log and the
// workspace, from one table. Every case runs in a fresh workspace: owner, editor, checker and
// viewer, plus a "target" viewer to act upon; an outsider and a signed-out caller complete the row.
import { and, eq, isNull } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import * as auditRoute from "@/app/api/workspaces/[id]/audit/route";
import * as invitationRoute from "@/app/api/workspaces/[id]/invitations/[invitationId]/route";
import * as invitationsRoute from "@/app/api/workspaces/[id]/invitations/route";
import * as memberRoute from "@/app/api/workspaces/[id]/members/[userId]/route";
import * as membersRoute from "@/app/api/workspaces/[id]/members/route";
import * as workspaceRoute from "@/app/api/workspaces/[id]/route";
import { db } from "@/db";
import { invitation, workspace } from "@/db/schema";
import { hashInvitationToken } from "@/lib/invitations";
import { withMailFake, makeAccount, makeBareUser, makeWorkspace, roleOf, call, type Person } from "./helpers";

type Caller = "owner" | "editor" | "checker" | "viewer" | "outsider" | "signedOut";
const CALLERS: Caller[] = ["owner", "editor", "checker", "viewer", "outsider", "signedOut"];

type Fixture = { ws: string; target: { id: string; email: string }; invitationId: string };
type Case = {
  action: string;
  expect: Record<Caller, number>;
  run: (f: Fixture, cookie: string, self: string) => ReturnType<typeof call>;
  /** What the database shows afterwards, when the action was allowed and when it was refused. */
  effect?: { read: (f: Fixture, self: string) => Promise<unknown>; allowed: unknown; refused: unknown };
};

const p = (f: Fixture, extra: Record<string, string> = {}) => ({ id: f.ws, ...extra });
const openInvitation = async (f: Fixture) =>
  (await db.select({ id: invitation.id }).from(invitation).where(and(eq(invitation.id, f.invitationId), isNull(invitation.withdrawnAt)))).length;
const workspaceName = async (f: Fixture) => (await db.select({ name: workspace.name }).from(workspace).where(eq(workspace.id, f.ws)))[0].name;

const CASES: Case[] = [
  {
    action: "list members",
    expect: { owner: 200, editor: 200, checker: 200, viewer: 200, outsider: 404, signedOut: 401 },
    run: (f, cookie) => call(membersRoute.GET, { params: p(f), cookie }),
  },
  {
    action: "read the workspace",
    expect: { owner: 200, editor: 200, checker: 200, viewer: 200, outsider: 404, signedOut: 401 },
    run: (f, cookie) => call(workspaceRoute.GET, { params: p(f), cookie }),
  },
  {
    action: "rename the workspace",
    expect: { owner: 200, editor: 403, checker: 403, viewer: 403, outsider: 404, signedOut: 401 },
    run: (f, cookie) => call(workspaceRoute.PATCH, { method: "PATCH", params: p(f), cookie, body: { name: "Renamed bay" } }),
    effect: { read: workspaceName, allowed: "Renamed bay", refused: "Role matrix" },
  },
  {
    action: "change another member's role",
    expect: { owner: 200, editor: 403, checker: 403, viewer: 403, outsider: 404, signedOut: 401 },
    run: (f, cookie) => call(memberRoute.PATCH, { method: "PATCH", params: p(f, { userId: f.target.id }), cookie, body: { role: "editor" } }),
    effect: { read: (f) => roleOf(f.ws, f.target.id), allowed: "editor", refused: "viewer" },
  },
  {
    action: "demote yourself (the owner is the last one)",
    expect: { owner: 409, editor: 403, checker: 403, viewer: 403, outsider: 404, signedOut: 401 },
    run: (f, cookie, self) => call(memberRoute.PATCH, { method: "PATCH", params: p(f, { userId: self }), cookie, body: { role: "viewer" } }),
  },
  {
    action: "remove another member",
    expect: { owner: 200, editor: 403, checker: 403, viewer: 403, outsider: 404, signedOut: 401 },
    run: (f, cookie) => call(memberRoute.DELETE, { method: "DELETE", params: p(f, { userId: f.target.id }), cookie }),
    effect: { read: (f) => roleOf(f.ws, f.target.id), allowed: null, refused: "viewer" },
  },
  {
    action: "leave the workspace",
    expect: { owner: 409, editor: 200, checker: 200, viewer: 200, outsider: 404, signedOut: 401 },
    run: (f, cookie, self) => call(memberRoute.DELETE, { method: "DELETE", params: p(f, { userId: self }), cookie }),
  },
  {
    action: "list invitations",
    expect: { owner: 200, editor: 403, checker: 403, viewer: 403, outsider: 404, signedOut: 401 },
    run: (f, cookie) => call(invitationsRoute.GET, { params: p(f), cookie }),
  },
  {
    action: "invite by e-mail",
    expect: { owner: 201, editor: 403, checker: 403, viewer: 403, outsider: 404, signedOut: 401 },
    run: (f, cookie) => call(invitationsRoute.POST, { method: "POST", params: p(f), cookie, body: { email: "new.colleague@test.counterpoise.local", role: "checker" } }),
    effect: {
      read: async (f) => (await db.select({ id: invitation.id }).from(invitation).where(and(eq(invitation.workspaceId, f.ws), eq(invitation.email, "new.colleague@test.counterpoise.local")))).length,
      allowed: 1,
      refused: 0,
    },
  },
  {
    action: "withdraw an invitation",
    expect: { owner: 200, editor: 403, checker: 403, viewer: 403, outsider: 404, signedOut: 401 },
    run: (f, cookie) => call(invitationRoute.DELETE, { method: "DELETE", params: p(f, { invitationId: f.invitationId }), cookie }),
    effect: { read: openInvitation, allowed: 0, refused: 1 },
  },
  {
    action: "read the audit log",
    expect: { owner: 200, editor: 403, checker: 403, viewer: 403, outsider: 404, signedOut: 401 },
    run: (f, cookie) => call(auditRoute.GET, { params: p(f), cookie }),
  },
];

describe("what each role may do with members and invitations", () => {
  const people = {} as Record<Exclude<Caller, "signedOut">, Person>;

  withMailFake();
  beforeAll(async () => {
    for (const r of ["owner", "editor", "checker", "viewer", "outsider"] as const) people[r] = await makeAccount(r);
  });

  async function fixture(): Promise<Fixture> {
    const target = await makeBareUser("target");
    const ws = await makeWorkspace("Role matrix", [
      [people.owner, "owner"],
      [people.editor, "editor"],
      [people.checker, "checker"],
      [people.viewer, "viewer"],
      [target, "viewer"],
    ]);
    const [inv] = await db
      .insert(invitation)
      .values({ workspaceId: ws, email: `pending-${ws.slice(0, 8)}@test.counterpoise.local`, role: "viewer", tokenHash: hashInvitationToken(ws), invitedBy: people.owner.id, expiresAt: new Date(Date.now() + 3600_000) })
      .returning({ id: invitation.id });
    return { ws, target, invitationId: inv.id };
  }

  for (const c of CASES) {
    for (const caller of CALLERS) {
      const expected = c.expect[caller];
      it(`${c.action}: ${caller} → ${expected}`, async () => {
        const f = await fixture();
        const person = caller === "signedOut" ? null : people[caller];
        const { status, body } = await c.run(f, person?.cookie ?? "", person?.id ?? "");
        expect({ status, code: body?.error?.code ?? null }).toMatchObject({ status: expected });
        if (expected >= 400) {
          const code = { 401: "unauthenticated", 403: "forbidden", 404: "not_found", 409: "last_owner" }[expected];
          expect(body.error.code).toBe(code);
          expect(typeof body.error.message).toBe("string");
        }
        if (c.effect) {
          const after = await c.effect.read(f, person?.id ?? "");
          expect(after).toEqual(expected < 300 ? c.effect.allowed : c.effect.refused);
        }
      });
    }
  }
});
