import type { ReactNode } from "react";
import { AuthFrame } from "@/components/auth/AuthFrame";
import { currentSession } from "@/lib/session";

export default async function AuthLayout({ children }: { children: ReactNode }) {
  // a signed-in visitor (an invitation's Join page, a reset link) is led to their workspaces, not
  // offered a sketch "without an account"; a session that cannot be read leaves the page to say so
  // (its own error page draws inside this frame), so the header takes the signed-out words
  const signedIn = await currentSession().then(Boolean, () => false);
  return <AuthFrame signedIn={signedIn}>{children}</AuthFrame>;
}
