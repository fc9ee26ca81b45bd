import type { NextConfig } from "next";

// The Content-Security-Policy of pages, with a fresh nonce per request, comes from proxy.ts;
// the API's fixed one is below.
const securityHeaders = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=()" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
  // HSTS on every answer of the production build. Browsers heed it only over https (RFC 6797
  // §8.1), so the local production build on http://localhost is unaffected, and a site reached
  // over https once is never reached over plain http again for two years.
  ...(process.env.NODE_ENV === "production" ? [{ key: "Strict-Transport-Security", value: "max-age=63072000; includeSubDomains" }] : []),
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
    return [
      { source: "/:path*", headers: securityHeaders },
      // The API serves data, never a page: nothing in its answers may run or load anything.
      { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'self'" }] },
    ];
  },
};

export default nextConfig;
