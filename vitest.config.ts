import path from "node:path";
import { defineConfig } from "vitest/config";

// Two projects: pure unit tests, and integration tests that open a real
// PGlite database in memory and call route handlers for real.
const alias = {
  "@": import.meta.dirname,
  // `server-only` throws outside a React Server environment; in tests the
  // modules are called directly from Node, which is a server.
  "server-only": path.join(import.meta.dirname, "tests/support/server-only.ts"),
};

export default defineConfig({
  resolve: { alias },
  test: {
    coverage: {
      provider: "v8",
      include: ["lib/tires/**/*.ts"],
      reporter: ["text-summary", "text"],
      thresholds: { lines: 95, branches: 95 },
    },
    projects: [
      {
        resolve: { alias },
        test: { name: "unit", include: ["tests/unit/**/*.test.ts"], environment: "node" },
      },
      {
        resolve: { alias },
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          setupFiles: ["tests/support/integration-setup.ts"],
          testTimeout: 30_000,
          hookTimeout: 60_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
