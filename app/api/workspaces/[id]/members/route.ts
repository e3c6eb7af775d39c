import { listMembers } from "@/db/queries/workspaces";
import { otherMethods, route } from "@/lib/api";
import { workspaceParams } from "@/lib/schemas";

export const dynamic = "force-dynamic";

/** The members and their roles (every member may see who else is in the workspace). */
export const GET = route(
  { params: workspaceParams, workspace: { param: "id", permission: "members.list" } },
  async ({ params, user, role }) => ({ role, members: await listMembers(params.id, user.id) }),
);

export const { POST, PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET");
