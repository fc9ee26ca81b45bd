import type { NextConfig } from "next";

// Content-Security-Policy without nonces: everything from our own origin. Next's inline
// bootstrap scripts and the theme script in app/layout.tsx need 'unsafe-inline'.
const csp = [
  "default-src 'self'",
  "script-src 'self' 'unsafe-inline'",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' blob: data:",
  "font-src 'self'",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
].join("; ");

const securityHeaders = [
  { key: "Content-Security-Policy", value: csp },
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=()" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
];

const nextConfig: NextConfig = {
  poweredByHeader: false,
  reactStrictMode: true,
  // Knex loads database drivers dynamically and graphile-worker its own SQL files; bundling breaks
  // that, so keep them (and pg, nodemailer, and exceljs with its zip streams) external.
  serverExternalPackages: ["knex", "pg", "graphile-worker", "nodemailer", "exceljs"],
  // Type errors do not stop a build (so `npm start` still serves while a change is half done);
  // `npm test` type-checks the whole project as a suite of its own (tsc --noEmit).
  typescript: { ignoreBuildErrors: true },
  async headers() {
    return [{ source: "/:path*", headers: securityHeaders }];
  },
};

export default nextConfig;
