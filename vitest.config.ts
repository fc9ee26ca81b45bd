import { appendFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

const here = (path: string) => fileURLToPath(new URL(path, import.meta.url));

// Two projects: "unit" needs nothing but Node (test/calc, test/unit); "integration" runs against
// the real PostgreSQL test cluster that `npm test` starts and names in TEST_DATABASE_URL.
export default defineConfig({
  resolve: {
    alias: [
      { find: /^@\//, replacement: `${here("./src")}/` },
      // "server-only" throws outside React Server Components; tests import server code directly.
      { find: /^server-only$/, replacement: here("./test/support/server-only.ts") },
    ],
  },
  test: {
    // An error thrown outside any test (a rejection nobody awaited, a worker that would not stop)
    // fails the run without failing a test; `npm test` names it again in its closing lines from
    // this file (VITEST_UNHANDLED_LOG), where a log cut to its tail still shows it.
    onUnhandledError(error) {
      const log = process.env.VITEST_UNHANDLED_LOG;
      if (!log) return;
      const e = error as Error & { type?: string; VITEST_TEST_PATH?: string; VITEST_TEST_NAME?: string };
      const where = [e.VITEST_TEST_PATH, e.VITEST_TEST_NAME].filter(Boolean).join(" › ") || "no test named";
      appendFileSync(log, `${JSON.stringify({ type: e.type, name: e.name, message: e.message, where, stack: e.stack?.split("\n").slice(0, 8).join("\n") })}\n`);
    },
    pool: "forks",
    maxWorkers: 2, // the machines have 2 cores
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          environment: "node",
          include: ["test/calc/**/*.{test,spec}.ts", "test/unit/**/*.{test,spec}.{ts,tsx}"],
        },
      },
      {
        extends: true,
        test: {
          name: "integration",
          environment: "node",
          include: ["test/server/**/*.{test,spec}.ts"],
          env: {
            DATABASE_URL: process.env.TEST_DATABASE_URL ?? "",
            NEXT_TELEMETRY_DISABLED: "1",
            // A fixed secret for sessions made by the in-process app; valid for tests only.
            AUTH_SECRET: "filmsheet-test-secret-not-for-any-real-site-0123456789",
            // No mail server by default (port 1 refuses at once); e-mail tests start their own sink.
            SMTP_URL: "smtp://127.0.0.1:1?ignoreTLS=true",
            // Suites act as the one proxy in front of the app: the address they put last in
            // X-Forwarded-For is the caller's (the sign-in limits count per address).
            // test/server/sign-in-limit-hardening.test.ts sets 0 to test the direct case.
            TRUSTED_PROXIES: "1",
          },
          globalSetup: [here("./test/support/require-test-database.ts")],
          // Each file boots its own Next server or database: run them one at a time.
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
