import "server-only";
import { and, asc, count, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { sketch, sketchVersion, user, workspace } from "@/db/schema";
import { actorMay } from "./workspaces";

/**
 * The workspace an export is about, with how many sketches it holds; null unless the caller may
 * export it (the role is in the WHERE clause, so nothing is read for anyone else).
 */
export async function workspaceForExport(workspaceId: string, actorId: string) {
  const [ws] = await db
    .select({
      id: workspace.id,
      name: workspace.name,
      sketches: sql<number>`(${db.select({ n: count() }).from(sketch).where(eq(sketch.workspaceId, workspace.id))})::int`,
    })
    .from(workspace)
    .where(and(eq(workspace.id, workspaceId), actorMay(workspace.id, actorId, "workspace.export")));
  return ws ?? null;
}

/** Where the previous page of an export ended: its last sketch's place in the order. */
export type ExportCursor = { title: string; createdAt: string; id: string };

/**
 * One page of a workspace's sketches for its export, in the export's order (title, then creation,
 * then id), after `after`: each with its latest version, the document as the text it was saved as.
 * The role is checked again in the WHERE clause of every page, so an owner removed while their
 * export is being written gets no further sketches.
 */
export async function exportPage(workspaceId: string, actorId: string, after: ExportCursor | null, limit: number) {
  return db
    .select({
      id: sketch.id,
      title: sketch.title,
      description: sketch.description,
      tags: sketch.tags,
      forkedFromTitle: sketch.forkedFromTitle,
      // as text, not a Date: Postgres keeps microseconds, which a Date would round away
      createdAt: sql<string>`${sketch.createdAt}::text`,
      version: sketchVersion.number,
      message: sketchVersion.message,
      savedAt: sketchVersion.createdAt,
      savedBy: user.name,
      status: sketchVersion.status,
      reviewState: sketchVersion.reviewState,
      document: sql<string>`${sketchVersion.document}::text`,
    })
    .from(sketch)
    .innerJoin(sketchVersion, and(eq(sketchVersion.sketchId, sketch.id), eq(sketchVersion.number, sketch.latestVersion)))
    .leftJoin(user, eq(user.id, sketchVersion.authorId))
    .where(
      and(
        eq(sketch.workspaceId, workspaceId),
        actorMay(sketch.workspaceId, actorId, "workspace.export"),
        after ? sql`(${sketch.title}, ${sketch.createdAt}, ${sketch.id}) > (${after.title}, ${after.createdAt}::timestamptz, ${after.id}::uuid)` : undefined,
      ),
    )
    .orderBy(asc(sketch.title), asc(sketch.createdAt), asc(sketch.id))
    .limit(limit);
}
