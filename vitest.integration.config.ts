import { defineConfig } from "vitest/config";
import { resolve } from "./vitest.config";

/**
 * Integration tests: route handlers and lib modules against the real MariaDB named by
 * DATABASE_URL (scripts/test.mjs creates a fresh `seatwise_test`). One file at a time, since
 * the files share the database.
 */
export default defineConfig({
  resolve,
  test: {
    include: ["tests/integration/**/*.test.ts"],
    environment: "node",
    fileParallelism: false,
    testTimeout: 30_000,
    hookTimeout: 30_000,
  },
});
