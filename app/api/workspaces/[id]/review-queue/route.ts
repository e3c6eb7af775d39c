import { otherMethods, route } from "@/lib/api";
import { reviewQueueFor } from "@/lib/review/queue";
import { workspaceParams } from "@/lib/schemas";

export const dynamic = "force-dynamic";

/** The versions waiting for the caller's sign-off step: to check, to approve, or (their own, returned) to revise. */
export const GET = route(
  { params: workspaceParams, workspace: { param: "id", permission: "workspace.read" } },
  async ({ params, user, role }) => ({ items: await reviewQueueFor(params.id, user.id, role) }),
);

export const { POST, PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET");
