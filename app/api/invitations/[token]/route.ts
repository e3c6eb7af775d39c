import { otherMethods, route } from "@/lib/api";
import { readInvitation } from "@/lib/invitations";
import { tokenParams } from "@/lib/schemas";

export const dynamic = "force-dynamic";

/**
 * What an invitation link leads to, for anyone holding it (no sign-in): 200 with the workspace,
 * the address and the role while it can be used; 410 once it has expired, been used or been
 * withdrawn (`error.invitationStatus`, `error.workspaceName`, `error.inviterName`: whom to ask); 404 for a
 * link nobody sent.
 */
export const GET = route({ auth: "none", params: tokenParams }, async ({ params }) => readInvitation(params.token));

export const { POST, PUT, PATCH, DELETE, OPTIONS } = otherMethods("GET");
