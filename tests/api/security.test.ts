// Sign-in rate limit (429), cookie attributes over https, the production secret check, and the
// shared route wrapper's refusals: cross-origin, signed out, bad input, oversized bodies.
import { afterEach, beforeAll, describe, expect, it } from "vitest";
import { z } from "zod";
import * as invitationsRoute from "@/app/api/workspaces/[id]/invitations/route";
import * as membersRoute from "@/app/api/workspaces/[id]/members/route";
import * as workspacesRoute from "@/app/api/workspaces/route";
import { json, route } from "@/lib/api";
import { createAuth } from "@/lib/auth";
import { authSecret, MissingSecretError, mailboxEnabled } from "@/lib/env";
import { call, makeAccount, makeWorkspace, PASSWORD, type Person } from "./helpers";

const saved = { ...process.env };
afterEach(() => {
  for (const k of ["APP_URL", "NODE_ENV", "BETTER_AUTH_SECRET", "SMTP_HOST", "DEV_MAILBOX", "AUTH_RATE_LIMIT_MAX", "AUTH_RATE_LIMIT_WINDOW"]) {
    if (saved[k] === undefined) delete process.env[k];
    else process.env[k] = saved[k];
  }
});
const setEnv = (k: string, v: string | undefined) => {
  if (v === undefined) delete process.env[k];
  else process.env[k] = v;
};

function signInRequest(origin: string, email: string, password: string, ip: string): Request {
  return new Request(`${origin}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin, "x-forwarded-for": ip },
    body: JSON.stringify({ email, password }),
  });
}

describe("sign-in rate limit", () => {
  let person: Person;
  beforeAll(async () => {
    person = await makeAccount("limited", { signIn: false });
  });

  it("answers 429 with a retry time after AUTH_RATE_LIMIT_MAX attempts in the window, per client address", async () => {
    const auth = createAuth({ rateLimit: { max: 3, window: 60 } });
    const origin = "http://127.0.0.1:3000";
    const statuses: number[] = [];
    for (let i = 0; i < 3; i++) statuses.push((await auth.handler(signInRequest(origin, person.email, "wrong-password", "203.0.113.7"))).status);
    expect(statuses).toEqual([401, 401, 401]);

    const blocked = await auth.handler(signInRequest(origin, person.email, PASSWORD, "203.0.113.7"));
    expect(blocked.status).toBe(429);
    expect(Number(blocked.headers.get("x-retry-after"))).toBeGreaterThan(0);
    expect(Number(blocked.headers.get("x-retry-after"))).toBeLessThanOrEqual(60);

    // Another client address has its own budget, and the right password works there.
    expect((await auth.handler(signInRequest(origin, person.email, PASSWORD, "203.0.113.8"))).status).toBe(200);
  });

  it("is one budget for every app server: attempts counted by one instance count on another", async () => {
    // two auth instances stand for two app servers behind a balancer, sharing the database
    const origin = "http://127.0.0.1:3000";
    const serverA = createAuth({ rateLimit: { max: 3, window: 60 } });
    const serverB = createAuth({ rateLimit: { max: 3, window: 60 } });
    const statuses: number[] = [];
    statuses.push((await serverA.handler(signInRequest(origin, person.email, "wrong-password", "203.0.113.17"))).status);
    statuses.push((await serverB.handler(signInRequest(origin, person.email, "wrong-password", "203.0.113.17"))).status);
    statuses.push((await serverA.handler(signInRequest(origin, person.email, "wrong-password", "203.0.113.17"))).status);
    statuses.push((await serverB.handler(signInRequest(origin, person.email, PASSWORD, "203.0.113.17"))).status);
    expect(statuses).toEqual([401, 401, 401, 429]);
  });

  it("takes its budget from AUTH_RATE_LIMIT_MAX and AUTH_RATE_LIMIT_WINDOW", async () => {
    setEnv("AUTH_RATE_LIMIT_MAX", "2");
    setEnv("AUTH_RATE_LIMIT_WINDOW", "30");
    const auth = createAuth();
    const origin = "http://127.0.0.1:3000";
    const statuses: number[] = [];
    for (let i = 0; i < 3; i++) statuses.push((await auth.handler(signInRequest(origin, person.email, "wrong-password", "203.0.113.9"))).status);
    expect(statuses).toEqual([401, 401, 429]);
    expect(Number((await auth.handler(signInRequest(origin, person.email, PASSWORD, "203.0.113.9"))).headers.get("x-retry-after"))).toBeGreaterThan(20);
  });
});

describe("cookies and secrets", () => {
  it("marks the session cookie Secure when APP_URL is https", async () => {
    const person = await makeAccount("secure", { signIn: false });
    setEnv("APP_URL", "https://calc.example.com");
    const auth = createAuth({ rateLimit: { max: 100, window: 10 } });
    const res = await auth.handler(signInRequest("https://calc.example.com", person.email, PASSWORD, "198.51.100.4"));
    expect(res.status).toBe(200);
    const cookie = res.headers.getSetCookie().find((c) => c.includes("session_token="))!;
    expect(cookie.startsWith("__Secure-counterpoise.session_token=")).toBe(true);
    expect(cookie).toMatch(/; Secure/i);
    expect(cookie).toMatch(/; HttpOnly/i);
  });

  it("refuses to start in production without BETTER_AUTH_SECRET, with a message that says how to fix it", () => {
    setEnv("NODE_ENV", "production");
    setEnv("BETTER_AUTH_SECRET", undefined);
    expect(() => authSecret()).toThrow(MissingSecretError);
    expect(() => authSecret()).toThrow(/BETTER_AUTH_SECRET is not set.*openssl rand -base64 32/);
    setEnv("BETTER_AUTH_SECRET", "s3cret-from-env-s3cret-from-env-0");
    expect(authSecret()).toBe("s3cret-from-env-s3cret-from-env-0");
  });

  it("serves the local mailbox only without real SMTP and on a loopback APP_URL (or DEV_MAILBOX=1)", () => {
    setEnv("SMTP_HOST", undefined);
    setEnv("APP_URL", "http://127.0.0.1:3100");
    expect(mailboxEnabled()).toBe(true);
    setEnv("APP_URL", "https://calc.example.com");
    expect(mailboxEnabled()).toBe(false);
    setEnv("DEV_MAILBOX", "1");
    expect(mailboxEnabled()).toBe(true);
    setEnv("SMTP_HOST", "smtp.example.com");
    expect(mailboxEnabled()).toBe(false);
  });
});

describe("the shared route wrapper", () => {
  let owner: Person;
  let ws: string;
  beforeAll(async () => {
    owner = await makeAccount("wrapper");
    ws = await makeWorkspace("Wrapper checks", [[owner, "owner"]]);
  });

  it("refuses a mutation whose Origin is another site (403 cross_origin) and nothing is written", async () => {
    const res = await call(workspacesRoute.POST, { method: "POST", cookie: owner.cookie, body: { name: "From elsewhere" }, origin: "https://evil.example" });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("cross_origin");
    const list = await call(workspacesRoute.GET, { cookie: owner.cookie });
    expect(list.body.workspaces.map((w: { name: string }) => w.name)).not.toContain("From elsewhere");
  });

  it("refuses a cross-site fetch without Origin by its Sec-Fetch-Site, and lets non-browser clients through", async () => {
    const cross = await call(workspacesRoute.POST, { method: "POST", cookie: owner.cookie, body: { name: "Sneaky" }, origin: null, headers: { "sec-fetch-site": "cross-site" } });
    expect(cross.status).toBe(403);
    const script = await call(workspacesRoute.POST, { method: "POST", cookie: owner.cookie, body: { name: "From a script" }, origin: null });
    expect(script.status).toBe(201);
    expect(script.body.workspace).toMatchObject({ name: "From a script", role: "owner" });
  });

  it("answers 401 with the error shape when signed out", async () => {
    const res = await call(workspacesRoute.GET, {});
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ error: { code: "unauthenticated", message: "Sign in to continue." } });
  });

  it("answers 404 for a malformed workspace id, not 500", async () => {
    const res = await call(membersRoute.GET, { params: { id: "not-a-uuid" }, cookie: owner.cookie });
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe("not_found");
  });

  it("answers 400 invalid_json for a broken body, 415 for a non-JSON body, 400 with field paths for bad fields", async () => {
    const params = { id: ws };
    const broken = await call(invitationsRoute.POST, { method: "POST", params, cookie: owner.cookie, rawBody: '{"email": "a@b.c",' });
    expect(broken.status).toBe(400);
    expect(broken.body.error.code).toBe("invalid_json");

    const form = await call(invitationsRoute.POST, { method: "POST", params, cookie: owner.cookie, rawBody: "email=a", headers: { "content-type": "application/x-www-form-urlencoded" } });
    expect(form.status).toBe(415);

    const bad = await call(invitationsRoute.POST, { method: "POST", params, cookie: owner.cookie, body: { email: "not an address", role: "boss" } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe("validation_failed");
    expect(bad.body.error.fields.map((f: { path: string }) => f.path).sort()).toEqual(["email", "role"]);
    expect(bad.body.error.fields.find((f: { path: string }) => f.path === "role").message).toBe("Choose owner, editor, checker or viewer.");
  });

  it("answers 413 for a body over the cap", async () => {
    const res = await call(invitationsRoute.POST, { method: "POST", params: { id: ws }, cookie: owner.cookie, body: { email: `${"x".repeat(70 * 1024)}@a.b`, role: "viewer" } });
    expect(res.status).toBe(413);
    expect(res.body.error.message).toBe("The request body is larger than the 64 KB this endpoint accepts.");
  });

  it("never shows an unexpected error's details (500 with a generic message)", async () => {
    const handler = route({ auth: "none", body: z.object({ n: z.number() }) }, async () => {
      throw new Error("relation \"secret_table\" does not exist");
    });
    const res = await call(handler, { method: "POST", body: { n: 1 } });
    expect(res.status).toBe(500);
    expect(res.body.error.code).toBe("internal");
    expect(JSON.stringify(res.body)).not.toContain("secret_table");
    const ok = await call(route({ auth: "none" }, async () => json({ fine: true }, 202)), {});
    expect(ok.status).toBe(202);
    expect(ok.res.headers.get("cache-control")).toBe("no-store");
  });
});
