import "server-only";
import { headers } from "next/headers";
import { cache } from "react";
import { getSketchAccess, getSketchDeletion, type SketchDeletion } from "@/db/queries/sketches";
import { getRole, getWorkspaceForMember } from "@/db/queries/workspaces";
import { getWorkspaceDeletion, type WorkspaceDeletion } from "@/db/queries/workspace-deletion";
import { orBusy } from "./db-unavailable";
import { PATH_HEADER } from "./request-path";
import { isUuid } from "./schemas";
import { currentSession } from "./session";
import { parseWorkspacePath } from "./workspace-path";

/**
 * Whether what a workspace page's address names is there for the reader, decided once per request:
 * the workspace layout asks before anything streams (a missing one must answer 404, and once the
 * loading skeleton has gone out the status is fixed at 200), and the not-found page asks again to
 * say what is missing. The same words whether it never existed or the reader may not see it; only a
 * member of the workspace a sketch was deleted from learns who deleted it and when, as the API's 404 says.
 */
export type PageTarget =
  | { kind: "found" }
  /** Signed out, or an address that is not a workspace page: nothing to say. */
  | { kind: "unknown" }
  | { kind: "no-workspace" }
  /** The workspace was deleted while the reader was a member: by whom and when. */
  | { kind: "workspace-deleted"; deleted: WorkspaceDeletion }
  /** `workspaceId`: the workspace, when the reader is a member of it (its tabs stay on the page);
   *  `deleted`: who deleted the sketch and when, when it was deleted from that workspace. */
  | { kind: "no-sketch"; workspaceId: string | null; deleted?: DeletedSketch }
  | { kind: "no-version"; workspaceId: string; sketchId: string; sketchTitle: string; latest: number; asked: string[]; here: string };

/** Who deleted a sketch and when, with the name of the workspace it was deleted from (for the way back). */
export type DeletedSketch = SketchDeletion & { workspaceName: string };

/** The deletion of a sketch, for a member of the workspace it was in (and, given, only that workspace). */
async function deletionFor(sketchId: string, userId: string, workspaceId?: string): Promise<DeletedSketch | null> {
  const deleted = await getSketchDeletion(sketchId, userId);
  if (!deleted || (workspaceId && deleted.workspaceId !== workspaceId)) return null;
  const ws = await getWorkspaceForMember(deleted.workspaceId, userId);
  if (ws) return { ...deleted, workspaceName: ws.name };
  // deleted with its workspace: the way back leads to the workspace's own "was deleted" page
  const gone = deleted.withWorkspace ? await getWorkspaceDeletion(deleted.workspaceId, userId) : null;
  return gone ? { ...deleted, workspaceName: gone.name } : null;
}

/**
 * The editor's own address (`/sketches/<id>`) naming a sketch deleted from a workspace the reader is
 * a member of: who deleted it and when, for its not-found page; null for anything else.
 */
export const editorPageDeletion = cache(async (): Promise<DeletedSketch | null> => orBusy(findEditorDeletion()));

async function findEditorDeletion(): Promise<DeletedSketch | null> {
  const session = await currentSession();
  const path = (await headers()).get(PATH_HEADER);
  const id = path ? /^\/sketches\/([^/?#]+)\/?(?:[?#]|$)/.exec(path)?.[1] : undefined;
  if (!session || !id || !isUuid(id) || (await getSketchAccess(id, session.user.id))) return null;
  return deletionFor(id, session.user.id);
}

export const pageTarget = cache(async (): Promise<PageTarget> => orBusy(findPageTarget()));

async function findPageTarget(): Promise<PageTarget> {
  const session = await currentSession();
  const path = (await headers()).get(PATH_HEADER);
  const asked = path ? parseWorkspacePath(path) : null;
  if (!session || !asked) return { kind: "unknown" };
  const role = isUuid(asked.workspaceId) ? await getRole(asked.workspaceId, session.user.id) : null;
  if (!role) {
    const gone = isUuid(asked.workspaceId) ? await getWorkspaceDeletion(asked.workspaceId, session.user.id) : null;
    if (gone) return { kind: "workspace-deleted", deleted: gone };
  }
  if (!asked.sketchId) return role ? { kind: "found" } : { kind: "no-workspace" };
  if (!role) return { kind: "no-sketch", workspaceId: null };
  const sketch = isUuid(asked.sketchId) ? await getSketchAccess(asked.sketchId, session.user.id) : null;
  if (!sketch && isUuid(asked.sketchId)) {
    // a sketch deleted from this workspace (not another one the reader is also in: the address is wrong there)
    const deleted = await deletionFor(asked.sketchId, session.user.id, asked.workspaceId);
    if (deleted) return { kind: "no-sketch", workspaceId: asked.workspaceId, deleted };
  }
  if (!sketch || sketch.workspaceId !== asked.workspaceId || !sketch.role) return { kind: "no-sketch", workspaceId: asked.workspaceId };
  const missing = asked.versions?.missing(sketch.latestVersion) ?? [];
  if (asked.versions && missing.length) {
    return { kind: "no-version", workspaceId: asked.workspaceId, sketchId: sketch.id, sketchTitle: sketch.title, latest: sketch.latestVersion, asked: missing, here: asked.versions.here };
  }
  return { kind: "found" };
}
