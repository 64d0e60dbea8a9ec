import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // Test and benchmark runs build into their own folder so they never replace the build that
  // scripts/start.sh is serving from .next (a swapped build 404s the running app's assets).
  distDir: process.env.CRAQUELURE_DIST_DIR || ".next",
  // postgres and nodemailer are Node-only: keep them out of the server bundle graph.
  serverExternalPackages: ["postgres", "nodemailer"],
};

export default nextConfig;
