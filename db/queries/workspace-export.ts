import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { sketch, sketchVersion, user, workspace } from "@/db/schema";
import { actorMay } from "./workspaces";

/**
 * Every sketch of a workspace with its latest version's document, by title; null unless the
 * caller may export it (the role is in the WHERE clause, so nothing is read for anyone else).
 */
export async function workspaceSketchesForExport(workspaceId: string, actorId: string) {
  const [ws] = await db
    .select({ id: workspace.id, name: workspace.name })
    .from(workspace)
    .where(and(eq(workspace.id, workspaceId), actorMay(workspace.id, actorId, "workspace.export")));
  if (!ws) return null;
  const rows = await db
    .select({
      id: sketch.id,
      title: sketch.title,
      description: sketch.description,
      tags: sketch.tags,
      forkedFromTitle: sketch.forkedFromTitle,
      createdAt: sketch.createdAt,
      version: sketchVersion.number,
      message: sketchVersion.message,
      savedAt: sketchVersion.createdAt,
      savedBy: user.name,
      status: sketchVersion.status,
      reviewState: sketchVersion.reviewState,
      document: sketchVersion.document,
    })
    .from(sketch)
    .innerJoin(sketchVersion, and(eq(sketchVersion.sketchId, sketch.id), eq(sketchVersion.number, sketch.latestVersion)))
    .leftJoin(user, eq(user.id, sketchVersion.authorId))
    .where(and(eq(sketch.workspaceId, workspaceId), actorMay(sketch.workspaceId, actorId, "workspace.export")))
    .orderBy(asc(sketch.title), asc(sketch.createdAt));
  return { workspace: ws, sketches: rows };
}
