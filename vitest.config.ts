import path from "node:path";
import { defineConfig } from "vitest/config";

export default defineConfig({
  resolve: {
    alias: {
      "@": path.resolve(import.meta.dirname),
      "server-only": path.resolve(import.meta.dirname, "tests/support/empty.ts"),
    },
  },
  test: {
    // next-auth imports "next/server" without an extension, which Node's ESM resolver refuses;
    // letting Vite process it resolves the import the way Next's bundler does.
    server: { deps: { inline: ["next-auth", "@auth/core"] } },
    include: ["lib/**/*.test.ts", "tests/unit/**/*.test.ts", "tests/integration/**/*.test.ts"],
    globalSetup: ["tests/support/global-setup.ts"],
    setupFiles: ["tests/support/setup.ts"],
    // Cheap password hashing and fixed secrets for tests; the services' addresses come from scripts/test.mjs.
    env: {
      PASSWORD_HASH_COST: "4",
      AUTH_SECRET: process.env.AUTH_SECRET ?? "test-secret-test-secret-test-secret-000",
      APP_URL: process.env.APP_URL ?? "http://localhost:3000",
    },
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
