"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { authClient } from "@/lib/auth-client";

/**
 * Signing out from a button: `busy` while the server answers, `failed` when it did not take it (then
 * the page stays: on a shared machine, "signed out" must be true). Taken, it opens `to` (or reloads
 * this page's server parts when left out).
 */
export function useSignOut() {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [failed, setFailed] = useState(false);
  async function signOut(to?: string) {
    setBusy(true);
    setFailed(false);
    const out = await authClient.signOut().catch(() => ({ error: true }));
    if (out?.error) {
      setBusy(false);
      setFailed(true);
      return;
    }
    if (to) router.push(to);
    router.refresh();
  }
  return { busy, failed, signOut };
}
