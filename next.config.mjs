/** @type {import("next").NextConfig} */
const nextConfig = {
  // Sequelize requires every dialect statically; keep it (and the native sqlite3 addon) out of the bundle.
  serverExternalPackages: ["sequelize", "sqlite3"],
  // Lets tests and parallel builds use their own output folder.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
};

export default nextConfig;
