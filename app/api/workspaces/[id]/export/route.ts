import { json, otherMethods, route } from "@/lib/api";
import { workspaceParams } from "@/lib/schemas";
import { exportWorkspace } from "@/lib/workspace-export";

export const dynamic = "force-dynamic";

/**
 * Every sketch of the workspace, the latest version of each in the sketch-file format, in one
 * JSON file (owners; `lib/workspace-export.ts`). Downloaded as an attachment named after the
 * workspace and the day; 403 for other members, 404 for everyone else.
 */
export const GET = route({ params: workspaceParams, workspace: { param: "id", permission: "workspace.export" } }, async ({ params, user }) => {
  const { bundle, fileName } = await exportWorkspace(params.id, user);
  return json(bundle, 200, { "Content-Disposition": `attachment; filename="${fileName}"` });
});

export const { POST, PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET");
