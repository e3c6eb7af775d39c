import "server-only";
import { createHash } from "node:crypto";
import { and, desc, eq, inArray, isNull } from "drizzle-orm";
import { db } from "@/db";
import { auditEvent } from "@/db/schema";
import { orBusy } from "./db-unavailable";

/** The account events a person is shown of their own account, newest first. */
export const ACCOUNT_ACTIVITY_ACTIONS = [
  "auth.sign_in",
  "auth.sign_out",
  "auth.sign_out_others",
  "auth.sign_out_all",
  "auth.password_change",
  "auth.password_reset",
  "auth.email_change",
] as const;
export type AccountActivityAction = (typeof ACCOUNT_ACTIVITY_ACTIONS)[number];

/** One line of "Recent account activity" (browser-safe shape: no token, no other person). */
export type AccountActivityEntry = {
  id: number;
  at: string;
  action: AccountActivityAction;
  /** The browser's User-Agent of a sign-in or a plain sign-out, when it was recorded. */
  userAgent: string | null;
  ip: string | null;
  /** An address change: the old and the new address. */
  from: string | null;
  to: string | null;
  /** A password change that also signed out every other device. */
  signedOutOthers: boolean;
  /** The sign-in that started the session this list is shown in. */
  thisDevice: boolean;
};

/**
 * What a sign-in's audit detail keeps of its session (`sessionHash`): a SHA-256 of the session's
 * id, never the id itself nor its token (the cookie's secret). Enough to tell, later, which sign-in
 * started the session asking; of no use for anything else.
 */
export function sessionAuditKey(sessionId: string): string {
  return createHash("sha256").update(`counterpoise-session:${sessionId}`).digest("hex");
}

const text = (v: unknown) => (typeof v === "string" && v ? v : null);

/**
 * The last `limit` account events of `userId` (sign-ins, sign-outs, password and address
 * changes), newest first. Only the rows that person made on their own account (no workspace):
 * pass the id of the signed-in session's user, never one taken from the request, and that
 * session's id (`currentSessionId`) to mark the sign-in that started it.
 */
export async function accountActivity(userId: string, currentSessionId: string | null, limit = 20): Promise<AccountActivityEntry[]> {
  const current = currentSessionId ? sessionAuditKey(currentSessionId) : null;
  const rows = await orBusy(
    db
      .select({ id: auditEvent.id, at: auditEvent.at, action: auditEvent.action, detail: auditEvent.detail })
      .from(auditEvent)
      .where(and(eq(auditEvent.actorId, userId), isNull(auditEvent.workspaceId), inArray(auditEvent.action, [...ACCOUNT_ACTIVITY_ACTIONS])))
      .orderBy(desc(auditEvent.id))
      .limit(Math.min(Math.max(limit, 1), 100)),
  );
  return rows.map((r) => {
    const d = (r.detail ?? {}) as Record<string, unknown>;
    return {
      id: r.id,
      at: r.at.toISOString(),
      action: r.action as AccountActivityAction,
      userAgent: text(d.userAgent),
      ip: text(d.ip),
      from: text(d.from),
      to: text(d.to),
      signedOutOthers: d.signedOutOthers === true,
      thisDevice: r.action === "auth.sign_in" && current !== null && d.sessionHash === current,
    };
  });
}
