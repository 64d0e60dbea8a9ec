import type { Metadata } from "next";
import type { ReactNode } from "react";

import { bodyFont, displayFont } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Craquelure", template: "%s · Craquelure" },
  description:
    "Calibrate, check and hand off an anisotropic damage law for short-fibre composites.",
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${displayFont.variable} ${bodyFont.variable}`}>
      <body className="min-h-screen">{children}</body>
    </html>
  );
}
