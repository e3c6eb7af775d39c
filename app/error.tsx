"use client";
import { AuthFrame } from "@/components/auth/AuthFrame";
import { PageFailed } from "@/components/auth/PageFailed";

/**
 * Any page whose server work failed and that has no error page of its own nearer to it (the
 * workspace list, the mailbox, a workspace's frame): the product's frame with the cautions, the
 * reason in words and a retry, never the framework's bare page.
 */
export default function PageError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <AuthFrame>
      <PageFailed reset={reset} digest={error.digest} />
    </AuthFrame>
  );
}
