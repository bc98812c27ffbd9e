import { defineConfig } from "vitest/config";
import { resolve } from "./vitest.config";

/** Browser tests: Debian's Chromium through playwright-core against the app at BASE_URL. */
export default defineConfig({
  resolve,
  test: {
    include: ["tests/browser/**/*.test.ts"],
    environment: "node",
    fileParallelism: false,
    testTimeout: 90_000,
    hookTimeout: 60_000,
    // Vite's own BASE_URL ("/") would otherwise replace the app's address in the workers' env.
    env: { BASE_URL: process.env.BASE_URL ?? "http://127.0.0.1:3100" },
  },
});
