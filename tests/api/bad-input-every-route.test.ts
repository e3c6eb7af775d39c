// Every route handler under app/api that takes a body, found on disk: a malformed JSON body and a
// body far over any cap each get a 4xx (never a 500), and afterwards no table row and no stored
// object has been added or removed. A mutation route missing from the lists below fails the
// first test, so a new route cannot slip past.
import { ListObjectsV2Command } from "@aws-sdk/client-s3";
import { count } from "drizzle-orm";
import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { account, auditEvent, comment, invitation, membership, session, signOff, sketch, sketchVersion, upload, user, verification, workspace } from "@/db/schema";
import { storageSettings } from "@/lib/env";
import { hashInvitationToken, newInvitationToken } from "@/lib/invitations";
import { addComment } from "@/lib/review/comments";
import { createSketch } from "@/lib/sketches";
import { s3 } from "@/lib/storage";
import { createUnderlay } from "@/lib/uploads/service";
import { isNotAllowed, routeFiles, routePath } from "./route-files";
import { call, withMailFake, makeAccount, makeBareUser, makeWorkspace, uniqueEmail, type Person } from "./helpers";
import type { Handler } from "./matrix-types";
import { parsedFixture } from "./sketch-fixtures";

const MUTATIONS = ["POST", "PUT", "PATCH", "DELETE"] as const;


/** Mutations that read no body (the path names everything): a body, good or bad, is ignored. */
const NO_BODY = new Set([
  "DELETE /api/sketches/[id]",
  "DELETE /api/comments/[commentId]",
  "DELETE /api/uploads/[uploadId]",
  "DELETE /api/workspaces/[id]/invitations/[invitationId]",
  "DELETE /api/workspaces/[id]/members/[userId]",
  "POST /api/invitations/[token]/accept",
  // the catch-all of addresses no route serves answers 404 before any body is read
  "POST /api/[...path]",
  "PUT /api/[...path]",
  "PATCH /api/[...path]",
  "DELETE /api/[...path]",
]);

/** Where a route under better-auth's catch-all is sent: sign-up writes a user, so it must not here. */
const AUTH_PATH = "/api/auth/sign-up/email";

type Fx = { ws: string; sketchId: string; commentId: string; uploadId: string; invitationId: string; targetId: string; token: string };

function paramsFor(route: string, f: Fx): Record<string, string> {
  const p: Record<string, string> = {};
  if (route.includes("/workspaces/[id]")) p.id = f.ws;
  if (route.includes("/sketches/[id]")) p.id = f.sketchId;
  if (route.includes("[number]")) p.number = "1";
  if (route.includes("[commentId]")) p.commentId = f.commentId;
  if (route.includes("[uploadId]")) p.uploadId = f.uploadId;
  if (route.includes("[invitationId]")) p.invitationId = f.invitationId;
  if (route.includes("[userId]")) p.userId = f.targetId;
  if (route.includes("[token]")) p.token = f.token;
  return p;
}

const TABLES = { user, account, session, verification, workspace, membership, invitation, sketch, sketchVersion, comment, signOff, upload, auditEvent };

async function rowCounts(): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const [name, table] of Object.entries(TABLES)) out[name] = Number((await db.select({ n: count() }).from(table))[0].n);
  return out;
}

async function objectCount(ws: string): Promise<number> {
  const res = await s3().send(new ListObjectsV2Command({ Bucket: storageSettings().bucket, Prefix: `w/${ws}/` }));
  return res.KeyCount ?? 0;
}

describe("bad bodies on every route that takes one: 4xx, never 500, nothing written", () => {
  const handlers = new Map<string, Handler>();
  let owner: Person;
  let f: Fx;

  withMailFake();
  beforeAll(async () => {
    for (const file of routeFiles()) {
      const mod = (await import(file)) as Record<string, unknown>;
      for (const m of MUTATIONS) if (typeof mod[m] === "function" && !isNotAllowed(mod[m])) handlers.set(`${m} ${routePath(file)}`, mod[m] as Handler);
    }
    owner = await makeAccount("badbody-owner");
    const target = await makeBareUser("badbody-target");
    const ws = await makeWorkspace("Bad body bay", [
      [owner, "owner"],
      [target, "viewer"],
    ]);
    const made = await createSketch(ws, owner, { title: "Bad body skid", document: parsedFixture("pump-skid-discharge"), message: "v1" });
    const commentId = (await addComment(made.sketch.id, 1, owner, { body: "A remark" })).id;
    const png = await sharp({ create: { width: 8, height: 6, channels: 3, background: "#ffffff" } }).png().toBuffer();
    const uploadId = (await createUnderlay(made.sketch.id, owner, async () => ({ bytes: png, name: "ga.png" }))).id;
    const token = newInvitationToken();
    const [inv] = await db
      .insert(invitation)
      .values({ workspaceId: ws, email: owner.email, role: "viewer", tokenHash: hashInvitationToken(token), invitedBy: owner.id, expiresAt: new Date(Date.now() + 3600_000) })
      .returning({ id: invitation.id });
    f = { ws, sketchId: made.sketch.id, commentId, uploadId, invitationId: inv.id, targetId: target.id, token };
  });

  it("knows every mutation route on disk: each reads a body, or is listed as reading none", () => {
    expect(handlers.size).toBeGreaterThan(15);
    for (const key of NO_BODY) expect(handlers.has(key), `${key} is listed but not on disk`).toBe(true);
  });

  /** The upload routes read the body as a file: JSON is a file that is not an image or a PDF. */
  const isUpload = (key: string) => /\/(uploads|attachments)$/.test(key);
  const bodies: Array<[string, () => { rawBody: string; headers: Record<string, string> }, (key: string) => [number, string]]> = [
    [
      "malformed JSON",
      () => ({ rawBody: '{"title": "half a', headers: { "content-type": "application/json" } }),
      (key) => (isUpload(key) ? [415, "unsupported_media_type"] : key.includes("/api/auth/") ? [400, "bad_request"] : [400, "invalid_json"]),
    ],
    // 11 MB: over the 1 MB of a sketch and the 10 MB of an upload
    [
      "an 11 MB body",
      () => ({ rawBody: JSON.stringify({ title: "big", document: { description: "x".repeat(11 * 1024 * 1024) } }), headers: { "content-type": "application/json" } }),
      () => [413, "payload_too_large"],
    ],
  ];

  for (const [what, make, expected] of bodies) {
    it(`${what}: every route that takes a body refuses it with a 4xx and writes nothing`, async () => {
      const answers: Record<string, [number, string]> = {};
      for (const [key, handler] of handlers) {
        if (NO_BODY.has(key)) continue;
        const [method, route] = key.split(" ");
        const before = await rowCounts();
        const objects = await objectCount(f.ws);
        const res = await call(handler, {
          method,
          path: route === "/api/auth/[...all]" ? AUTH_PATH : route,
          params: paramsFor(route, f),
          cookie: route === "/api/auth/[...all]" ? "" : owner.cookie,
          ...make(),
        });
        answers[key] = [res.status, res.body?.error?.code ?? res.body?.code];
        expect(await rowCounts(), `${key} wrote rows`).toEqual(before);
        expect(await objectCount(f.ws), `${key} stored objects`).toBe(objects);
      }
      expect(answers).toEqual(Object.fromEntries(Object.keys(answers).map((key) => [key, expected(key)])));
      expect(Object.keys(answers).length).toBe(handlers.size - NO_BODY.size);
    });
  }

  it("a sign-up through the catch-all with a wrong type names the field and makes no user", async () => {
    const before = await rowCounts();
    const res = await call(handlers.get("POST /api/auth/[...all]")!, { method: "POST", path: AUTH_PATH, body: { email: uniqueEmail("typed"), password: 12345678, name: "Typed" } });
    expect(res.status).toBe(400);
    expect(await rowCounts()).toEqual(before);
  });
});
