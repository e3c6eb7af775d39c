import Link from "next/link";
import { AuthCard } from "@/components/auth/AuthFrame";
import { buttonClass, Notice } from "@/components/shell/controls";
import { currentSession } from "@/lib/session";

/** An invitation link nobody sent (mistyped, cut short when copied): 404, and what to do. */
export default async function InvitationNotFound() {
  const session = await currentSession();
  return (
    <AuthCard title="This invitation link is not valid">
      <div className="space-y-4">
        <Notice tone="error">We do not know this link. Check that the whole address from the mail was copied, or ask for a new invitation.</Notice>
        <Link href={session ? "/workspaces" : "/sign-in"} className={`${buttonClass("primary")} w-full`}>
          {session ? "Go to your workspaces" : "Sign in"}
        </Link>
      </div>
    </AuthCard>
  );
}
