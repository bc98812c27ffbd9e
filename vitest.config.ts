import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

/** Resolution shared by every vitest config: the `@/` alias, and `server-only` as an empty module. */
export const resolve = {
  alias: {
    "@": fileURLToPath(new URL(".", import.meta.url)),
    "server-only": fileURLToPath(new URL("./tests/support/empty.ts", import.meta.url)),
  },
};

/**
 * Unit and reference-value tests: pure code, no database, run in parallel.
 * Integration tests (tests/integration) use vitest.integration.config.ts,
 * browser tests (tests/browser) use vitest.browser.config.ts.
 */
export default defineConfig({
  resolve,
  test: {
    include: ["tests/unit/**/*.test.ts", "tests/reference/**/*.test.ts"],
    environment: "node",
    // fast-check properties run from a fixed seed (SEATWISE_FC_SEED overrides).
    setupFiles: ["tests/support/fast-check.ts"],
    // Some reference tables trace many rays; generous so a loaded CI machine does not time out.
    testTimeout: 30_000,
  },
});
