import localFont from "next/font/local";

// Fonts ship with the app (no network at build): SIL OFL, see LICENSE files beside them.
export const displayFont = localFont({
  src: "./fonts/space-grotesk.woff2",
  variable: "--font-display",
  display: "swap",
});

export const bodyFont = localFont({
  src: "./fonts/ibm-plex-sans.woff2",
  variable: "--font-body",
  display: "swap",
});
