"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button, Notice } from "@/components/shell/controls";
import { formatDateTime } from "@/components/workspaces/format";
import { authClient } from "@/lib/auth-client";
import type { DeviceSession } from "@/lib/account-sessions";
import { deviceWords } from "./deviceWords";
import { authErrorMessage } from "./messages";

type Status = { tone: "success" | "error"; text: string } | null;

/**
 * Where the account is signed in: this device first, then the others. Signing out every other
 * device keeps this one; signing out everywhere ends this one too and opens the sign-in.
 */
export function DevicesPanel({ sessions }: { sessions: DeviceSession[] }) {
  const router = useRouter();
  const [busy, setBusy] = useState<"others" | "all" | null>(null);
  const [status, setStatus] = useState<Status>(null);
  const others = sessions.filter((s) => !s.current).length;

  async function signOut(which: "others" | "all") {
    setBusy(which);
    setStatus(null);
    const { error } = await (which === "others" ? authClient.revokeOtherSessions() : authClient.revokeSessions()).catch(() => ({ error: { status: 0, message: "The server did not answer. Nothing was changed: try again." } }));
    if (error) {
      setBusy(null);
      setStatus({ tone: "error", text: `${which === "others" ? "The other devices are still signed in" : "You are still signed in"}: ${authErrorMessage(error)}` });
      return;
    }
    if (which === "all") {
      router.push("/sign-in");
      router.refresh();
      return;
    }
    setBusy(null);
    setStatus({ tone: "success", text: others === 1 ? "The other device was signed out." : `The ${others} other devices were signed out.` });
    router.refresh();
  }

  return (
    <div className="space-y-4">
      {status ? <Notice tone={status.tone}>{status.text}</Notice> : null}
      <ul className="divide-y divide-rule-soft rounded-md border border-rule" aria-label="Signed-in devices">
        {sessions.map((s) => (
          <li key={s.id} className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 px-3.5 py-2.5 text-sm">
            <span className="font-medium text-ink">
              {deviceWords(s.userAgent)}
              {s.current ? <span className="ml-2 rounded bg-paper-deep px-1.5 py-0.5 text-xs font-medium text-ink-soft">This device</span> : null}
            </span>
            <span className="text-xs text-ink-soft">
              Signed in {formatDateTime(s.signedInAt)}
              {s.ipAddress ? ` from ${s.ipAddress}` : ""}
              {s.lastSeenAt !== s.signedInAt ? ` · last active ${formatDateTime(s.lastSeenAt)}` : ""}
            </span>
          </li>
        ))}
      </ul>
      <div className="flex flex-wrap gap-3">
        <Button tone="secondary" onClick={() => signOut("others")} busy={busy === "others"} disabled={others === 0 || busy === "all"}>
          Sign out every other device
        </Button>
        <Button tone="secondary" onClick={() => signOut("all")} busy={busy === "all"} disabled={busy === "others"}>
          Sign out everywhere, this device too
        </Button>
      </div>
      {others === 0 ? <p className="text-xs text-ink-soft">No other device is signed in to your account.</p> : null}
    </div>
  );
}
