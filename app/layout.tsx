import type { Metadata } from "next";
import { connection } from "next/server";
import type { ReactNode } from "react";

import { bodyFont, displayFont } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Craquelure", template: "%s · Craquelure" },
  description:
    "Calibrate, check and hand off an anisotropic damage law for short-fibre composites.",
};

// Every page renders per request: the script nonce of the Content-Security-Policy (proxy.ts) is
// new each time, and a page prerendered at build time would carry none, so its scripts would be blocked.
export default async function RootLayout({ children }: { children: ReactNode }) {
  await connection();
  return (
    <html lang="en" className={`${displayFont.variable} ${bodyFont.variable}`}>
      <body className="min-h-screen">{children}</body>
    </html>
  );
}
