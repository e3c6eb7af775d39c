// Helpers for API tests against the real test database: people, sessions, requests, mail.
import { randomBytes } from "node:crypto";
import { createServer } from "node:net";
import { desc, eq } from "drizzle-orm";
import { afterAll, beforeAll } from "vitest";
import { db } from "@/db";
import { devMail, membership, user, workspace } from "@/db/schema";
import { getAuth } from "@/lib/auth";
import { appOrigin, smtpSettings } from "@/lib/env";
import { devMailStore, startMailFake } from "@/lib/mail-fake";
import type { Role } from "@/lib/roles";

export const PASSWORD = "correct-horse-battery";

export function uniqueEmail(tag: string): string {
  return `${tag}-${randomBytes(4).toString("hex")}@test.counterpoise.local`;
}

export type Person = { id: string; email: string; name: string; cookie: string };

/** An account with a verified e-mail and a password, as after sign-up and verification. */
export async function makeAccount(tag: string, opts: { signIn?: boolean; name?: string } = {}): Promise<Person> {
  const auth = getAuth();
  const ctx = await auth.$context;
  const email = uniqueEmail(tag);
  const name = opts.name ?? `${tag[0].toUpperCase()}${tag.slice(1)} Tester`;
  const u = await ctx.internalAdapter.createUser({ email, name, emailVerified: true }, { method: "email-password" });
  await ctx.internalAdapter.linkAccount({ userId: u.id, providerId: "credential", accountId: u.id, password: await ctx.password.hash(PASSWORD) });
  const cookie = opts.signIn === false ? "" : await signIn(email);
  return { id: u.id, email, name, cookie };
}

/** A bare user row (no password, no session): a cheap member to act upon. */
export async function makeBareUser(tag: string): Promise<{ id: string; email: string; name: string }> {
  const id = `t-${randomBytes(8).toString("hex")}`;
  const email = uniqueEmail(tag);
  await db.insert(user).values({ id, email, name: `${tag} Bare`, emailVerified: true });
  return { id, email, name: `${tag} Bare` };
}

/** Sign in through better-auth and return the Cookie header value of the new session. */
export async function signIn(email: string, password = PASSWORD): Promise<string> {
  const res = await getAuth().api.signInEmail({ body: { email, password }, returnHeaders: true });
  return cookieHeader(res.headers.getSetCookie());
}

/** The session token a Cookie header carries (its row in `session`), without the signature. */
export function sessionTokenOf(cookie: string): string {
  return decodeURIComponent(/counterpoise\.session_token=([^;]+)/.exec(cookie)![1]).split(".")[0];
}

/** The token of an invitation link (`…/invite/<token>`), as its routes take it. */
export function invitationTokenOf(url: string): string {
  return decodeURIComponent(url.split("/invite/")[1]);
}

export function cookieHeader(setCookies: string[]): string {
  return setCookies.map((c) => c.split(";")[0]).join("; ");
}

/** A workspace with the given members (no personal flag). */
export async function makeWorkspace(name: string, members: Array<[{ id: string }, Role]>): Promise<string> {
  const [ws] = await db.insert(workspace).values({ name }).returning({ id: workspace.id });
  if (members.length) await db.insert(membership).values(members.map(([m, role]) => ({ workspaceId: ws.id, userId: m.id, role })));
  return ws.id;
}

/** How a team names a member: the role, or the role with the account's tag and name. */
export type TeamMember = Role | { role: Role; tag?: string; name?: string };

/**
 * A workspace and signed-in accounts in it, one per key (members in the order written): the key is
 * the account's tag (`prefix-key` with a prefix), the value its role. `{ ws, ...people }`.
 */
export async function makeTeam<K extends string>(workspaceName: string, members: Record<K, TeamMember>, opts: { prefix?: string } = {}): Promise<{ ws: string } & Record<K, Person>> {
  const keys = Object.keys(members) as K[];
  const made = await Promise.all(
    keys.map((key) => {
      const m: TeamMember = members[key];
      const { tag, name } = typeof m === "string" ? { tag: undefined, name: undefined } : m;
      return makeAccount(tag ?? (opts.prefix ? `${opts.prefix}-${key}` : key), name ? { name } : {});
    }),
  );
  const people = Object.fromEntries(keys.map((key, i) => [key, made[i]])) as Record<K, Person>;
  const ws = await makeWorkspace(
    workspaceName,
    keys.map((key, i): [Person, Role] => {
      const m: TeamMember = members[key];
      return [made[i], typeof m === "string" ? m : m.role];
    }),
  );
  return { ws, ...people };
}

export async function roleOf(workspaceId: string, userId: string): Promise<Role | null> {
  const rows = await db.select({ role: membership.role, userId: membership.userId }).from(membership).where(eq(membership.workspaceId, workspaceId));
  return rows.find((r) => r.userId === userId)?.role ?? null;
}

/** Parsed JSON of a response; tests read into it freely. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type Json = any;

type Handler = (req: Request, ctx: { params: Promise<Record<string, string | string[] | undefined>> }) => Promise<Response>;

/** Call a route handler the way Next does: a Request and a params promise. */
export async function call(
  handler: Handler,
  opts: {
    method?: string;
    path?: string;
    params?: Record<string, string>;
    cookie?: string;
    body?: unknown;
    rawBody?: string;
    headers?: Record<string, string>;
    origin?: string | null;
  } = {},
): Promise<{ status: number; body: Json; res: Response }> {
  const method = opts.method ?? "GET";
  const headers = new Headers(opts.headers);
  if (opts.cookie) headers.set("cookie", opts.cookie);
  const origin = opts.origin === undefined ? appOrigin() : opts.origin;
  if (origin !== null && method !== "GET") headers.set("origin", origin);
  let body: string | undefined;
  if (opts.rawBody !== undefined) body = opts.rawBody;
  else if (opts.body !== undefined) body = JSON.stringify(opts.body);
  if (body !== undefined && !headers.has("content-type")) headers.set("content-type", "application/json");
  const req = new Request(`${appOrigin()}${opts.path ?? "/api/test"}`, { method, headers, body });
  const res = await handler(req, { params: Promise.resolve(opts.params ?? {}) });
  const text = await res.text();
  let parsed: unknown = text;
  try {
    parsed = text ? JSON.parse(text) : null;
  } catch {
    /* not JSON */
  }
  return { status: res.status, body: parsed, res };
}

async function portIsFree(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const srv = createServer();
    srv.once("error", () => resolve(false));
    srv.listen(port, "127.0.0.1", () => srv.close(() => resolve(true)));
  });
}

/**
 * Make sure mail reaches the dev_mail table: under `npm test` the local services already run
 * the SMTP fake; a bare vitest run gets one in-process. Returns a stop function.
 */
export async function ensureMailFake(): Promise<() => Promise<void>> {
  const smtp = smtpSettings();
  if (smtp.kind !== "local" || !(await portIsFree(smtp.port))) return async () => undefined;
  const store = devMailStore(process.env.DATABASE_URL!);
  const stop = await startMailFake({ port: smtp.port, host: smtp.host, onMail: store.save });
  return async () => {
    await stop();
    await store.close();
  };
}

/** Mail for this file (or the describe block it is called in): the fake made sure of before its tests, stopped after. */
export function withMailFake(): void {
  let stop: (() => Promise<void>) | undefined;
  beforeAll(async () => {
    stop = await ensureMailFake();
  });
  afterAll(async () => stop?.());
}

/** The newest mail to an address, waiting up to `timeoutMs` for it to arrive. */
export async function waitForMail(to: string, opts: { subject?: RegExp; timeoutMs?: number; after?: number } = {}) {
  const deadline = Date.now() + (opts.timeoutMs ?? 8000);
  for (;;) {
    const rows = await db.select().from(devMail).orderBy(desc(devMail.id)).limit(200);
    const hit = rows.find(
      (m) => m.to.includes(to.toLowerCase()) && (!opts.subject || opts.subject.test(m.subject)) && (!opts.after || m.id > opts.after),
    );
    if (hit) return hit;
    if (Date.now() > deadline) throw new Error(`no mail to ${to}${opts.subject ? ` matching ${opts.subject}` : ""} arrived`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

export function firstLink(text: string): string {
  const m = text.match(/https?:\/\/\S+/);
  if (!m) throw new Error(`no link in mail:\n${text}`);
  return m[0];
}
