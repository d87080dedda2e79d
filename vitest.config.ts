import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

export default defineConfig({
  resolve: {
    alias: {
      "@": fileURLToPath(new URL("./", import.meta.url)),
      // `server-only` throws outside a React Server Components bundle; tests run server code directly.
      "server-only": fileURLToPath(new URL("./tests/support/server-only.ts", import.meta.url)),
    },
  },
  test: {
    include: ["tests/**/*.test.ts", "tests/**/*.test.tsx"],
    exclude: ["tests/browser/**", "node_modules/**"],
    environment: "node",
    testTimeout: 20_000,
    hookTimeout: 60_000,
    pool: "forks",
    // next-auth imports "next/server" without an extension, which Node's own ESM loader cannot
    // resolve; bundling it through Vite lets tests load lib/auth for real.
    server: { deps: { inline: ["next-auth"] } },
  },
});
