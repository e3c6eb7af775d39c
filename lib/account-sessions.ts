import "server-only";
import { and, desc, eq, gt } from "drizzle-orm";
import { db } from "@/db";
import { session } from "@/db/schema";
import { orBusy } from "./db-unavailable";

/** One signed-in device of an account, as its settings page lists it (never the session's token). */
export type DeviceSession = { id: string; current: boolean; signedInAt: string; lastSeenAt: string; ipAddress: string | null; userAgent: string | null };

/**
 * The account's sessions that have not expired, newest activity first, the one making the request
 * (`currentSessionId`) marked. What "sign out every other device" and "everywhere" act on.
 */
export async function activeSessions(userId: string, currentSessionId: string, now = new Date()): Promise<DeviceSession[]> {
  const rows = await orBusy(
    db
      .select({ id: session.id, createdAt: session.createdAt, updatedAt: session.updatedAt, ipAddress: session.ipAddress, userAgent: session.userAgent })
      .from(session)
      .where(and(eq(session.userId, userId), gt(session.expiresAt, now)))
      .orderBy(desc(session.updatedAt), desc(session.createdAt)),
  );
  return rows
    .map((r) => ({ id: r.id, current: r.id === currentSessionId, signedInAt: r.createdAt.toISOString(), lastSeenAt: r.updatedAt.toISOString(), ipAddress: r.ipAddress || null, userAgent: r.userAgent || null }))
    .sort((a, b) => Number(b.current) - Number(a.current));
}
