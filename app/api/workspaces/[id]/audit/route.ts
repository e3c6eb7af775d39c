import { listAuditEvents } from "@/db/queries/audit";
import { otherMethods, route } from "@/lib/api";
import { auditQuery, workspaceParams } from "@/lib/schemas";

export const dynamic = "force-dynamic";

/** The workspace's audit log, newest first, 50 at a time (owners). `?before=<id>` pages back;
 *  `?signIns=hide` leaves the members' sign-ins out. */
export const GET = route(
  { params: workspaceParams, query: auditQuery, workspace: { param: "id", permission: "audit.read" } },
  async ({ params, user, query }) => listAuditEvents(params.id, user.id, { before: query.before, limit: query.limit, signIns: query.signIns }),
);

export const { POST, PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET");
