/** @type {import('next').NextConfig} */
const nextConfig = {
  // PGlite ships wasm and data files that must stay in node_modules; bundled,
  // a build copies them into the publicly served static folder.
  serverExternalPackages: ["@electric-sql/pglite", "pg"],
  // Separate build folders let an e2e run build beside a dev server.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  // The driver's pages lived under /garage before the vehicles overview got
  // its own name; old bookmarks, e-mails and calendar links keep working.
  // Build files and other static answers; pages and routes get these and a CSP from proxy.ts.
  async headers() {
    return [
      {
        source: "/:path*",
        headers: [
          { key: "X-Content-Type-Options", value: "nosniff" },
          { key: "X-Frame-Options", value: "DENY" },
          { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
        ],
      },
    ];
  },
  async redirects() {
    return [
      { source: "/garage", destination: "/vehicles", permanent: true },
      { source: "/garage/vehicles/:path*", destination: "/vehicles/:path*", permanent: true },
      { source: "/garage/:path*", destination: "/:path*", permanent: true },
    ];
  },
  // The stripe SDK always calls <host>/v1/…; without a real key it is pointed at
  // this server, whose local fake of the Stripe API lives under /api/fake/stripe.
  async rewrites() {
    return [{ source: "/v1/:path*", destination: "/api/fake/stripe/v1/:path*" }];
  },
  experimental: {
    serverActions: { bodySizeLimit: "12mb" },
  },
};

export default nextConfig;
