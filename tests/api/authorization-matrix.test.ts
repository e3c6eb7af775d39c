// Every route handler under app/api, found on disk with each method it exports, and the status
// each kind of caller gets: owner, editor, checker, viewer, a signed-in outsider, signed out.
// A route or method missing from ROWS (or a row without a route) fails the first test.
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { invitation } from "@/db/schema";
import { hashInvitationToken, newInvitationToken } from "@/lib/invitations";
import { createSketch, saveVersion } from "@/lib/sketches";
import { isNotAllowed, routeFiles, routePath } from "./route-files";
import { call, withMailFake, makeAccount, makeBareUser, makeWorkspace, uniqueEmail, type Person } from "./helpers";
import { fixture as sketchFile, parsedFixture } from "./sketch-fixtures";
import { REVIEW_ROWS } from "./matrix-review-rows";
import { STUDIES_ROWS } from "./matrix-studies-rows";
import { UPLOADS_ROWS } from "./matrix-uploads-rows";
import { all, editors, MATRIX_CALLERS, members, ownersOnly, signedIn, type Caller, type Fixture, type Handler, type Row } from "./matrix-types";

const METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"] as const;




const W = (f: Fixture) => ({ id: f.ws });
const S = (f: Fixture) => ({ id: f.sketchId });

const ROWS: Record<string, Row> = {
  // better-auth's catch-all: the session endpoint answers everyone (null when signed out);
  // updating your own profile needs a session. Its other endpoints have tests of their own.
  "GET /api/auth/[...all]": { expect: all(200), run: (h, _f, p) => call(h, { path: "/api/auth/get-session", cookie: p.cookie }) },
  "POST /api/auth/[...all]": {
    expect: signedIn(200),
    foreignErrors: true,
    run: (h, _f, p) => call(h, { method: "POST", path: "/api/auth/update-user", cookie: p.cookie, body: { name: p.name || "Nobody" } }),
  },
  // An address no route serves, with any method: the API's JSON 404 for everyone.
  ...Object.fromEntries(
    (["GET", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"] as const).map((m) => [
      `${m} /api/[...path]`,
      { expect: all(404), run: (h: Handler, _f: Fixture, p: Person) => call(h, { method: m, path: "/api/sketchs", cookie: p.cookie, body: m === "GET" || m === "OPTIONS" ? undefined : {} }) } satisfies Row,
    ]),
  ),
  "GET /api/health": { expect: all(200), run: (h) => call(h, {}) },
  // Deleting one's own account, with a wrong password (a right one would end the caller's account for
  // the rows after): the owner is the last owner of the matrix's workspace, refused before the password.
  // One's own account activity: every signed-in person reads their own, whatever their role.
  "GET /api/account/activity": { expect: signedIn(200), run: (h, _f, p) => call(h, { cookie: p.cookie }) },
  "DELETE /api/account": { expect: { ...signedIn(400), owner: 409 }, run: (h, _f, p) => call(h, { method: "DELETE", cookie: p.cookie, body: { password: "not-the-password" } }) },
  // Token routes: the link is the key, not a role. Accepting needs a session whose address the
  // invitation names (a member keeps their role); signing up from a link needs no session at all.
  // Reading a link needs no session either: the token is the key, and the answer is what its page shows.
  "GET /api/invitations/[token]": { expect: all(200), run: async (h, f, p) => call(h, { params: { token: await f.tokenFor(uniqueEmail("reader")) }, cookie: p.cookie }) },
  "POST /api/invitations/[token]/accept": { expect: signedIn(200), run: async (h, f, p) => call(h, { method: "POST", params: { token: await f.tokenFor(p.email || uniqueEmail("signed-out")) }, cookie: p.cookie }) },
  "POST /api/invitations/[token]/sign-up": {
    expect: all(201),
    run: async (h, f, p) => call(h, { method: "POST", params: { token: await f.tokenFor(uniqueEmail("newcomer")) }, cookie: p.cookie, body: { name: "New Comer", password: "a-long-password" } }),
  },
  "POST /api/solve": { expect: all(200), run: (h, _f, p) => call(h, { method: "POST", cookie: p.cookie, body: sketchFile("pipe-bend-anchor"), headers: { "x-forwarded-for": "192.0.2.77" } }) },

  "GET /api/workspaces": { expect: signedIn(200), run: (h, _f, p) => call(h, { cookie: p.cookie }) },
  "POST /api/workspaces": { expect: signedIn(201), run: (h, _f, p) => call(h, { method: "POST", cookie: p.cookie, body: { name: "Made in the matrix" } }) },
  "GET /api/workspaces/[id]": { expect: members(200), run: (h, f, p) => call(h, { params: W(f), cookie: p.cookie }) },
  "PATCH /api/workspaces/[id]": { expect: ownersOnly(200), run: (h, f, p) => call(h, { method: "PATCH", params: W(f), cookie: p.cookie, body: { name: "Renamed bay" } }) },
  "DELETE /api/workspaces/[id]": { expect: ownersOnly(200), run: (h, f, p) => call(h, { method: "DELETE", params: W(f), cookie: p.cookie, body: { confirmName: "Matrix bay" } }) },
  "GET /api/workspaces/[id]/audit": { expect: ownersOnly(200), run: (h, f, p) => call(h, { params: W(f), cookie: p.cookie }) },
  "GET /api/workspaces/[id]/export": { expect: ownersOnly(200), run: (h, f, p) => call(h, { params: W(f), cookie: p.cookie }) },
  "GET /api/workspaces/[id]/invitations": { expect: ownersOnly(200), run: (h, f, p) => call(h, { params: W(f), cookie: p.cookie }) },
  "POST /api/workspaces/[id]/invitations": {
    expect: ownersOnly(201),
    run: (h, f, p) => call(h, { method: "POST", params: W(f), cookie: p.cookie, body: { email: uniqueEmail("invitee"), role: "viewer" } }),
  },
  "DELETE /api/workspaces/[id]/invitations/[invitationId]": {
    expect: ownersOnly(200),
    run: (h, f, p) => call(h, { method: "DELETE", params: { id: f.ws, invitationId: f.invitationId }, cookie: p.cookie }),
  },
  "GET /api/workspaces/[id]/members": { expect: members(200), run: (h, f, p) => call(h, { params: W(f), cookie: p.cookie }) },
  "GET /api/workspaces/[id]/review-queue": { expect: members(200), run: (h, f, p) => call(h, { params: W(f), cookie: p.cookie }) },
  "PATCH /api/workspaces/[id]/members/[userId]": {
    expect: ownersOnly(200),
    run: (h, f, p) => call(h, { method: "PATCH", params: { id: f.ws, userId: f.targetId }, cookie: p.cookie, body: { role: "checker" } }),
  },
  "DELETE /api/workspaces/[id]/members/[userId]": {
    expect: ownersOnly(200),
    run: (h, f, p) => call(h, { method: "DELETE", params: { id: f.ws, userId: f.targetId }, cookie: p.cookie }),
  },
  "GET /api/workspaces/[id]/sketches": { expect: members(200), run: (h, f, p) => call(h, { params: W(f), cookie: p.cookie }) },
  "POST /api/workspaces/[id]/sketches": {
    expect: editors(201),
    run: (h, f, p) => call(h, { method: "POST", params: W(f), cookie: p.cookie, body: { title: "Matrix sketch", document: sketchFile("pipe-bend-anchor") } }),
  },

  "GET /api/sketches/[id]": { expect: members(200), run: (h, f, p) => call(h, { params: S(f), cookie: p.cookie }) },
  "PATCH /api/sketches/[id]": { expect: editors(200), run: (h, f, p) => call(h, { method: "PATCH", params: S(f), cookie: p.cookie, body: { title: "Renamed sketch" } }) },
  "DELETE /api/sketches/[id]": { expect: ownersOnly(200), run: (h, f, p) => call(h, { method: "DELETE", params: S(f), cookie: p.cookie }) },
  "GET /api/sketches/[id]/versions": { expect: members(200), run: (h, f, p) => call(h, { params: S(f), cookie: p.cookie }) },
  "POST /api/sketches/[id]/versions": {
    expect: editors(201),
    run: (h, f, p) => call(h, { method: "POST", params: S(f), cookie: p.cookie, body: { baseVersion: 1, message: "matrix", document: sketchFile("pipe-bend-anchor") } }),
  },
  "GET /api/sketches/[id]/versions/[number]": { expect: members(200), run: (h, f, p) => call(h, { params: { id: f.sketchId, number: "1" }, cookie: p.cookie }) },
  "POST /api/sketches/[id]/versions/[number]/restore": {
    expect: editors(201),
    // a v2 on top, so v1 is an older version to make the latest again
    prepare: async (f) => void (await saveVersion(f.sketchId, f.people.editor, { baseVersion: 1, message: "v2", document: parsedFixture("pipe-bend-anchor") })),
    run: (h, f, p) => call(h, { method: "POST", params: { id: f.sketchId, number: "1" }, cookie: p.cookie, body: { baseVersion: 2 } }),
  },
  "POST /api/sketches/[id]/fork": { expect: editors(201), run: (h, f, p) => call(h, { method: "POST", params: S(f), cookie: p.cookie, body: { workspaceId: f.ws } }) },
  ...REVIEW_ROWS,
  ...STUDIES_ROWS,
  ...UPLOADS_ROWS,
};

describe("authorization matrix of every API route", () => {
  const people = {} as Record<Exclude<Caller, "signedOut">, Person>;
  const handlers = new Map<string, Handler>();

  withMailFake();
  beforeAll(async () => {
    for (const r of ["owner", "editor", "checker", "viewer", "outsider"] as const) people[r] = await makeAccount(r);
    for (const file of routeFiles()) {
      const mod = (await import(file)) as Record<string, unknown>;
      for (const m of METHODS) if (typeof mod[m] === "function" && !isNotAllowed(mod[m])) handlers.set(`${m} ${routePath(file)}`, mod[m] as Handler);
    }
  });

  it("has a row for every route and method on disk, and no row without one", () => {
    expect([...handlers.keys()].sort()).toEqual(Object.keys(ROWS).sort());
    expect(handlers.size).toBeGreaterThan(25);
  });

  async function fixture(): Promise<Fixture> {
    const target = await makeBareUser("target");
    const ws = await makeWorkspace("Matrix bay", [
      [people.owner, "owner"],
      [people.editor, "editor"],
      [people.checker, "checker"],
      [people.viewer, "viewer"],
      [target, "viewer"],
    ]);
    const addInvitation = async (email: string) => {
      const token = newInvitationToken();
      const [row] = await db
        .insert(invitation)
        .values({ workspaceId: ws, email, role: "viewer", tokenHash: hashInvitationToken(token), invitedBy: people.owner.id, expiresAt: new Date(Date.now() + 3600_000) })
        .returning({ id: invitation.id });
      return { token, id: row.id };
    };
    const pending = await addInvitation(uniqueEmail("pending"));
    const made = await createSketch(ws, people.editor, { title: "Matrix skid", document: parsedFixture("pump-skid-discharge"), message: "v1" });
    return {
      ws,
      sketchId: made.sketch.id,
      versionId: made.version.id,
      targetId: target.id,
      invitationId: pending.id,
      people,
      tokenFor: async (email) => (await addInvitation(email)).token,
      extra: {},
    };
  }

  for (const [key, row] of Object.entries(ROWS)) {
    for (const caller of MATRIX_CALLERS) {
      const expected = row.expect[caller];
      it(`${key}: ${caller} → ${expected}`, async () => {
        const handler = handlers.get(key);
        expect(handler, `no handler for ${key}`).toBeDefined();
        const f = await fixture();
        await row.prepare?.(f);
        const person = caller === "signedOut" ? { id: "", email: "", name: "", cookie: "" } : people[caller];
        const { status, body } = await row.run(handler!, f, person);
        expect({ status, body: status >= 500 ? body : undefined }).toEqual({ status: expected, body: undefined });
        if (!row.foreignErrors && (expected === 401 || expected === 403 || expected === 404)) {
          expect(body.error.code).toBe({ 401: "unauthenticated", 403: "forbidden", 404: "not_found" }[expected]);
        }
        // what an outsider or a signed-out caller is told never names the sketch
        if (caller === "outsider" || caller === "signedOut") expect(JSON.stringify(body ?? "")).not.toContain("Matrix skid");
      });
    }
  }
});
