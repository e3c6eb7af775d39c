import "server-only";
import { redirect } from "next/navigation";
import { currentSession } from "@/lib/session";
import type { AuthSession } from "@/lib/auth";

/**
 * Sign-in and sign-up opened by someone signed in: straight on to `target`, unless the link names
 * another address (a mail's "sign in as …", a switch of account). Then the session comes back, for
 * the page to say whose it is and to offer signing out; null when nobody is signed in.
 */
export async function sessionForOtherAddress(email: string | undefined, target: string): Promise<AuthSession | null> {
  const session = await currentSession();
  if (session && (!email?.trim() || email.trim().toLowerCase() === session.user.email.toLowerCase())) redirect(target);
  return session;
}
