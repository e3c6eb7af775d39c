import Link from "next/link";
import { AuthCard, AuthFrame } from "@/components/auth/AuthFrame";
import { buttonClass } from "@/components/shell/controls";
import { currentSession } from "@/lib/session";

/** Any address the app does not have: the same frame as the signed-out pages, and ways on. */
export default async function NotFound() {
  // a signed-in visitor's header leads to their workspaces (as on the account pages); a session that
  // cannot be read takes the signed-out words
  const signedIn = await currentSession().then(Boolean, () => false);
  return (
    <AuthFrame signedIn={signedIn}>
      <AuthCard title="No page at this address" lead="The link may be mistyped, or the page has moved. Nothing you saved is affected.">
        <div className="flex flex-wrap gap-2">
          <Link href="/workspaces" className={buttonClass("primary")}>
            Your workspaces
          </Link>
          <Link href="/" className={buttonClass("secondary")}>
            Home page
          </Link>
        </div>
      </AuthCard>
    </AuthFrame>
  );
}
