import "server-only";
import { arrayContains, desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { devMail } from "@/db/schema";

export type DevMail = typeof devMail.$inferSelect;

/** Mail the local SMTP fake received, newest first, optionally only to one address. */
export async function listDevMail(opts: { to?: string; limit?: number } = {}): Promise<DevMail[]> {
  return db
    .select()
    .from(devMail)
    .where(opts.to ? arrayContains(devMail.to, [opts.to.toLowerCase()]) : undefined)
    .orderBy(desc(devMail.id))
    .limit(Math.min(opts.limit ?? 100, 500));
}

export async function getDevMail(id: number): Promise<DevMail | null> {
  const [row] = await db.select().from(devMail).where(eq(devMail.id, id));
  return row ?? null;
}
