"use client";
import { AuthFrame } from "@/components/auth/AuthFrame";
import { PageFailed } from "@/components/auth/PageFailed";

/** Account settings that failed on the server: the product's frame (with the cautions) and a retry. */
export default function AccountError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <AuthFrame>
      <PageFailed reset={reset} digest={error.digest} />
    </AuthFrame>
  );
}
