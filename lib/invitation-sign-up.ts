import "server-only";
import { getAuth } from "./auth";
import { withClientAddress } from "./client-address";
import { AppError } from "./errors";
import { accountExists, acceptInvitation, invitationSignInPath, invitationStateError, lookUpInvitation } from "./invitations";

/**
 * The invited address has an account already (made since the mail was sent, or in another tab):
 * the way on is to sign in with it, filled in, and come back to the invitation to join. `signIn`
 * is that page's path, for the form to offer as a link.
 */
export function existingAccountError(token: string, email: string): AppError {
  return new AppError("conflict", `An account for ${email} already exists. Sign in with it to accept the invitation.`, {
    extra: { signIn: invitationSignInPath(token, email) },
  });
}

/**
 * A new account made from an invitation link. The link reached the invited address, which
 * proves the address is theirs, so the account starts verified, joins the workspace and is
 * signed in at once. Returns the workspace and the Set-Cookie headers of the new session.
 */
export async function signUpFromInvitation(
  token: string,
  input: { name: string; password: string },
  reqHeaders: Headers,
): Promise<{ workspaceId: string; setCookies: string[] }> {
  const view = await lookUpInvitation(token);
  const stateError = invitationStateError(view);
  if (stateError) throw stateError;
  const email = view!.email;
  if (await accountExists(email)) {
    throw existingAccountError(token, email);
  }

  const auth = getAuth();
  const ctx = await auth.$context;
  let userId: string;
  try {
    const created = await ctx.internalAdapter.createUser({ email, name: input.name, emailVerified: true }, { method: "email-password" });
    userId = created.id;
    await ctx.internalAdapter.linkAccount({
      userId,
      providerId: "credential",
      accountId: userId,
      password: await ctx.password.hash(input.password),
    });
  } catch (err) {
    // Two sign-ups from one link at once: the e-mail's unique index lets only one through.
    if (await accountExists(email)) throw existingAccountError(token, email);
    throw err;
  }

  const joined = await acceptInvitation(token, { id: userId, email });
  const signedIn = await auth.api.signInEmail({ body: { email, password: input.password }, headers: withClientAddress(reqHeaders), returnHeaders: true });
  return { workspaceId: joined.workspaceId, setCookies: signedIn.headers.getSetCookie() };
}
