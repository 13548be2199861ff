/** @type {import('next').NextConfig} */
const nextConfig = {
  // PGlite ships wasm and data files that must stay in node_modules; bundled,
  // a build copies them into the publicly served static folder.
  serverExternalPackages: ["@electric-sql/pglite", "pg"],
  // Separate build folders let an e2e run build beside a dev server.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  experimental: {
    serverActions: { bodySizeLimit: "12mb" },
  },
};

export default nextConfig;
