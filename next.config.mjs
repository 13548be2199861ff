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
  // Every answer; pages get these again with a nonce CSP from proxy.ts. API
  // answers (JSON, files, the calendar feed) are never a page that runs
  // script, so they get a CSP that allows nothing, fixed here: proxy.ts skips
  // them (its run was ~0.5 ms of the request thread per API request, see
  // DEVELOPERS.md "Cost of one request"). HSTS comes with every page.
  // tests/unit/security/fixed-headers.test.ts keeps the shared values equal
  // to lib/security-headers.ts.
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
      {
        source: "/api/:path*",
        headers: [
          { key: "Content-Security-Policy", value: "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'" },
          { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
          { key: "Cross-Origin-Resource-Policy", value: "same-origin" },
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
