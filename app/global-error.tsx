"use client";
import { AuthFrame } from "@/components/auth/AuthFrame";
import { PageFailed } from "@/components/auth/PageFailed";
import { sans } from "./fonts";
import "./globals.css";

/** The root layout itself failed: this page stands in for it, so it brings its own html, font and styles. */
export default function GlobalError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <html lang="en" className={sans.variable}>
      <body className="min-h-screen bg-paper text-ink antialiased">
        <AuthFrame>
          <PageFailed reset={reset} digest={error.digest} />
        </AuthFrame>
      </body>
    </html>
  );
}
