import type { Metadata } from "next";
import type { ReactNode } from "react";
import { sans } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Counterpoise", template: "%s · Counterpoise" },
  description:
    "Reactions at the supports of equipment that fluid flows through: momentum, moment of momentum and pressure forces on a free-body diagram.",
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={sans.variable}>
      <body className="min-h-screen bg-paper text-ink antialiased">{children}</body>
    </html>
  );
}
