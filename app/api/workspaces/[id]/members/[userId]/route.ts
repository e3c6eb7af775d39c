import { otherMethods, route } from "@/lib/api";
import { AppError } from "@/lib/errors";
import { changeRole, removeFromWorkspace } from "@/lib/members";
import { can } from "@/lib/roles";
import { changeRoleInput, memberParams } from "@/lib/schemas";

export const dynamic = "force-dynamic";

/** Change a member's role (owners; never the last owner). */
export const PATCH = route(
  { params: memberParams, body: changeRoleInput, workspace: { param: "id", permission: "members.changeRole" } },
  async ({ params, user, body }) => ({ member: await changeRole(params.id, user, params.userId, body.role) }),
);

/** Remove a member (owners), or leave (anyone, for themselves; never the last owner). */
export const DELETE = route(
  { params: memberParams, workspace: { param: "id", permission: "workspace.read" } },
  async ({ params, user, role }) => {
    if (params.userId !== user.id && !can(role, "members.remove")) throw new AppError("forbidden");
    return removeFromWorkspace(params.id, user, params.userId);
  },
);

export const { GET, HEAD, POST, PUT, OPTIONS } = otherMethods("PATCH", "DELETE");
