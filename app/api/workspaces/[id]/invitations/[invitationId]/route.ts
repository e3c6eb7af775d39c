import { db } from "@/db";
import { withdrawInvitation } from "@/db/queries/invitations";
import { otherMethods, route } from "@/lib/api";
import { recordAudit } from "@/lib/audit";
import { AppError } from "@/lib/errors";
import { invitationParams } from "@/lib/schemas";

export const dynamic = "force-dynamic";

/** Withdraw an open invitation (owners): its link stops working at once. */
export const DELETE = route(
  { params: invitationParams, workspace: { param: "id", permission: "invitations.withdraw" } },
  async ({ params, user }) =>
    db.transaction(async (tx) => {
      const row = await withdrawInvitation({ workspaceId: params.id, invitationId: params.invitationId, actorId: user.id }, tx);
      if (!row) throw new AppError("not_found", "No open invitation with that id in this workspace.");
      await recordAudit(
        { action: "invitation.withdraw", actorId: user.id, actorEmail: user.email, workspaceId: params.id, targetType: "invitation", targetId: row.id, detail: { email: row.email, role: row.role } },
        tx,
      );
      return { withdrawn: row.id };
    }),
);

export const { GET, HEAD, POST, PUT, PATCH, OPTIONS } = otherMethods("DELETE");
