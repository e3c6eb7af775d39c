import "server-only";
import { notFound } from "next/navigation";
import type { SketchData } from "@/components/sketches/SketchScreen";
import { asBusy } from "./db-unavailable";
import { AppError } from "./errors";
import { isUuid } from "./schemas";
import { requirePageRole } from "./session";
import { readSketch } from "./sketches";

/**
 * A sketch page's guard and data: signed in, a member of the workspace in the path, and the
 * sketch in that workspace (else the not-found page). Reads through the same function as
 * GET /api/sketches/:id.
 */
export async function loadSketchPage(workspaceId: string, sketchId: string, path: string) {
  const { session, role } = await requirePageRole(workspaceId, path);
  if (!isUuid(sketchId)) notFound();
  const data = await readSketch(sketchId, session.user.id).catch((err: unknown) => {
    if (err instanceof AppError && err.status < 500) notFound();
    throw asBusy(err);
  });
  if (data.sketch.workspaceId !== workspaceId) notFound();
  return { session, role, data: JSON.parse(JSON.stringify(data)) as SketchData };
}
