"use client";
import { useRouter } from "next/navigation";
import { startTransition } from "react";
import { Button } from "./controls";

/** "Try again" on a page whose server work failed: fetch the page again from the server, then draw
 *  it (a reset alone would draw the same failed answer). */
export function RetryButton({ reset }: { reset: () => void }) {
  const router = useRouter();
  return (
    <Button
      onClick={() =>
        startTransition(() => {
          router.refresh();
          reset();
        })
      }
    >
      Try again
    </Button>
  );
}
