import Link from "next/link";
import { AuthCard, AuthFrame } from "@/components/auth/AuthFrame";

/** Any address the app does not have: the same frame as the signed-out pages, and ways on. */
export default function NotFound() {
  return (
    <AuthFrame>
      <AuthCard title="No page at this address" lead="The link may be mistyped, or the page has moved. Nothing you saved is affected.">
        <div className="flex flex-wrap gap-2">
          <Link href="/workspaces" className="rounded-md bg-ink px-4 py-2 text-sm font-medium text-paper hover:bg-ink-soft">
            Your workspaces
          </Link>
          <Link href="/" className="rounded-md border border-ink/20 bg-paper-card px-4 py-2 text-sm font-medium hover:border-ink/45">
            Home page
          </Link>
        </div>
      </AuthCard>
    </AuthFrame>
  );
}
