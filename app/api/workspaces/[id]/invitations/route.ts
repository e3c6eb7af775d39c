import { listInvitations } from "@/db/queries/invitations";
import { json, otherMethods, route } from "@/lib/api";
import { inviteMember } from "@/lib/invitations";
import { inviteInput, workspaceParams } from "@/lib/schemas";

export const dynamic = "force-dynamic";

/** Open invitations (owners). */
export const GET = route(
  { params: workspaceParams, workspace: { param: "id", permission: "invitations.list" } },
  async ({ params, user }) => ({ invitations: await listInvitations(params.id, user.id) }),
);

/** Invite by e-mail (owners). The answer carries the link, so an owner can pass it on if the mail is slow. */
export const POST = route(
  { params: workspaceParams, body: inviteInput, workspace: { param: "id", permission: "invitations.create" } },
  async ({ params, user, body }) => {
    const invitation = await inviteMember({ workspaceId: params.id, actor: user, email: body.email, role: body.role });
    return json({ invitation }, 201);
  },
);

export const { PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET", "POST");
