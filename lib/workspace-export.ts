import "server-only";
// A workspace's sketches in one file (owners): the latest version of each, in the sketch-file
// format (/work/shared/spec/sketch-file.md) under `file`, with what the workspace knows about it
// beside. One JSON document, not an archive: every `file` re-imports as it is (File › Import
// JSON, `npm run solve`, or POST /api/workspaces/:id/sketches).
import { workspaceSketchesForExport } from "@/db/queries/workspace-export";
import { getRole } from "@/db/queries/workspaces";
import type { SketchFile } from "@/solver/schema";
import { recordAudit } from "./audit";
import { AppError } from "./errors";
import { refusedWords } from "./roles";

export const WORKSPACE_EXPORT_FORMAT = "counterpoise.workspace-export";

export type WorkspaceExport = {
  format: typeof WORKSPACE_EXPORT_FORMAT;
  /** this bundle's own format version (the files inside carry theirs) */
  version: 1;
  exportedAt: string;
  exportedBy: string;
  workspace: { id: string; name: string };
  sketches: Array<{
    id: string;
    title: string;
    description: string;
    tags: string[];
    forkedFrom: string | null;
    /** the latest version, whose drawing `file` is */
    version: number;
    message: string;
    savedAt: string;
    savedBy: string | null;
    status: string | null;
    review: string;
    file: SketchFile;
  }>;
};

/** The download's name: the workspace's name in safe letters, and the day. */
export function exportFileName(workspaceName: string, at: Date): string {
  const slug =
    workspaceName
      .normalize("NFKD")
      .replace(/[\u0300-\u036f]/g, "")
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-+|-+$/g, "")
      .slice(0, 60) || "workspace";
  return `${slug}-sketches-${at.toISOString().slice(0, 10)}.json`;
}

type Actor = { id: string; email: string; name: string };

export async function exportWorkspace(workspaceId: string, actor: Actor, now = new Date()): Promise<{ bundle: WorkspaceExport; fileName: string }> {
  const found = await workspaceSketchesForExport(workspaceId, actor.id);
  if (!found) {
    const role = await getRole(workspaceId, actor.id);
    if (!role) throw new AppError("not_found", "No such workspace, or you are not a member of it.");
    throw new AppError("forbidden", refusedWords(role, "workspace.export"));
  }
  const bundle: WorkspaceExport = {
    format: WORKSPACE_EXPORT_FORMAT,
    version: 1,
    exportedAt: now.toISOString(),
    exportedBy: actor.name,
    workspace: found.workspace,
    sketches: found.sketches.map((s) => ({
      id: s.id,
      title: s.title,
      description: s.description,
      tags: s.tags,
      forkedFrom: s.forkedFromTitle,
      version: s.version,
      message: s.message,
      savedAt: s.savedAt.toISOString(),
      savedBy: s.savedBy,
      status: s.status,
      review: s.reviewState,
      file: s.document,
    })),
  };
  await recordAudit({
    action: "workspace.export",
    actorId: actor.id,
    actorEmail: actor.email,
    workspaceId,
    targetType: "workspace",
    targetId: workspaceId,
    detail: { name: found.workspace.name, sketches: bundle.sketches.length },
  });
  return { bundle, fileName: exportFileName(found.workspace.name, now) };
}
