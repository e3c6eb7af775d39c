// Findings of a server audit, each pinned down: forged X-Forwarded-For entries get no budget of
// their own, the auth endpoints cap their bodies and check names, the mailbox stays on loopback,
// forks check the target role before copying files and do not reveal their origin, page ids are
// real uuids, writes on a vanished sketch answer 404, the audit log keeps members' earlier
// sign-ins to itself, and detail edits are logged as edits.
import { and, eq, like } from "drizzle-orm";
import { afterEach, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import * as activityRoute from "@/app/api/sketches/[id]/activity/route";
import * as forkRoute from "@/app/api/sketches/[id]/fork/route";
import * as sketchRoute from "@/app/api/sketches/[id]/route";
import * as solveRoute from "@/app/api/solve/route";
import * as auditRoute from "@/app/api/workspaces/[id]/audit/route";
import * as sketchesRoute from "@/app/api/workspaces/[id]/sketches/route";
import { activitySentence } from "@/components/review/activitySentence";
import { auditSentence } from "@/components/workspaces/auditSentence";
import { db } from "@/db";
import { appRateLimit, auditEvent, membership, sketch, user } from "@/db/schema";
import { addressFromForwardedFor, clientAddress, proxyList } from "@/lib/client-address";
import { authRateLimit, isLoopbackHost, mailboxEnabled } from "@/lib/env";
import { isUuid } from "@/lib/schemas";
import { accessLostError } from "@/lib/sketches";
import { copyUnderlayForFork } from "@/lib/uploads/underlay";
import { call, makeAccount, makeWorkspace, PASSWORD, signIn, uniqueEmail, type Person } from "./helpers";
import { authPoster } from "./auth-setup";
import { fixture } from "./sketch-fixtures";

// watch the underlay copy of forks without changing what it does
vi.mock("@/lib/uploads/underlay", async (importOriginal) => {
  const real = await importOriginal<typeof import("@/lib/uploads/underlay")>();
  return { ...real, copyUnderlayForFork: vi.fn(real.copyUnderlayForFork) };
});

const ENV_KEYS = ["TRUSTED_PROXIES", "HOST", "APP_URL", "SMTP_HOST", "DEV_MAILBOX", "SOLVE_RATE_LIMIT_MAX", "SOLVE_RATE_LIMIT_WINDOW"];
const saved = { ...process.env };
afterEach(() => {
  for (const k of ENV_KEYS) {
    if (saved[k] === undefined) delete process.env[k];
    else process.env[k] = saved[k];
  }
});
const setEnv = (k: string, v: string | undefined) => {
  if (v === undefined) delete process.env[k];
  else process.env[k] = v;
};

const authPost = authPoster("192.0.2.200");

describe("the client address behind X-Forwarded-For", () => {
  it("without trusted proxies is the last hop, whatever the client wrote on the left", () => {
    expect(addressFromForwardedFor("203.0.113.9", null)).toBe("203.0.113.9");
    expect(addressFromForwardedFor("1.2.3.4, 203.0.113.9", null)).toBe("203.0.113.9");
    expect(addressFromForwardedFor(" 6.6.6.6 ,1.2.3.4,  203.0.113.9 ", null)).toBe("203.0.113.9");
    expect(addressFromForwardedFor("::ffff:203.0.113.9", null)).toBe("203.0.113.9");
    expect(addressFromForwardedFor("[2001:db8::7]:4711", null)).toBe("2001:db8::7");
    expect(addressFromForwardedFor("203.0.113.9, not-an-address", null)).toBeNull();
    expect(addressFromForwardedFor("", null)).toBeNull();
    expect(addressFromForwardedFor(null, null)).toBeNull();
  });

  it("with trusted proxies walks from the right past them to the first other hop", () => {
    const proxies = proxyList(["10.0.0.0/8", "192.0.2.10", "2001:db8:ffff::/48"]);
    expect(addressFromForwardedFor("6.6.6.6, 198.51.100.4, 10.1.2.3", proxies)).toBe("198.51.100.4");
    expect(addressFromForwardedFor("198.51.100.4, 192.0.2.10, 10.1.2.3", proxies)).toBe("198.51.100.4");
    expect(addressFromForwardedFor("2001:db8::5, 2001:db8:ffff::1", proxies)).toBe("2001:db8::5");
    // a chain that is all our proxies started at the leftmost of them
    expect(addressFromForwardedFor("10.0.0.1, 10.0.0.2", proxies)).toBe("10.0.0.1");
    // garbage between the client and our proxies: nothing to its left can be believed
    expect(addressFromForwardedFor("198.51.100.4, junk, 10.1.2.3", proxies)).toBeNull();
  });

  it("refuses a TRUSTED_PROXIES entry that is not an address or a CIDR range, naming it", () => {
    expect(() => proxyList(["10.0.0.0/8", "proxy.internal"])).toThrow('TRUSTED_PROXIES: "proxy.internal" is not an IP address or a CIDR range');
    expect(() => proxyList(["10.0.0.0/33"])).toThrow(/"10\.0\.0\.0\/33"/);
    expect(() => proxyList(["10.0.0.0/8/1"])).toThrow(/is not an IP address/);
  });

  it("reads TRUSTED_PROXIES from the environment", () => {
    const req = new Request("http://127.0.0.1:3000/", { headers: { "x-forwarded-for": "198.51.100.4, 10.1.2.3" } });
    setEnv("TRUSTED_PROXIES", undefined);
    expect(clientAddress(req)).toBe("10.1.2.3");
    setEnv("TRUSTED_PROXIES", "10.0.0.0/8");
    expect(clientAddress(req)).toBe("198.51.100.4");
    expect(clientAddress(new Request("http://127.0.0.1:3000/"))).toBe("local");
  });
});

describe("forged X-Forwarded-For entries get no fresh budget", () => {
  beforeEach(async () => {
    await db.delete(appRateLimit).where(like(appRateLimit.key, "solve:198.51.100.%"));
  });

  it("POST /api/solve counts a forged leftmost entry against the real last hop", async () => {
    setEnv("SOLVE_RATE_LIMIT_MAX", "2");
    setEnv("SOLVE_RATE_LIMIT_WINDOW", "60");
    const solve = (xff: string) => call(solveRoute.POST, { method: "POST", body: fixture("pipe-bend-anchor"), origin: null, headers: { "x-forwarded-for": xff } });
    const statuses = [];
    for (const forged of ["1.1.1.1", "2.2.2.2", "3.3.3.3"]) statuses.push((await solve(`${forged}, 198.51.100.30`)).status);
    expect(statuses).toEqual([200, 200, 429]);
    expect((await solve("198.51.100.31")).status).toBe(200);
  });

  it("behind trusted proxies, the client is the hop left of them, and a forged entry left of it changes nothing", async () => {
    setEnv("SOLVE_RATE_LIMIT_MAX", "2");
    setEnv("SOLVE_RATE_LIMIT_WINDOW", "60");
    setEnv("TRUSTED_PROXIES", "10.0.0.0/8");
    const solve = (xff: string) => call(solveRoute.POST, { method: "POST", body: fixture("pipe-bend-anchor"), origin: null, headers: { "x-forwarded-for": xff } });
    const statuses = [];
    for (const forged of ["1.1.1.1", "2.2.2.2", "3.3.3.3"]) statuses.push((await solve(`${forged}, 198.51.100.40, 10.0.0.9`)).status);
    expect(statuses).toEqual([200, 200, 429]);
    // another client behind the same proxy has its own budget
    expect((await solve("198.51.100.41, 10.0.0.9")).status).toBe(200);
  });

  it("sign-in: after AUTH_RATE_LIMIT_MAX attempts from one address, a new forged leftmost entry is still refused", async () => {
    const person = await makeAccount("forger", { signIn: false });
    const { max } = authRateLimit();
    const ip = `203.0.113.${100 + Math.floor(Math.random() * 100)}`;
    const attempt = (forged: string) => authPost("/sign-in/email", { email: person.email, password: "wrong-password" }, { "x-forwarded-for": `${forged}, ${ip}` });
    const statuses = [];
    for (let i = 0; i < max; i++) statuses.push((await attempt(`10.0.${i}.1`)).status);
    expect(statuses).toEqual(Array(max).fill(401));
    expect((await attempt("172.16.99.99")).status).toBe(429);
    expect((await attempt("8.8.8.8")).status).toBe(429);
    // another client reached through the same kind of chain keeps its own budget (better-auth alone
    // puts every multi-entry header into one shared bucket)
    const other = await authPost("/sign-in/email", { email: person.email, password: "wrong-password" }, { "x-forwarded-for": `10.0.0.1, 198.18.${Math.floor(Math.random() * 250)}.7` });
    expect(other.status).toBe(401);
  });
});

describe("the auth endpoints", () => {
  it("refuse a body over 64 KB with 413 and a JSON error, and store nothing", async () => {
    const email = uniqueEmail("huge");
    const res = await authPost("/sign-up/email", { email, password: PASSWORD, name: "x".repeat(3 * 1024 * 1024) }, { "x-forwarded-for": "192.0.2.201" });
    expect(res.status).toBe(413);
    const body = await res.json();
    expect(body.error).toEqual({ code: "payload_too_large", message: "The request body is larger than the 64 KB the sign-in endpoints accept." });
    expect(await db.select().from(user).where(eq(user.email, email))).toEqual([]);
  });

  it("refuse a sign-up whose name is too long or blank with 400 naming the field", async () => {
    const email = uniqueEmail("longname");
    const long = await authPost("/sign-up/email", { email, password: PASSWORD, name: "N".repeat(81) }, { "x-forwarded-for": "192.0.2.202" });
    expect(long.status).toBe(400);
    expect(await long.json()).toMatchObject({ code: "INVALID_NAME", field: "name", message: "name: Keep the name under 80 characters." });
    const blank = await authPost("/sign-up/email", { email, password: PASSWORD, name: "   " }, { "x-forwarded-for": "192.0.2.203" });
    expect(blank.status).toBe(400);
    expect(await blank.json()).toMatchObject({ field: "name", message: "name: Enter your name." });
    expect(await db.select().from(user).where(eq(user.email, email))).toEqual([]);
  });

  it("store a valid name trimmed, and hold a profile update to the same rule", async () => {
    const email = uniqueEmail("trimmed");
    const ok = await authPost("/sign-up/email", { email, password: PASSWORD, name: "  Tara Trim  " }, { "x-forwarded-for": "192.0.2.204" });
    expect(ok.status).toBe(200);
    const [u] = await db.select().from(user).where(eq(user.email, email));
    expect(u.name).toBe("Tara Trim");

    const person = await makeAccount("renamer");
    const tooLong = await authPost("/update-user", { name: "R".repeat(200) }, { cookie: person.cookie });
    expect(tooLong.status).toBe(400);
    expect(await tooLong.json()).toMatchObject({ field: "name", message: "name: Keep the name under 80 characters." });
    const fine = await authPost("/update-user", { name: " Rene Renamed " }, { cookie: person.cookie });
    expect(fine.status).toBe(200);
    const [after] = await db.select().from(user).where(eq(user.id, person.id));
    expect(after.name).toBe("Rene Renamed");
  });
});

describe("the local mailbox", () => {
  it("is served only on loopback: APP_URL, the listening address and the requested host", () => {
    setEnv("SMTP_HOST", undefined);
    setEnv("DEV_MAILBOX", undefined);
    setEnv("APP_URL", "http://127.0.0.1:3000");
    setEnv("HOST", undefined);
    expect(mailboxEnabled()).toBe(true);
    expect(mailboxEnabled("127.0.0.1:3000")).toBe(true);
    expect(mailboxEnabled("localhost:3000")).toBe(true);
    expect(mailboxEnabled("[::1]:3000")).toBe(true);
    // a LAN address in the Host header, or none at all
    expect(mailboxEnabled("192.168.1.20:3000")).toBe(false);
    expect(mailboxEnabled(null)).toBe(false);
    // HOST=0.0.0.0 keeps APP_URL on 127.0.0.1 while the network reaches the app
    setEnv("HOST", "0.0.0.0");
    expect(mailboxEnabled()).toBe(false);
    expect(mailboxEnabled("127.0.0.1:3000")).toBe(false);
    setEnv("HOST", "127.0.0.1");
    expect(mailboxEnabled("127.0.0.1:3000")).toBe(true);
    // DEV_MAILBOX=1 is the operator saying so; real SMTP always turns it off
    setEnv("HOST", "0.0.0.0");
    setEnv("DEV_MAILBOX", "1");
    expect(mailboxEnabled("192.168.1.20:3000")).toBe(true);
    setEnv("SMTP_HOST", "smtp.example.com");
    expect(mailboxEnabled("127.0.0.1:3000")).toBe(false);
  });

  it("knows loopback names and addresses from the rest", () => {
    for (const h of ["127.0.0.1", "127.0.0.1:3000", "127.8.9.10", "localhost", "LOCALHOST:80", "app.localhost", "::1", "[::1]", "[::1]:3000"]) expect([h, isLoopbackHost(h)]).toEqual([h, true]);
    for (const h of ["0.0.0.0", "192.168.1.20", "10.0.0.1:3000", "calc.example.com", "localhost.example.com", "::", "[2001:db8::1]:3000", "127.0.0.1.nip.io"]) expect([h, isLoopbackHost(h)]).toEqual([h, false]);
  });
});

describe("page ids", () => {
  it("accept only well-formed uuids (36 characters of hex and dashes is not enough)", () => {
    expect(isUuid("0b6f3c2e-6a3b-4d1e-9f2a-1c2d3e4f5a6b")).toBe(true);
    expect(isUuid("0B6F3C2E-6A3B-4D1E-9F2A-1C2D3E4F5A6B")).toBe(true);
    expect(isUuid("------------------------------------")).toBe(false);
    expect(isUuid("0b6f3c2e6a3b4d1e9f2a1c2d3e4f5a6b----")).toBe(false);
    expect(isUuid("0b6f3c2e-6a3b-4d1e-9f2a-1c2d3e4f5a6")).toBe(false);
    expect(isUuid("not-a-uuid")).toBe(false);
  });
});

describe("sketches: forks, vanished rows, edits", () => {
  let owner: Person;
  let editor: Person;
  let viewerHere: Person;
  let home: string;
  let readOnly: string;
  let away: string;

  beforeAll(async () => {
    owner = await makeAccount("hardowner");
    editor = await makeAccount("hardeditor");
    viewerHere = await makeAccount("hardviewer");
    home = await makeWorkspace("Home of the origin", [
      [owner, "owner"],
      [editor, "editor"],
    ]);
    readOnly = await makeWorkspace("Where the editor only reads", [
      [owner, "owner"],
      [editor, "viewer"],
    ]);
    away = await makeWorkspace("Fork destination", [
      [editor, "editor"],
      [viewerHere, "owner"],
    ]);
  });

  async function newSketch(title: string): Promise<string> {
    const res = await call(sketchesRoute.POST, { method: "POST", params: { id: home }, cookie: editor.cookie, body: { title, document: fixture("pipe-bend-anchor") } });
    expect(res.status).toBe(201);
    return res.body.sketch.id;
  }

  it("a fork into a workspace where the caller only reads: 403 before any file is copied, nothing written", async () => {
    const id = await newSketch("Not to be copied");
    vi.mocked(copyUnderlayForFork).mockClear();
    const res = await call(forkRoute.POST, { method: "POST", params: { id }, cookie: editor.cookie, body: { workspaceId: readOnly } });
    expect(res.status).toBe(403);
    // names the role the caller holds there, and who may
    expect(res.body.error.message).toBe("As a viewer in that workspace you may not fork sketches into it: that is for owners and editors.");
    expect(copyUnderlayForFork).not.toHaveBeenCalled();
    expect(await db.select().from(sketch).where(eq(sketch.workspaceId, readOnly))).toEqual([]);
    // a workspace the caller is not in at all: 404 naming the field, no copy either
    const stranger = await call(forkRoute.POST, { method: "POST", params: { id }, cookie: viewerHere.cookie, body: { workspaceId: home } });
    expect(stranger.status).toBe(404);
    expect(copyUnderlayForFork).not.toHaveBeenCalled();
    // the allowed fork still copies
    const ok = await call(forkRoute.POST, { method: "POST", params: { id }, cookie: editor.cookie, body: { workspaceId: away } });
    expect(ok.status).toBe(201);
    expect(copyUnderlayForFork).toHaveBeenCalledTimes(1);
  });

  it("a fork's activity and audit entry do not carry the origin's id", async () => {
    const id = await newSketch("Secret origin");
    const fork = await call(forkRoute.POST, { method: "POST", params: { id }, cookie: editor.cookie, body: { workspaceId: away, version: 1 } });
    expect(fork.status).toBe(201);
    const forkId = fork.body.sketch.id;
    // an entry written before this rule still carries it
    await db.insert(auditEvent).values({ action: "sketch.fork", actorId: editor.id, workspaceId: away, targetType: "sketch", targetId: forkId, detail: { sketchId: forkId, title: "older", fromSketchId: id, fromVersion: 1 } });

    const activity = await call(activityRoute.GET, { params: { id: forkId }, cookie: viewerHere.cookie });
    expect(activity.status).toBe(200);
    const forks = activity.body.events.filter((e: { action: string }) => e.action === "sketch.fork");
    expect(forks).toHaveLength(2);
    for (const e of forks) {
      expect(e.detail).not.toHaveProperty("fromSketchId");
      expect(e.detail.fromVersion).toBe(1);
      // the origin is in another workspace: not named either
      expect(e.detail).not.toHaveProperty("fromTitle");
    }
    expect(JSON.stringify(activity.body)).not.toContain(id);

    const audit = await call(auditRoute.GET, { params: { id: away }, cookie: viewerHere.cookie });
    expect(audit.status).toBe(200);
    expect(JSON.stringify(audit.body)).not.toContain(id);
  });

  it("a fork in the same workspace names its origin in its activity", async () => {
    const id = await newSketch("Open origin");
    const fork = await call(forkRoute.POST, { method: "POST", params: { id }, cookie: editor.cookie, body: { workspaceId: home, version: 1 } });
    expect(fork.status).toBe(201);
    const activity = await call(activityRoute.GET, { params: { id: fork.body.sketch.id }, cookie: editor.cookie });
    const own = activity.body.events.find((e: { action: string; detail: Record<string, unknown> }) => e.action === "sketch.fork" && !e.detail.origin);
    expect(own.detail.fromTitle).toBe("Open origin");
  });

  it("a write whose row vanished says 404, a role that lost the right 403", async () => {
    const id = await newSketch("Soon gone");
    // checked again after the write found no row: the sketch was deleted meanwhile
    await db.delete(sketch).where(eq(sketch.id, id));
    const gone = await accessLostError(id, editor.id, "sketch.edit");
    expect([gone.code, gone.status]).toEqual(["not_found", 404]);
    const stays = await newSketch("Still here");
    await db.update(membership).set({ role: "viewer" }).where(and(eq(membership.workspaceId, home), eq(membership.userId, editor.id)));
    try {
      const demoted = await accessLostError(stays, editor.id, "sketch.edit");
      expect([demoted.code, demoted.status]).toEqual(["forbidden", 403]);
      const outsider = await accessLostError(stays, viewerHere.id, "sketch.edit");
      expect(outsider.code).toBe("not_found");
    } finally {
      await db.update(membership).set({ role: "editor" }).where(and(eq(membership.workspaceId, home), eq(membership.userId, editor.id)));
    }
  });

  it("logs sketch.rename only when the title changes, sketch.edit with the fields otherwise", async () => {
    const id = await newSketch("Edited bend");
    const patch = (body: unknown) => call(sketchRoute.PATCH, { method: "PATCH", params: { id }, cookie: editor.cookie, body });
    expect((await patch({ tags: ["pumps"] })).status).toBe(200);
    expect((await patch({ title: "Edited bend", description: "The 90° bend at the pump outlet." })).status).toBe(200);
    expect((await patch({ title: "Bend at the outlet", tags: ["pumps", "outlet"] })).status).toBe(200);
    const rows = await db.select().from(auditEvent).where(and(eq(auditEvent.targetId, id), like(auditEvent.action, "sketch.%"))).orderBy(auditEvent.id);
    expect(rows.map((r) => [r.action, r.detail.changed])).toEqual([
      ["sketch.create", undefined],
      ["sketch.edit", ["tags"]],
      ["sketch.edit", ["description"]],
      ["sketch.rename", ["title", "tags"]],
    ]);
    const at = new Date().toISOString();
    const edit = { id: 1, at, action: "sketch.edit", actorName: "Eddie", detail: rows[1].detail };
    const both = { ...edit, detail: { ...rows[1].detail, changed: ["description", "tags"] } };
    expect(activitySentence(edit)).toBe("edited its tags");
    expect(activitySentence(both)).toBe("edited its description and tags");
    const entry = { ...edit, actorEmail: null, targetType: "sketch", targetId: id, targetName: null };
    expect(auditSentence(entry)).toBe('edited the tags of "Edited bend"');
  });
});

describe("the owners' audit log", () => {
  it("shows a member's sign-ins from when they joined, not before", async () => {
    const owner = await makeAccount("logowner");
    const late = await makeAccount("latecomer"); // signs in now, before joining
    const ws = await makeWorkspace("Joined later", [[owner, "owner"]]);
    await new Promise((r) => setTimeout(r, 20));
    await db.insert(membership).values({ workspaceId: ws, userId: late.id, role: "viewer" });
    await signIn(late.email);
    const all = await db.select().from(auditEvent).where(and(eq(auditEvent.actorId, late.id), eq(auditEvent.action, "auth.sign_in")));
    expect(all).toHaveLength(2);
    const res = await call(auditRoute.GET, { params: { id: ws }, cookie: owner.cookie });
    expect(res.status).toBe(200);
    const lateSignIns = res.body.events.filter((e: { action: string; actorEmail: string }) => e.action === "auth.sign_in" && e.actorEmail === late.email);
    expect(lateSignIns.map((e: { id: number }) => e.id)).toEqual([Math.max(...all.map((r) => r.id))]);
  });

  it("leaves the sign-ins out when asked, so the changes read on their own; a bad value is named", async () => {
    const owner = await makeAccount("quietowner");
    const ws = await makeWorkspace("Quiet log", [[owner, "owner"]]);
    await signIn(owner.email);
    const path = `/api/workspaces/${ws}/audit`;
    const shown = await call(auditRoute.GET, { params: { id: ws }, cookie: owner.cookie, path });
    expect(shown.body.events.some((e: { action: string }) => e.action === "auth.sign_in")).toBe(true);
    const hidden = await call(auditRoute.GET, { params: { id: ws }, cookie: owner.cookie, path: `${path}?signIns=hide` });
    expect(hidden.status).toBe(200);
    const actions = hidden.body.events.map((e: { action: string }) => e.action);
    expect(actions).not.toContain("auth.sign_in");
    expect(actions.length).toBe(shown.body.events.filter((e: { action: string }) => e.action !== "auth.sign_in").length);
    const bad = await call(auditRoute.GET, { params: { id: ws }, cookie: owner.cookie, path: `${path}?signIns=maybe` });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual([{ path: "query.signIns", message: 'must be "show" or "hide"' }]);
  });
});
