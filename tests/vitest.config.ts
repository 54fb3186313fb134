import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL("..", import.meta.url));

// Two projects: "unit" needs nothing running; "integration" needs the throwaway
// PostgreSQL (and mail/file stand-ins) that tests/run.ts starts and passes in env.
export default defineConfig({
  root,
  resolve: {
    tsconfigPaths: true,
    // Server-only modules (app/_lib/services) run in-process here, as Next runs them on the server.
    alias: { "server-only": fileURLToPath(new URL("../node_modules/server-only/empty.js", import.meta.url)) },
  },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          include: ["tests/engine/**/*.test.ts", "tests/unit/**/*.test.{ts,tsx}"],
          environment: "node",
        },
      },
      {
        extends: true,
        test: {
          name: "integration",
          include: ["tests/app/**/*.test.ts", "tests/db/**/*.test.ts"],
          environment: "node",
          setupFiles: ["tests/support/next-context.ts"],
          // One database for the whole run: files run one after another.
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: "e2e",
          // Browser tests against the production build that tests/run.ts serves at BASE_URL.
          include: ["tests/e2e/**/*.test.ts"],
          environment: "node",
          fileParallelism: false,
          // A whole journey (many pages at two widths) on a shared 2-core machine under heavy load
          // took over 90 s; the budget only matters when a test is slow, never when it is right.
          testTimeout: 240_000,
          hookTimeout: 90_000,
        },
      },
    ],
  },
});
