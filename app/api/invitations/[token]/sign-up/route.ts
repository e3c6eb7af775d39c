import { json, otherMethods, route } from "@/lib/api";
import { signUpFromInvitation } from "@/lib/invitation-sign-up";
import { invitationSignUpInput, tokenParams } from "@/lib/schemas";

export const dynamic = "force-dynamic";

/** A new account from an invitation link: verified by the link, joined, signed in. */
export const POST = route({ auth: "none", params: tokenParams, body: invitationSignUpInput }, async ({ req, params, body }) => {
  const result = await signUpFromInvitation(params.token, body, req.headers);
  const res = json({ workspaceId: result.workspaceId }, 201);
  for (const cookie of result.setCookies) res.headers.append("Set-Cookie", cookie);
  return res;
});

export const { GET, HEAD, PUT, PATCH, DELETE, OPTIONS } = otherMethods("POST");
