// Browser tests run against a production build started by `npm test` (E2E_BASE_URL), with Debian's
// Chromium: Playwright's own browser downloads are never used.
import { defineConfig } from "@playwright/test";

const PHONE_SPECS = "**/*.phone.spec.ts";

export default defineConfig({
  testDir: "tests/e2e",
  testMatch: "**/*.spec.ts",
  outputDir: "test-results",
  workers: 1,
  retries: 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  forbidOnly: Boolean(process.env.CI),
  reporter: "list",
  use: {
    baseURL: process.env.E2E_BASE_URL ?? "http://127.0.0.1:3000",
    browserName: "chromium",
    trace: "off",
    screenshot: "only-on-failure",
    launchOptions: {
      executablePath: "/usr/bin/chromium",
      args: [
        "--no-sandbox",
        "--disable-gpu",
        "--disable-dev-shm-usage",
        "--disable-quic",
        "--no-first-run",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
      ],
    },
  },
  // `*.phone.spec.ts` runs on the phone, every other spec on the laptop.
  projects: [
    {
      name: "laptop",
      testIgnore: PHONE_SPECS,
      use: { viewport: { width: 1280, height: 800 } },
    },
    {
      name: "phone",
      testMatch: PHONE_SPECS,
      use: { viewport: { width: 375, height: 812 }, isMobile: true, hasTouch: true, deviceScaleFactor: 2 },
    },
  ],
});
