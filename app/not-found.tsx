import Link from "next/link";
import { AuthCard, AuthFrame } from "@/components/auth/AuthFrame";
import { buttonClass } from "@/components/shell/controls";

/** Any address the app does not have: the same frame as the signed-out pages, and ways on. */
export default function NotFound() {
  return (
    <AuthFrame>
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
