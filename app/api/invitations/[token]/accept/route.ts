import { otherMethods, route } from "@/lib/api";
import { acceptInvitation } from "@/lib/invitations";
import { tokenParams } from "@/lib/schemas";

export const dynamic = "force-dynamic";

/** The signed-in invitee joins the workspace (once; the link must be open and addressed to them). */
export const POST = route({ params: tokenParams }, async ({ params, user }) => acceptInvitation(params.token, user));

export const { GET, HEAD, PUT, PATCH, DELETE, OPTIONS } = otherMethods("POST");
