// Sent with every answer (OWASP ASVS 4.0 §14.4). The pages' Content-Security-Policy carries a per-request
// nonce, so proxy.ts sets it; API answers get a policy that lets nothing load from them.
const everywhere = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "same-origin" },
  {
    key: "Permissions-Policy",
    value: "camera=(), microphone=(), geolocation=(), payment=(), usb=(), browsing-topics=()",
  },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
];

/** @type {import("next").NextConfig} */
const nextConfig = {
  async headers() {
    return [
      { source: "/:path*", headers: everywhere },
      {
        source: "/api/:path*",
        headers: [{ key: "Content-Security-Policy", value: "default-src 'none'; frame-ancestors 'none'" }],
      },
      // `next start` speaks plain HTTP; over HTTPS it sits behind a TLS proxy, which says so in X-Forwarded-Proto.
      // Browsers ignore HSTS received over plain HTTP (RFC 6797 §8.1), so a forged header does no harm.
      {
        source: "/:path*",
        has: [{ type: "header", key: "x-forwarded-proto", value: "https" }],
        headers: [{ key: "Strict-Transport-Security", value: "max-age=31536000; includeSubDomains" }],
      },
    ];
  },
  experimental: {
    // Our forms send a few kB; route handlers cap JSON at 1 MB themselves (lib/http-body.ts).
    serverActions: { bodySizeLimit: "200kb" },
  },
  // Sequelize requires every dialect statically; keep it (and the native sqlite3 addon) out of the bundle.
  // @touch4it/ical-timezones reads its VTIMEZONE files from its own folder at run time, so it stays external too.
  serverExternalPackages: ["sequelize", "sqlite3", "pg", "pg-hstore", "@touch4it/ical-timezones"],
  // Lets tests and parallel builds use their own output folder.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  // The browser-test harness builds with this set: `npm run typecheck` checks types on its own in CI,
  // so a half-written test file elsewhere in the tree does not stop the app from building.
  typescript: { ignoreBuildErrors: process.env.NEXT_SKIP_TYPECHECK === "1" },
};

export default nextConfig;
