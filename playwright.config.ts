import { defineConfig } from "@playwright/test";

// End-to-end tests in Debian's Chromium (/usr/bin/chromium), never a downloaded browser.
// `npm test` starts the app and passes its address in E2E_BASE_URL.
export const CHROMIUM_ARGS = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export default defineConfig({
  testDir: "test/e2e",
  outputDir: ".data/test-results/e2e",
  workers: 1,
  retries: 0,
  timeout: 30_000,
  forbidOnly: true,
  reporter: [["list"], ["json", { outputFile: process.env.E2E_JSON_REPORT ?? ".data/reports/e2e.json" }]],
  use: {
    baseURL: process.env.E2E_BASE_URL ?? "http://localhost:3100",
    browserName: "chromium",
    launchOptions: { executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: CHROMIUM_ARGS },
    trace: "retain-on-failure",
  },
});
