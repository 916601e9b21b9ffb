import type { NextConfig } from "next";
import { securityHeaders } from "./lib/http/security-headers";

const nextConfig: NextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  serverExternalPackages: ["@node-rs/argon2", "sharp", "smtp-server"],
  experimental: { serverActions: { bodySizeLimit: "2mb" }, authInterrupts: true },
  async headers() {
    return [{ source: "/:path*", headers: securityHeaders() }];
  },
};

export default nextConfig;
