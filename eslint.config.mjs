import { defineConfig, globalIgnores } from "eslint/config";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

export default defineConfig([
  ...nextVitals,
  ...nextTs,
  globalIgnores([
    ".next*/**", // every build folder: .next, .next-e2e (tests), .next-bench (benchmarks)
    ".data/**",
    ".data-test/**",
    "node_modules/**",
    "drizzle/**",
    "next-env.d.ts",
    "test-results/**",
    "playwright-report/**",
    "public/sw.js",
    "scripts/bench/results/**",
  ]),
  {
    rules: {
      "@typescript-eslint/no-explicit-any": "error",
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
      // Apostrophes in copy are fine; only characters that are JSX-ambiguous need escaping.
      "react/no-unescaped-entities": ["error", { forbid: [">", "}"] }],
      "@typescript-eslint/consistent-type-imports": ["error", { fixStyle: "inline-type-imports" }],
    },
  },
  {
    // The engine stays pure: no database, server, routes or UI.
    files: ["lib/engine/**/*.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        { patterns: ["@/db/*", "@/lib/server/*", "@/app/*", "@/components/*", "pg", "next/*", "drizzle-orm*"] },
      ],
    },
  },
  {
    // Browser code never reaches the data layer directly.
    files: ["components/**/*.{ts,tsx}", "lib/validation/**/*.ts", "lib/client/**/*.ts"],
    rules: {
      "no-restricted-imports": ["error", { patterns: ["@/db/*", "@/db", "@/lib/server/*", "pg", "drizzle-orm*"] }],
    },
  },
]);
