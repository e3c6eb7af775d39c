import "server-only";
import { headers } from "next/headers";
import { cache } from "react";
import { getSketchAccess } from "@/db/queries/sketches";
import { getRole } from "@/db/queries/workspaces";
import { orBusy } from "./db-unavailable";
import { PATH_HEADER } from "./request-path";
import { isUuid } from "./schemas";
import { currentSession } from "./session";
import { parseWorkspacePath } from "./workspace-path";

/**
 * Whether what a workspace page's address names is there for the reader, decided once per request:
 * the workspace layout asks before anything streams (a missing one must answer 404, and once the
 * loading skeleton has gone out the status is fixed at 200), and the not-found page asks again to
 * say what is missing. The same words whether it never existed or the reader may not see it.
 */
export type PageTarget =
  | { kind: "found" }
  /** Signed out, or an address that is not a workspace page: nothing to say. */
  | { kind: "unknown" }
  | { kind: "no-workspace" }
  /** `workspaceId`: the workspace, when the reader is a member of it (its tabs stay on the page). */
  | { kind: "no-sketch"; workspaceId: string | null }
  | { kind: "no-version"; workspaceId: string; sketchId: string; sketchTitle: string; latest: number; asked: string[]; here: string };

export const pageTarget = cache(async (): Promise<PageTarget> => orBusy(findPageTarget()));

async function findPageTarget(): Promise<PageTarget> {
  const session = await currentSession();
  const path = (await headers()).get(PATH_HEADER);
  const asked = path ? parseWorkspacePath(path) : null;
  if (!session || !asked) return { kind: "unknown" };
  const role = isUuid(asked.workspaceId) ? await getRole(asked.workspaceId, session.user.id) : null;
  if (!asked.sketchId) return role ? { kind: "found" } : { kind: "no-workspace" };
  if (!role) return { kind: "no-sketch", workspaceId: null };
  const sketch = isUuid(asked.sketchId) ? await getSketchAccess(asked.sketchId, session.user.id) : null;
  if (!sketch || sketch.workspaceId !== asked.workspaceId || !sketch.role) return { kind: "no-sketch", workspaceId: asked.workspaceId };
  const missing = asked.versions?.missing(sketch.latestVersion) ?? [];
  if (asked.versions && missing.length) {
    return { kind: "no-version", workspaceId: asked.workspaceId, sketchId: sketch.id, sketchTitle: sketch.title, latest: sketch.latestVersion, asked: missing, here: asked.versions.here };
  }
  return { kind: "found" };
}
