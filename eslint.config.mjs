import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";
import drizzle from "eslint-plugin-drizzle";

const lazyPaths = [
  { name: "@hookform/resolvers/zod", message: "Use lazyZodResolver from @/lib/forms/lazy-zod-resolver (loads zod on the first check)." },
  { name: "zod", allowTypeImports: true, message: "Only types from zod in components; schemas load through lazyZodResolver." },
  { name: "sonner", importNames: ["toast"], allowTypeImports: true, message: "Raise toasts through @/components/ui/toast (the library loads with the toast area)." },
];

const config = [
  ...nextVitals,
  ...nextTs,
  {
    ignores: [".next/**", ".next-*/**", "node_modules/**", "coverage/**", "db/migrations/**", "next-env.d.ts", "test-results/**", "playwright-report/**", "tests/e2e/artifacts/**", "tests/e2e/.data-*/**"],
  },
  {
    plugins: { drizzle },
    rules: {
      "drizzle/enforce-delete-with-where": ["error", { drizzleObjectName: ["db", "tx"] }],
      "drizzle/enforce-update-with-where": ["error", { drizzleObjectName: ["db", "tx"] }],
      "@typescript-eslint/consistent-type-imports": ["error", { fixStyle: "inline-type-imports" }],
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
    },
  },
  // Forms check with zod through lib/forms/lazy-zod-resolver.ts, which loads the
  // resolver and the schema on the first check: imported directly, they put
  // zod on the page's first load (DEVELOPERS.md, "Page weight"). Likewise toasts.
  {
    files: ["components/**/*.{ts,tsx}", "app/**/*.tsx"],
    rules: { "no-restricted-imports": ["error", { paths: lazyPaths }] },
  },
];

export default config;
