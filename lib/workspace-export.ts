import "server-only";
// A workspace's sketches in one file (owners): the latest version of each, in the sketch-file
// format (/work/shared/spec/sketch-file.md) under `file`, with what the workspace knows about it
// beside. One JSON document, not an archive: every `file` re-imports as it is (File › Import
// JSON, `npm run solve`, or POST /api/workspaces/:id/sketches). Written as a stream, a page of
// sketches at a time, so a large workspace never sits in memory whole.
import { exportPage, workspaceForExport, type ExportCursor } from "@/db/queries/workspace-export";
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
  sketches: ExportedSketch[];
};

export type ExportedSketch = {
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

/** How many sketches are read from the database at a time while an export is written. */
export const EXPORT_PAGE_SIZE = 25;

/**
 * The export of a workspace (owners), as a stream: the access check and the audit record happen
 * before it is returned (so a refusal is an ordinary error reply), then the bundle is written a
 * page of sketches at a time as the reader asks for more, so memory holds one page, never the
 * whole workspace. Each sketch is one chunk; its `file` is the version's document as the text it
 * was saved as. The same JSON as a `WorkspaceExport` built in one piece, key for key.
 */
export async function exportWorkspace(
  workspaceId: string,
  actor: Actor,
  now = new Date(),
  { pageSize = EXPORT_PAGE_SIZE }: { pageSize?: number } = {},
): Promise<{ stream: ReadableStream<Uint8Array>; fileName: string; sketches: number }> {
  const found = await workspaceForExport(workspaceId, actor.id);
  if (!found) {
    const role = await getRole(workspaceId, actor.id);
    if (!role) throw new AppError("not_found", "No such workspace, or you are not a member of it.");
    throw new AppError("forbidden", refusedWords(role, "workspace.export"));
  }
  const ws = { id: found.id, name: found.name };
  // the count is the workspace's when the export began (a sketch added or deleted while it is
  // written may or may not be in it)
  await recordAudit({
    action: "workspace.export",
    actorId: actor.id,
    actorEmail: actor.email,
    workspaceId,
    targetType: "workspace",
    targetId: workspaceId,
    detail: { name: found.name, sketches: found.sketches },
  });
  const head: Omit<WorkspaceExport, "sketches"> = { format: WORKSPACE_EXPORT_FORMAT, version: 1, exportedAt: now.toISOString(), exportedBy: actor.name, workspace: ws };
  const encoder = new TextEncoder();
  let after: ExportCursor | null = null;
  let written = 0;
  let finished = false;
  const stream = new ReadableStream<Uint8Array>({
    start(controller) {
      controller.enqueue(encoder.encode(`${JSON.stringify(head).slice(0, -1)},"sketches":[`));
    },
    async pull(controller) {
      if (finished) return;
      const rows = await exportPage(workspaceId, actor.id, after, pageSize);
      for (const s of rows) {
        const meta: Omit<ExportedSketch, "file"> = {
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
        };
        controller.enqueue(encoder.encode(`${written++ ? "," : ""}${JSON.stringify(meta).slice(0, -1)},"file":${s.document}}`));
      }
      if (rows.length < pageSize) {
        finished = true;
        controller.enqueue(encoder.encode("]}"));
        controller.close();
        return;
      }
      const last = rows[rows.length - 1];
      after = { title: last.title, createdAt: last.createdAt, id: last.id };
    },
    cancel() {
      finished = true;
    },
  });
  return { stream, fileName: exportFileName(found.name, now), sketches: found.sketches };
}
