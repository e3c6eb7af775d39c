"use client";
import Link from "next/link";
import type { ReactNode } from "react";
import { Button, Notice } from "@/components/shell/controls";
import { useSignOut } from "./useSignOut";

const link = "font-semibold text-ink underline decoration-rule underline-offset-2 hover:text-ink-soft";

/**
 * A signed-out page (reset, confirmation, sign-in with another address) opened by someone who is
 * signed in: says as whom, what this page means for them (`children`), and offers their workspaces,
 * their settings, and (with `signOut`) signing out to use another account: `to` is the page to open
 * once signed out (this one again when left out). Only a sign-out the server took leaves the page.
 */
export function SignedInNote({ email, children, signOut: offer }: { email: string; children?: ReactNode; signOut?: { label: string; to?: string } }) {
  const { busy, failed, signOut } = useSignOut();
  return (
    <div className="space-y-3">
      <Notice tone="info" title="You are signed in">
        <span className="block [overflow-wrap:anywhere]">
          As <strong>{email}</strong>.{children ? <> {children}</> : null}
        </span>
        <span className="mt-2 flex flex-wrap gap-x-4 gap-y-1">
          <Link href="/workspaces" className={link}>
            Your workspaces
          </Link>
          <Link href="/account" className={link}>
            Account settings
          </Link>
        </span>
      </Notice>
      {failed ? <Notice tone="error">You are still signed in: the sign-out did not reach the server. Try again.</Notice> : null}
      {offer ? (
        <Button tone="secondary" onClick={() => signOut(offer.to)} busy={busy} className="w-full">
          <span className="min-w-0 whitespace-normal text-center [overflow-wrap:anywhere]">{offer.label}</span>
        </Button>
      ) : null}
    </div>
  );
}

/**
 * Signed in, on a sign-in or sign-up link that names another address: whose session this is, signing
 * out to `action` ("sign in") with that address (`signOutTo`), or carrying on as the signed-in person
 * (`name`: the address is in the note above, and a long one would break across the button).
 */
export function OtherAddressNote({ signedInAs, name, email, action, signOutTo, carryOnTo }: { signedInAs: string; name: string; email: string; action: string; signOutTo: string; carryOnTo: string }) {
  return (
    <div className="space-y-4">
      <SignedInNote email={signedInAs} signOut={{ label: `Sign out to ${action} as ${email}`, to: signOutTo }}>
        This link is for <strong>{email}</strong>.
      </SignedInNote>
      <Link href={carryOnTo} className="inline-flex w-full justify-center rounded-md bg-ink px-4 py-2 text-center text-sm font-medium text-paper [overflow-wrap:anywhere] hover:bg-ink-soft">
        Carry on as {name}
      </Link>
    </div>
  );
}
