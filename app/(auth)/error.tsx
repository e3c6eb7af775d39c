"use client";
import { PageFailed } from "@/components/auth/PageFailed";

/** Sign-in, sign-up, confirmation, reset and invitation pages that failed on the server: in the signed-out frame. */
export default function AuthPageError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return <PageFailed reset={reset} digest={error.digest} />;
}
