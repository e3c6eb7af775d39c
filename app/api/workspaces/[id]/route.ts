import { getWorkspaceForMember } from "@/db/queries/workspaces";
import { otherMethods, route } from "@/lib/api";
import { AppError } from "@/lib/errors";
import { rename } from "@/lib/members";
import { deleteWorkspaceInput, renameWorkspaceInput, workspaceParams } from "@/lib/schemas";
import { deleteWorkspace } from "@/lib/workspace-deletion";

export const dynamic = "force-dynamic";

/** The workspace and the caller's role in it. */
export const GET = route(
  { params: workspaceParams, workspace: { param: "id", permission: "workspace.read" } },
  async ({ params, user }) => {
    const ws = await getWorkspaceForMember(params.id, user.id);
    if (!ws) throw new AppError("not_found");
    return { workspace: { id: ws.id, name: ws.name, personal: ws.personal, role: ws.role, createdAt: ws.createdAt } };
  },
);

/** Rename (owners). */
export const PATCH = route(
  { params: workspaceParams, body: renameWorkspaceInput, workspace: { param: "id", permission: "workspace.rename" } },
  async ({ params, user, body }) => ({ workspace: await rename(params.id, user, body.name) }),
);

/**
 * Delete the workspace (owners), its name typed again as `confirmName`: its sketches with their
 * versions, comments, sign-offs and files go; the members are told by mail. Answers what went.
 */
export const DELETE = route(
  { params: workspaceParams, body: deleteWorkspaceInput, workspace: { param: "id", permission: "workspace.delete" } },
  async ({ params, user, body }) => ({ workspace: await deleteWorkspace(params.id, { id: user.id, email: user.email, name: user.name }, body.confirmName) }),
);

export const { POST, PUT, OPTIONS } = otherMethods("GET", "PATCH", "DELETE");
