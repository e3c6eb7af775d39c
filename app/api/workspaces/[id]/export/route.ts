import { otherMethods, route } from "@/lib/api";
import { workspaceParams } from "@/lib/schemas";
import { exportWorkspace } from "@/lib/workspace-export";

export const dynamic = "force-dynamic";

/**
 * Every sketch of the workspace, the latest version of each in the sketch-file format, in one
 * JSON file (owners; `lib/workspace-export.ts`), streamed a page of sketches at a time. Downloaded
 * as an attachment named after the workspace and the day; 403 for other members, 404 for everyone
 * else (both decided before anything is streamed).
 */
export const GET = route({ params: workspaceParams, workspace: { param: "id", permission: "workspace.export" } }, async ({ params, user }) => {
  const { stream, fileName } = await exportWorkspace(params.id, user);
  return new Response(stream, {
    status: 200,
    headers: { "Content-Type": "application/json; charset=utf-8", "Cache-Control": "no-store", "Content-Disposition": `attachment; filename="${fileName}"` },
  });
});

export const { POST, PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET");
