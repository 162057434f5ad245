import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

const alias = { "~": fileURLToPath(new URL("./app", import.meta.url)) };

// Two projects: pure unit tests run anywhere; integration tests get a real PostgreSQL
// database from the global setup (started by scripts/test.ts).
export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      { resolve: { alias }, test: { name: "unit", include: ["tests/unit/**/*.test.ts"] } },
      {
        resolve: { alias },
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          globalSetup: ["tests/setup/global-db.ts"],
          fileParallelism: false,
          testTimeout: 30000,
          hookTimeout: 60000,
        },
      },
      {
        // The production server on a throwaway PostgreSQL of its own: two instances, a database
        // outage. Needs the production build: scripts/test.ts runs it after building.
        resolve: { alias },
        test: { name: "production", include: ["tests/production/**/*.test.ts"], fileParallelism: false, testTimeout: 60000, hookTimeout: 120000 },
      },
      {
        // Browser tests: started by scripts/test.ts against the production build (E2E_BASE_URL).
        resolve: { alias },
        test: { name: "e2e", include: ["tests/e2e/**/*.test.ts"], fileParallelism: false, testTimeout: 90000, hookTimeout: 60000 },
      },
    ],
  },
});
