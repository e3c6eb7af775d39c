import "server-only";
import { betterAuth } from "better-auth";
import { APIError, createAuthMiddleware, isAPIError } from "better-auth/api";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { db } from "@/db";
import { ensurePersonalWorkspace } from "@/db/queries/workspaces";
import { account, rateLimit, session, user, verification } from "@/db/schema";
import { sessionAuditKey } from "./account-activity";
import { recordAudit } from "./audit";
import { firstReport, unavailableReason } from "./db-unavailable";
import { appOrigin, appUrl, authRateLimit, authSecret, isHttpsApp, trustedProxies } from "./env";
import { sendMailInBackground } from "./mail";
import { emailChangedNotice, emailChangeMail, existingAccountMail, passwordResetMail, verificationMail } from "./mail-templates";
import { personNameSchema } from "./schemas";

/** Paths (after /api/auth) that take a password or send mail: these get the AUTH_RATE_LIMIT_* budget. */
export const CREDENTIAL_PATHS = [
  "/sign-in/*",
  "/sign-up/*",
  "/change-password",
  "/change-email",
  "/request-password-reset",
  "/reset-password",
  "/send-verification-email",
] as const;

/**
 * The page a sign-in was asked to return to (its `next`), read from the Referer of the sign-in
 * request, and only when that is this app's own /sign-in page; "" when there is none.
 */
function signInNext(referer: string | null | undefined): string {
  if (!referer) return "";
  let from: URL;
  try {
    from = new URL(referer);
  } catch {
    return "";
  }
  if (from.origin !== appOrigin() || from.pathname !== "/sign-in") return "";
  const next = from.searchParams.get("next");
  // a path in this app only (as lib/session.ts safeNext), and never the default
  if (!next || !next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\") || next === "/workspaces") return "";
  return next;
}

/**
 * Confirmation links land on /verify. A sign-in by an unconfirmed account resends the link with no
 * page to return to: it keeps the sign-in page's own `next` (an invitation to join, a scratch sketch
 * to save), so confirming and signing in still ends there.
 */
export function withVerifyCallback(url: string, referer?: string | null): string {
  const u = new URL(url);
  const callback = u.searchParams.get("callbackURL");
  if (!callback || callback === "/") {
    const next = signInNext(referer);
    u.searchParams.set("callbackURL", next ? `/verify?confirmed=1&next=${encodeURIComponent(next)}` : "/verify?confirmed=1");
  }
  return u.toString();
}

/**
 * The change of address a confirmation link (better-auth's signed token in `url`) makes, `{ from,
 * to }`, or null for a new account's link: its payload says so (`requestType`). Read only to choose
 * the mail's words and to tell the old address; better-auth checks the signature itself.
 */
export function emailChangeOf(url: string): { from: string; to: string } | null {
  try {
    const token = new URL(url).searchParams.get("token") ?? "";
    const payload = JSON.parse(Buffer.from(token.split(".")[1] ?? "", "base64url").toString("utf8")) as { requestType?: unknown; email?: unknown; updateTo?: unknown };
    if (payload.requestType !== "change-email-verification" || typeof payload.email !== "string" || typeof payload.updateTo !== "string") return null;
    return { from: payload.email, to: payload.updateTo };
  } catch {
    return null;
  }
}

/** Whether a confirmation link is for a change of address rather than a new account. */
export const isEmailChangeLink = (url: string): boolean => emailChangeOf(url) !== null;

/** Sign-up, sign-in and the rest carry a few short fields; nothing legitimate comes near this. */
export const MAX_AUTH_BODY_BYTES = 64 * 1024;

/**
 * The name as stored, or a 400 naming the field: better-auth takes any string, so sign-up and
 * profile updates are held to the same rule as the invitation sign-up form.
 */
export function checkedName(name: unknown): string {
  const parsed = personNameSchema.safeParse(name);
  if (parsed.success) return parsed.data;
  const message = parsed.error.issues[0]?.code === "invalid_type" ? "The name is text." : parsed.error.issues[0]?.message ?? "The name is not valid.";
  throw new APIError("BAD_REQUEST", { code: "INVALID_NAME", field: "name", message: `name: ${message}` });
}

/**
 * better-auth's log (its `logger.log`). A database out of reach (PostgreSQL down or restarting, the
 * pool busy: lib/db-unavailable.ts) is load, not a bug: one warning line with the driver's words, as
 * the API's 503s write, once per failure, instead of a stack trace per request that would hide the
 * real faults. Anything else keeps its full detail (the error and its stack) at its own level.
 */
export function authLog(level: "debug" | "info" | "warn" | "error", message: unknown, ...args: unknown[]): void {
  for (const arg of [message, ...args]) {
    const reason = unavailableReason(arg);
    if (reason === null) continue;
    if (firstReport(arg)) console.warn(`[auth] database unavailable (${typeof message === "string" && message ? message : level}): ${reason}`);
    return;
  }
  const line = `[auth] ${typeof message === "string" ? message : ""}`.trimEnd();
  const detail = typeof message === "string" ? args : [message, ...args];
  if (level === "error") console.error(line, ...detail);
  else if (level === "warn") console.warn(line, ...detail);
  else console.log(line, ...detail);
}

export type AuthOverrides = { rateLimit?: { max: number; window: number } };

/** The better-auth instance: e-mail and password on PostgreSQL, mail through lib/mail. */
export function createAuth(overrides: AuthOverrides = {}) {
  const limit = overrides.rateLimit ?? authRateLimit();
  const customRules = Object.fromEntries(CREDENTIAL_PATHS.map((p) => [p, { window: limit.window, max: limit.max }]));
  return betterAuth({
    appName: "Counterpoise",
    baseURL: appUrl(),
    basePath: "/api/auth",
    secret: authSecret(),
    trustedOrigins: [appOrigin()],
    logger: { level: "warn", log: authLog },
    database: drizzleAdapter(db, { provider: "pg", schema: { user, session, account, verification, rateLimit }, transaction: true }),
    user: {
      // a new address takes effect only once a link mailed to it is opened (better-auth's
      // change-email-verification); an address with an account gets no mail and changes nothing
      changeEmail: { enabled: true },
      additionalFields: {
        emailNotifications: { type: "boolean", required: false, defaultValue: true, input: true },
      },
    },
    emailAndPassword: {
      enabled: true,
      requireEmailVerification: true,
      minPasswordLength: 8,
      maxPasswordLength: 128,
      revokeSessionsOnPasswordReset: true,
      resetPasswordTokenExpiresIn: 60 * 60,
      async sendResetPassword({ user: u, url }) {
        sendMailInBackground(passwordResetMail({ to: u.email, name: u.name, url }));
      },
      async onExistingUserSignUp({ user: u }) {
        sendMailInBackground(existingAccountMail({ to: u.email, name: u.name, url: `${appUrl()}/sign-in?email=${encodeURIComponent(u.email)}` }));
      },
      async onPasswordReset({ user: u }) {
        await recordAudit({ action: "auth.password_reset", actorId: u.id, actorEmail: u.email });
      },
    },
    emailVerification: {
      sendOnSignUp: true,
      sendOnSignIn: true,
      autoSignInAfterVerification: false,
      expiresIn: 60 * 60,
      // a change of address was just made (its link opened): the old address is told, so an
      // owner whose session was taken learns of it, and the audit log keeps both addresses
      async afterEmailVerification(u, request) {
        const change = request ? emailChangeOf(request.url) : null;
        if (!change) return;
        sendMailInBackground(emailChangedNotice({ to: change.from, name: u.name, newEmail: change.to, url: `${appUrl()}/sign-in` }));
        await recordAudit({ action: "auth.email_change", actorId: u.id, actorEmail: change.to, detail: { from: change.from, to: change.to } });
      },
      async sendVerificationEmail({ user: u, url }, request) {
        const link = withVerifyCallback(url, request?.headers.get("referer"));
        sendMailInBackground(isEmailChangeLink(url) ? emailChangeMail({ to: u.email, name: u.name, url: link }) : verificationMail({ to: u.email, name: u.name, url: link }));
      },
    },
    session: { expiresIn: 60 * 60 * 24 * 14, updateAge: 60 * 60 * 24 },
    // counted in PostgreSQL, so every app server behind a balancer spends the same budget
    rateLimit: { enabled: true, storage: "database", window: 60, max: 600, customRules },
    advanced: {
      // Secure cookies only over https: a browser drops Secure cookies on plain http://127.0.0.1.
      useSecureCookies: isHttpsApp(),
      cookiePrefix: "counterpoise",
      defaultCookieAttributes: { httpOnly: true, sameSite: "lax", path: "/" },
      // The auth route hands over X-Forwarded-For already cut down to the client address
      // (lib/client-address.ts); the same proxies are named here for calls that pass raw headers.
      ipAddress: { ipAddressHeaders: ["x-forwarded-for"], trustedProxies: trustedProxies() },
    },
    // account events that leave no row of their own to hook on: signing out on every device (or every
    // other one) and changing the password go into the audit log once better-auth has done them
    hooks: { after: createAuthMiddleware(auditAccountEvent) },
    databaseHooks: {
      user: {
        create: {
          async before(u) {
            return { data: { ...u, name: checkedName(u.name) } };
          },
          async after(u) {
            await ensurePersonalWorkspace({ id: u.id, name: u.name });
          },
        },
        update: {
          async before(u) {
            return u.name === undefined ? undefined : { data: { ...u, name: checkedName(u.name) } };
          },
        },
      },
      session: {
        create: {
          async after(s) {
            // the session's id only hashed: enough for the account page to mark "this device"
            await recordAudit({ action: "auth.sign_in", actorId: s.userId, detail: { ip: s.ipAddress ?? null, userAgent: s.userAgent ?? null, sessionHash: sessionAuditKey(s.id) } });
          },
        },
        // a plain sign-out (this device only): the person's own account activity lists it; the
        // everywhere and every-other-device sign-outs are recorded once by auditAccountEvent
        delete: {
          async after(s, ctx) {
            if (ctx?.path !== "/sign-out") return;
            await recordAudit({ action: "auth.sign_out", actorId: s.userId, targetType: "user", targetId: s.userId, detail: { ip: s.ipAddress ?? null, userAgent: s.userAgent ?? null } });
          },
        },
      },
    },
  });
}

/** The audit action of an account route, when it succeeded: see AUDIT_ACTIONS. */
const ACCOUNT_EVENTS: Record<string, "auth.sign_out_all" | "auth.sign_out_others" | "auth.password_change"> = {
  "/revoke-sessions": "auth.sign_out_all",
  "/revoke-other-sessions": "auth.sign_out_others",
  "/change-password": "auth.password_change",
};

async function auditAccountEvent(ctx: { path: string; body?: unknown; context: { returned?: unknown; session?: { user: { id: string; email: string } } | null } }) {
  const action = ACCOUNT_EVENTS[ctx.path];
  const who = ctx.context.session?.user;
  if (!action || !who || ctx.context.returned === undefined || isAPIError(ctx.context.returned)) return;
  const signedOutOthers = action === "auth.password_change" ? (ctx.body as { revokeOtherSessions?: unknown } | undefined)?.revokeOtherSessions === true : undefined;
  await recordAudit({ action, actorId: who.id, actorEmail: who.email, targetType: "user", targetId: who.id, detail: signedOutOthers === undefined ? {} : { signedOutOthers } });
}

export type Auth = ReturnType<typeof createAuth>;
export type AuthSession = NonNullable<Awaited<ReturnType<Auth["api"]["getSession"]>>>;
export type SessionUser = AuthSession["user"];

const globalForAuth = globalThis as unknown as { counterpoiseAuth?: Auth };

/** The app's one auth instance, made on first use (so `next build` never needs the secret). */
export function getAuth(): Auth {
  globalForAuth.counterpoiseAuth ??= createAuth();
  return globalForAuth.counterpoiseAuth;
}
