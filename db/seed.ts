// The demo workspace: four people, one per role, all verified, password "counterpoise-demo".
// Idempotent (fixed ids, inserts that skip what exists). Runs under tsx from scripts/db-setup.ts,
// so it opens its own pool and uses relative imports (db/index.ts is server-only).
// The demo sketches and their versions come from db/seed-sketches.ts.
import { hashPassword } from "better-auth/crypto";
import { and, eq, isNull } from "drizzle-orm";
import { drizzle } from "drizzle-orm/node-postgres";
import { createHash } from "node:crypto";
import { Pool } from "pg";
import { localDatabaseUrl } from "../lib/database-url";
import * as schema from "./schema";
import { seedDemoSketches } from "./seed-sketches";

export const DEMO_PASSWORD = "counterpoise-demo";
export const DEMO_WORKSPACE_ID = "6d656d6f-0000-4000-8000-000000000001";
export const DEMO_WORKSPACE_NAME = "Demo: Riverside Pump Station";

export const DEMO_USERS = [
  { id: "demo-olivia-owner", name: "Olivia Owner", email: "olivia.owner@demo.counterpoise.local", role: "owner" },
  { id: "demo-eddie-editor", name: "Eddie Editor", email: "eddie.editor@demo.counterpoise.local", role: "editor" },
  { id: "demo-chen-checker", name: "Chen Checker", email: "chen.checker@demo.counterpoise.local", role: "checker" },
  { id: "demo-vera-viewer", name: "Vera Viewer", email: "vera.viewer@demo.counterpoise.local", role: "viewer" },
] as const;

/** A pending invitation so the owners' table is not empty in the demo (its link was never mailed). */
const DEMO_PENDING = { email: "pat.pending@demo.counterpoise.local", role: "editor" as const };

type SeedDb = ReturnType<typeof drizzle<typeof schema>>;

async function seedPeople(db: SeedDb): Promise<void> {
  const { user, account, workspace, membership } = schema;
  let hash: string | null = null;
  for (const u of DEMO_USERS) {
    await db.insert(user).values({ id: u.id, name: u.name, email: u.email, emailVerified: true }).onConflictDoNothing();
    const [hasPassword] = await db.select({ id: account.id }).from(account).where(and(eq(account.userId, u.id), eq(account.providerId, "credential")));
    if (!hasPassword) {
      hash ??= await hashPassword(DEMO_PASSWORD);
      await db.insert(account).values({ id: `${u.id}-credential`, accountId: u.id, providerId: "credential", userId: u.id, password: hash });
    }
    // Everyone gets a personal workspace at sign-up; the demo people too.
    const [personal] = await db.select({ id: workspace.id }).from(workspace).where(eq(workspace.personalOf, u.id));
    if (!personal) {
      const [ws] = await db.insert(workspace).values({ name: `${u.name.split(" ")[0]}'s workspace`, personalOf: u.id }).returning({ id: workspace.id });
      await db.insert(membership).values({ workspaceId: ws.id, userId: u.id, role: "owner" });
    }
  }
}

/** The demo workspace was set up a fortnight before its sketches' first versions (12 days ago),
 *  its people joining the next day, so the audit log and the members' "joined" read in order. */
const DEMO_FOUNDED_DAYS_AGO = 14;

async function seedWorkspace(db: SeedDb): Promise<void> {
  const { workspace, membership, invitation, auditEvent } = schema;
  // one clock reading: the workspace and its founding event carry the same instant
  const now = Date.now();
  const daysAgo = (d: number) => new Date(now - d * 86_400_000);
  const [created] = await db
    .insert(workspace)
    .values({ id: DEMO_WORKSPACE_ID, name: DEMO_WORKSPACE_NAME, createdAt: daysAgo(DEMO_FOUNDED_DAYS_AGO) })
    .onConflictDoNothing()
    .returning({ id: workspace.id });
  await db
    .insert(membership)
    .values(DEMO_USERS.map((u, i) => ({ workspaceId: DEMO_WORKSPACE_ID, userId: u.id, role: u.role, createdAt: daysAgo(i === 0 ? DEMO_FOUNDED_DAYS_AGO : DEMO_FOUNDED_DAYS_AGO - 1) })))
    .onConflictDoNothing();
  if (created) {
    await db.insert(auditEvent).values({
      at: daysAgo(DEMO_FOUNDED_DAYS_AGO),
      action: "workspace.create",
      actorId: DEMO_USERS[0].id,
      actorEmail: DEMO_USERS[0].email,
      workspaceId: DEMO_WORKSPACE_ID,
      targetType: "workspace",
      targetId: DEMO_WORKSPACE_ID,
      detail: { name: DEMO_WORKSPACE_NAME },
    });
  }
  const [pending] = await db
    .select({ id: invitation.id })
    .from(invitation)
    .where(and(eq(invitation.workspaceId, DEMO_WORKSPACE_ID), eq(invitation.email, DEMO_PENDING.email), isNull(invitation.acceptedAt), isNull(invitation.withdrawnAt)));
  if (!pending) {
    const tokenHash = createHash("sha256").update(`demo-pending-${Date.now()}-${Math.random()}`).digest("hex");
    await db.insert(invitation).values({
      workspaceId: DEMO_WORKSPACE_ID,
      email: DEMO_PENDING.email,
      role: DEMO_PENDING.role,
      tokenHash,
      invitedBy: DEMO_USERS[0].id,
      expiresAt: new Date(Date.now() + 7 * 24 * 3600 * 1000),
    });
  }
}

export async function seedDemo(url = process.env.DATABASE_URL || localDatabaseUrl()): Promise<void> {
  const pool = new Pool({ connectionString: url, max: 2 });
  try {
    const db = drizzle(pool, { schema, casing: "snake_case" });
    await seedPeople(db);
    await seedWorkspace(db);
    await seedDemoSketches(db, DEMO_WORKSPACE_ID);
  } finally {
    await pool.end();
  }
}
