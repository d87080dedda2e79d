import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

// Browser flows: Playwright (playwright-core) driving Debian's Chromium against `next start`
// on a fresh SQLite file. Run `npm run build` first; `npm run test:browser` runs these.
export default defineConfig({
  resolve: { alias: { "@": fileURLToPath(new URL("./", import.meta.url)) } },
  test: {
    include: ["tests/browser/**/*.test.ts"],
    globalSetup: ["tests/browser/support/global-setup.ts"],
    testTimeout: 60_000,
    hookTimeout: 120_000,
    fileParallelism: false,
    pool: "forks",
  },
});
