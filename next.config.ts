import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // postgres and nodemailer are Node-only: keep them out of the server bundle graph.
  serverExternalPackages: ["postgres", "nodemailer"],
};

export default nextConfig;
