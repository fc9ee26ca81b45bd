// `npm test`: the same bootstrap as `npm start` against a separate, throw-away test cluster, then
// every suite — type check, unit and integration (Vitest), end-to-end (Playwright in Debian's
// Chromium).
// The last line is always `N passed, N failed`, totalled from the runners' JSON reports.
import { mkdirSync, rmSync } from "node:fs";
import { join } from "node:path";
import {
  CHROMIUM,
  ROOT,
  baseEnv,
  clusterDir,
  databaseUrl,
  ensureBuild,
  ensureChromium,
  ensureDatabase,
  ensureNodeModules,
  ensurePostgres,
  knex,
  startCluster,
  stopCluster,
} from "./lib/bootstrap.mjs";
import { startMailSink } from "./lib/mail-sink.mjs";
import { assertPortFree, runAsync, step, stopService } from "./lib/proc.mjs";
import { closingLine, countPlaywright, countVitest, readSuite, total, unhandledErrors } from "./lib/reports.mjs";
import { ensureNginx } from "./lib/balancer.mjs";
import { ensurePgbouncer } from "./lib/pgbouncer.mjs";
import { DEFAULT_DEMO_PASSWORD, LOCAL_WEBHOOK_SECRET, authSecret, portFromEnv, startApp, startStripeStandIn, startWorker } from "./lib/services.mjs";

process.env.NEXT_TELEMETRY_DISABLED = "1";
const ports = {
  pg: portFromEnv("TEST_PG_PORT", 54339),
  app: portFromEnv("TEST_APP_PORT", 3100),
  stripe: portFromEnv("TEST_STRIPE_STAND_IN_PORT", 12112),
};
const REPORTS = join(ROOT, ".data", "reports");
const services = [];
let cluster;
let finished = false;

let mailSink;

async function cleanUp() {
  for (const s of [...services].reverse()) await stopService(s);
  await mailSink?.stop();
  mailSink = undefined;
  services.length = 0;
  if (cluster) stopCluster(cluster);
  cluster = undefined;
}

async function finish(counts, notes = []) {
  if (finished) return;
  finished = true;
  await cleanUp();
  for (const note of notes) console.log(`note: ${note}`);
  console.log(`\n${closingLine(counts)}`);
  process.exit(counts.failed > 0 ? 1 : 0);
}

process.on("SIGINT", () => finish({ passed: 0, failed: 1 }, ["interrupted"]));
process.on("SIGTERM", () => finish({ passed: 0, failed: 1 }, ["terminated"]));

async function bootstrap() {
  ensureNodeModules();
  ensureChromium();
  // The two-instance integration tests put nginx in front of the app, as in production, and one
  // puts PgBouncer between the app and PostgreSQL.
  ensureNginx();
  ensurePgbouncer();
  await assertPortFree(ports.app, "test app");
  await assertPortFree(ports.stripe, "test Stripe stand-in");
  let url = process.env.TEST_DATABASE_URL;
  if (!url) {
    ensurePostgres();
    const dir = clusterDir("pg-test");
    await startCluster({ dir, port: ports.pg, forTests: true });
    cluster = dir;
    url = databaseUrl(ports.pg, "filmsheet_test");
  }
  step("Creating a fresh test database, migrating and seeding");
  await ensureDatabase(url, { fresh: true });
  const dbEnv = { DATABASE_URL: url, DEMO_PASSWORD: process.env.DEMO_PASSWORD ?? DEFAULT_DEMO_PASSWORD, NODE_ENV: "test" };
  knex(["migrate:latest"], dbEnv);
  knex(["seed:run"], dbEnv);
  ensureBuild();
  return { url, dbEnv };
}

async function runVitest(url) {
  step("Unit and integration tests (Vitest)");
  const report = join(REPORTS, "vitest.json");
  const unhandled = join(REPORTS, "vitest-unhandled.jsonl");
  const code = await runAsync(
    join(ROOT, "node_modules/.bin/vitest"),
    ["run", "--reporter=default", "--reporter=json", `--outputFile.json=${report}`],
    { cwd: ROOT, env: baseEnv({ TEST_DATABASE_URL: url, DATABASE_URL: "", VITEST_UNHANDLED_LOG: unhandled }) },
  );
  const counts = readSuite(report, countVitest, code);
  const errors = unhandledErrors(unhandled);
  for (const e of errors?.stacks ?? []) console.error(`\n${e}`);
  return errors ? { ...counts, note: [counts.note, errors.summary].filter(Boolean).join("; ") } : counts;
}

/** The whole project through the TypeScript compiler, counted as one test. */
async function runTypecheck() {
  step("Type check (tsc --noEmit)");
  const code = await runAsync(join(ROOT, "node_modules/.bin/tsc"), ["--noEmit", "-p", ROOT], { cwd: ROOT, env: baseEnv() });
  if (code === 0) console.log("No type errors.");
  return code === 0 ? { passed: 1, failed: 0 } : { passed: 0, failed: 1, note: "type errors above" };
}

async function runPlaywright(dbEnv) {
  step("End-to-end tests (Playwright, Debian Chromium)");
  const report = join(REPORTS, "e2e.json");
  const stripe = startStripeStandIn(ports.stripe, { appPort: ports.app });
  services.push(stripe.service);
  await stripe.ready();
  // The app's e-mail goes to a sink that writes each message into a folder the browser tests read.
  mailSink = await startMailSink(join(ROOT, ".data", "e2e-mail"));
  const appEnv = {
    ...dbEnv,
    NODE_ENV: "production",
    APP_URL: `http://localhost:${ports.app}`,
    SMTP_URL: `smtp://127.0.0.1:${mailSink.port}?ignoreTLS=true`,
    AUTH_SECRET: authSecret(),
    STRIPE_API_URL: `http://127.0.0.1:${ports.stripe}`,
    STRIPE_WEBHOOK_SECRET: LOCAL_WEBHOOK_SECRET,
  };
  // As `npm start` runs it: a web instance that only queues jobs, and a worker process that sends.
  const app = startApp(ports.app, { ...appEnv, JOBS_WORKER: "off" });
  const worker = startWorker(appEnv);
  services.push(app.service, worker.service);
  await app.ready();
  const code = await runAsync(join(ROOT, "node_modules/.bin/playwright"), ["test", "--config", join(ROOT, "playwright.config.ts")], {
    cwd: ROOT,
    // The database URL lets a browser test put the demo firm back on the free plan before it starts.
    env: baseEnv({ E2E_BASE_URL: `http://localhost:${ports.app}`, E2E_JSON_REPORT: report, CHROMIUM_PATH: CHROMIUM, E2E_DATABASE_URL: dbEnv.DATABASE_URL, E2E_MAIL_DIR: mailSink.dir }),
  });
  return readSuite(report, countPlaywright, code);
}

async function main() {
  const t0 = Date.now();
  rmSync(REPORTS, { recursive: true, force: true });
  mkdirSync(REPORTS, { recursive: true });
  let boot;
  try {
    boot = await bootstrap();
  } catch (err) {
    console.error(`\nTest bootstrap failed: ${err.message}`);
    return finish({ passed: 0, failed: 1 }, ["bootstrap failed: no suite ran"]);
  }
  const suites = [];
  suites.push({ name: "typecheck", ...(await runTypecheck()) });
  suites.push({ name: "vitest", ...(await runVitest(boot.url)) });
  try {
    suites.push({ name: "e2e", ...(await runPlaywright(boot.dbEnv)) });
  } catch (err) {
    suites.push({ name: "e2e", passed: 0, failed: 1, note: `could not start the app for e2e: ${err.message}` });
  }
  const notes = suites.map((s) => `${s.name}: ${s.passed} passed, ${s.failed} failed${s.note ? ` (${s.note})` : ""}`);
  notes.push(`npm test took ${((Date.now() - t0) / 1000).toFixed(1)} s`);
  return finish(total(suites), notes);
}

main().catch((err) => {
  console.error(err);
  finish({ passed: 0, failed: 1 }, [`unexpected error: ${err.message}`]);
});
