import "server-only";
import { headers } from "next/headers";
import { notFound, redirect } from "next/navigation";
import { cache } from "react";
import { getRole } from "@/db/queries/workspaces";
import { getAuth, type AuthSession } from "./auth";
import { PATH_HEADER } from "./request-path";
import { orBusy } from "./db-unavailable";
import { can, type Permission, type Role } from "./roles";
import { isUuid } from "./schemas";

/**
 * The session behind a request's cookies, or null. A database that cannot be reached in time
 * throws `DatabaseBusyError` (a page's error page says "busy", the API answers 503), not
 * better-auth's "Failed to get session".
 */
export async function sessionFrom(reqHeaders: Headers): Promise<AuthSession | null> {
  return orBusy(getAuth().api.getSession({ headers: reqHeaders }));
}

/** The signed-in session of the page being rendered (once per request), or null. */
export const currentSession = cache(async (): Promise<AuthSession | null> => sessionFrom(await headers()));

/** Only paths on this site may follow sign-in (never `//host` or a full URL). */
export function safeNext(next: string | null | undefined, fallback = "/workspaces"): string {
  if (!next || !next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return fallback;
  return next;
}

/** Pages for signed-in people call this first: signed out → /sign-in, then back to the page
 *  asked for (the address `proxy.ts` passes on), or to `next` when that is not known. */
export async function requirePageSession(next: string): Promise<AuthSession> {
  const s = await currentSession();
  if (!s) redirect(`/sign-in?next=${encodeURIComponent(safeNext((await headers()).get(PATH_HEADER) ?? next, safeNext(next)))}`);
  return s;
}

/**
 * A workspace page's guard: signed in, a member (else the not-found page, so nobody learns
 * what exists), and, when a permission is named, a role that has it (else `forbidden`).
 */
export async function requirePageRole(
  workspaceId: string,
  next: string,
  permission?: Permission,
): Promise<{ session: AuthSession; role: Role; allowed: boolean }> {
  const session = await requirePageSession(next);
  const role = isUuid(workspaceId) ? await orBusy(getRole(workspaceId, session.user.id)) : null;
  if (!role) notFound();
  return { session, role, allowed: permission ? can(role, permission) : true };
}
