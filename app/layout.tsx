import type { Metadata, Viewport } from "next";
import type { ReactNode } from "react";
import { sans } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Counterpoise", template: "%s · Counterpoise" },
  description:
    "Reactions at the supports of equipment that fluid flows through: momentum, moment of momentum and pressure forces on a free-body diagram.",
};

// The page follows the operating system's light or dark setting (app/globals.css); saying so before the
// stylesheet loads keeps a dark screen from flashing white, and tints a phone's browser bar to the paper.
export const viewport: Viewport = {
  colorScheme: "light dark",
  themeColor: [
    { media: "(prefers-color-scheme: light)", color: "#f6f3ec" },
    { media: "(prefers-color-scheme: dark)", color: "#1b2025" },
  ],
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={sans.variable}>
      <body className="min-h-screen bg-paper text-ink antialiased">{children}</body>
    </html>
  );
}
