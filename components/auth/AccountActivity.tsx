import { formatDateTime } from "@/components/workspaces/format";
import type { AccountActivityEntry } from "@/lib/account-activity";
import { deviceWords } from "./deviceWords";

/** What one account event says, in the person's own terms ("Signed in on Firefox on Windows"). */
export function activityWords(e: AccountActivityEntry): string {
  const on = e.userAgent ? ` on ${deviceWords(e.userAgent)}` : "";
  switch (e.action) {
    case "auth.sign_in":
      return `Signed in${on}`;
    case "auth.sign_out":
      return `Signed out${on}`;
    case "auth.sign_out_others":
      return "Signed out every other device";
    case "auth.sign_out_all":
      return "Signed out everywhere";
    case "auth.password_change":
      return e.signedOutOthers ? "Changed the password and signed out every other device" : "Changed the password";
    case "auth.password_reset":
      return "Reset the password through a mailed link";
    case "auth.email_change":
      return e.from && e.to ? `Changed the sign-in address from ${e.from} to ${e.to}` : "Changed the sign-in address";
  }
}

/**
 * The account page's "Recent account activity": the signed-in person's own last sign-ins,
 * sign-outs, password and address changes, newest first, each with its time (UTC); the sign-in
 * that started the session looking at it says "This device", as the device list does.
 */
export function AccountActivity({ events }: { events: AccountActivityEntry[] }) {
  if (events.length === 0) {
    return <p className="text-sm text-ink-soft">No account activity yet. Sign-ins, sign-outs and changes of password or address will be listed here.</p>;
  }
  return (
    <ol className="divide-y divide-rule-soft rounded-md border border-rule" aria-label="Recent account activity">
      {events.map((e) => (
        <li key={e.id} className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 px-3.5 py-2.5 text-sm">
          <span className="text-ink [overflow-wrap:anywhere]">
            {activityWords(e)}
            {/* the same words and look as the device list above: the sign-in that started this session */}
            {e.thisDevice ? <span className="ml-2 whitespace-nowrap rounded bg-paper-deep px-1.5 py-0.5 text-xs font-medium text-ink-soft">This device</span> : null}
          </span>
          <span className="text-xs text-ink-soft">
            <time dateTime={e.at}>{formatDateTime(e.at)}</time>
            {e.ip ? ` from ${e.ip}` : ""}
          </span>
        </li>
      ))}
    </ol>
  );
}
