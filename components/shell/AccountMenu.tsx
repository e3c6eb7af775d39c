"use client";
import Link from "next/link";
import { useSignOut } from "@/components/auth/useSignOut";
import { Disclosure } from "./Disclosure";

function initials(name: string): string {
  const parts = name.trim().split(/\s+/);
  return ((parts[0]?.[0] ?? "") + (parts.length > 1 ? parts[parts.length - 1][0] : "")).toUpperCase() || "?";
}

/** The signed-in person: their settings, and signing out. */
export function AccountMenu({ name, email }: { name: string; email: string }) {
  // only a sign-out the server took leaves the page: on a shared machine, "signed out" must be true
  const { busy: leaving, failed, signOut } = useSignOut();
  return (
    <Disclosure
      align="right"
      width="w-64"
      button={
        // the initials are what shows, the words are what is read: the button's name is its own text
        <>
          <span aria-hidden="true" className="flex h-8 w-8 items-center justify-center rounded-full border border-ink/20 bg-paper-deep text-xs font-semibold text-ink">
            {initials(name)}
          </span>
          <span className="sr-only">Account: {name}</span>
        </>
      }
    >
      {(close) => (
        <div>
          <div className="border-b border-rule-soft px-2.5 pb-2 pt-1.5">
            <p className="truncate text-sm font-semibold text-ink">{name}</p>
            <p className="truncate text-xs text-ink-faint">{email}</p>
          </div>
          <Link href="/account" onClick={close} className="mt-1 block rounded-md px-2.5 py-2 text-sm text-ink hover:bg-paper-deep">
            Account settings
          </Link>
          <Link href="/workspaces" onClick={close} className="block rounded-md px-2.5 py-2 text-sm text-ink hover:bg-paper-deep">
            All workspaces
          </Link>
          <button type="button" onClick={() => signOut("/sign-in")} disabled={leaving} className="block w-full rounded-md px-2.5 py-2 text-left text-sm text-accent-deep hover:bg-accent-soft/50">
            {leaving ? "Signing out…" : "Sign out"}
          </button>
          {failed ? (
            <p role="alert" className="px-2.5 pb-1.5 text-xs font-medium text-accent-deep">
              You are still signed in: the sign-out did not reach the server. Try again.
            </p>
          ) : null}
        </div>
      )}
    </Disclosure>
  );
}
