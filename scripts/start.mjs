// `npm start`: installs what is missing, starts PostgreSQL, the mail inbox and the Stripe
// stand-in, migrates and seeds, builds and serves the app: one web instance and one job worker,
// or with `--instances N` (or INSTANCES=N) N web instances behind an nginx balancer on PORT.
// Ctrl-C stops all of it.
import { join } from "node:path";
import { DB_USER, ROOT, clusterDir, databaseUrl, ensureBuild, ensureDatabase, ensureNodeModules, ensurePostgres, knex, startCluster, stopCluster } from "./lib/bootstrap.mjs";
import { assertPortFree, step, stopService } from "./lib/proc.mjs";
import { ensureNginx, startBalancer } from "./lib/balancer.mjs";
import { startPgbouncer } from "./lib/pgbouncer.mjs";
import {
  DEFAULT_DEMO_PASSWORD,
  DEMO_ACCOUNTS,
  LOCAL_WEBHOOK_SECRET,
  authSecret,
  instancePorts,
  instancesFromArgs,
  portFromEnv,
  startApp,
  startMaildev,
  startStripeStandIn,
  startWorker,
} from "./lib/services.mjs";

process.env.NEXT_TELEMETRY_DISABLED = "1";
const ports = {
  app: portFromEnv("PORT", 3000),
  pg: portFromEnv("PG_PORT", 54329),
  smtp: portFromEnv("SMTP_PORT", 1025),
  mailWeb: portFromEnv("MAIL_WEB_PORT", 1080),
  stripe: portFromEnv("STRIPE_STAND_IN_PORT", 12111),
};

const instances = instancesFromArgs();
// `--pgbouncer` (or PGBOUNCER=1): the web instances query through PgBouncer in transaction mode.
const pgbouncer = process.argv.includes("--pgbouncer") || process.env.PGBOUNCER === "1";
const pgbouncerPort = portFromEnv("PGBOUNCER_PORT", 54331);
const appPorts = instancePorts(ports.app, instances);

const services = [];
let cluster; // the data folder, when this run started the cluster
let stopping = false;

async function shutdown(code) {
  if (stopping) return;
  stopping = true;
  console.log("\nStopping Filmsheet …");
  for (const s of [...services].reverse()) await stopService(s);
  if (cluster) stopCluster(cluster);
  console.log("Stopped.");
  process.exit(code);
}
process.on("SIGINT", () => shutdown(0));
process.on("SIGTERM", () => shutdown(0));

async function main() {
  ensureNodeModules();
  // Ports first: a second `npm start` must fail here, before it touches the running cluster.
  const appSlots = [[ports.app, instances > 1 ? "balancer" : "app"], ...(instances > 1 ? appPorts.map((p, i) => [p, `app instance ${i + 1}`]) : [])];
  if (pgbouncer) appSlots.push([pgbouncerPort, "PgBouncer; set PGBOUNCER_PORT"]);
  for (const [port, what] of [...appSlots, [ports.smtp, "SMTP"], [ports.mailWeb, "mail web"], [ports.stripe, "Stripe stand-in"]]) {
    await assertPortFree(port, what);
  }

  // An explicit DATABASE_URL (e.g. the PostgreSQL of docker-compose.dev.yml) skips the private cluster.
  let url = process.env.DATABASE_URL;
  if (!url) {
    ensurePostgres();
    const dir = clusterDir("pg");
    // The cluster is this checkout's own: stop it on exit even if a crashed run left it running.
    await startCluster({ dir, port: ports.pg });
    cluster = dir;
    url = databaseUrl(ports.pg, "filmsheet");
  }
  await ensureDatabase(url);
  const dbEnv = { DATABASE_URL: url, DEMO_PASSWORD: process.env.DEMO_PASSWORD ?? DEFAULT_DEMO_PASSWORD };
  step("Migrating the database (knex migrate:latest)");
  knex(["migrate:latest"], dbEnv);
  step("Seeding the demo firm (knex seed:run)");
  knex(["seed:run"], dbEnv);

  ensureBuild();
  if (instances > 1) ensureNginx();

  step(`Starting the mail inbox, the Stripe stand-in, ${instances > 1 ? `${instances} app instances behind nginx` : "the app"} and the job worker`);
  const mail = startMaildev(ports.smtp, ports.mailWeb);
  // The stand-in keeps its state in .data, beside the database whose firms refer to it.
  const stripe = startStripeStandIn(ports.stripe, { appPort: ports.app, stateFile: join(ROOT, ".data", "stripe-stand-in.json") });
  services.push(mail.service, stripe.service);
  await Promise.all([mail.ready(), stripe.ready()]);
  const appEnv = {
    ...dbEnv,
    APP_URL: process.env.APP_URL ?? `http://localhost:${ports.app}`,
    AUTH_SECRET: authSecret(),
    SMTP_URL: `smtp://127.0.0.1:${ports.smtp}?ignoreTLS=true`,
    STRIPE_API_URL: `http://127.0.0.1:${ports.stripe}`,
    STRIPE_WEBHOOK_SECRET: process.env.STRIPE_WEBHOOK_SECRET ?? LOCAL_WEBHOOK_SECRET,
  };
  const webEnv = { ...appEnv, JOBS_WORKER: "off" };
  if (pgbouncer) {
    if (!cluster) throw new Error("--pgbouncer runs in front of the private cluster; with your own DATABASE_URL, run your own pooler and set DATABASE_POOL_URL");
    const bouncer = startPgbouncer({ port: pgbouncerPort, pgPort: ports.pg, dir: clusterDir("pgbouncer") });
    services.push(bouncer.service);
    await bouncer.ready();
    webEnv.DATABASE_POOL_URL = bouncer.url("filmsheet");
  }
  // Web instances only queue jobs; the worker process runs them (report builds, e-mail).
  const apps = appPorts.map((port, i) => startApp(port, webEnv, { name: instances > 1 ? `next ${i + 1}` : "next" }));
  const worker = startWorker(appEnv);
  services.push(...apps.map((a) => a.service), worker.service);
  await Promise.all(apps.map((a) => a.ready()));
  if (instances > 1) {
    const balancer = startBalancer(ports.app, appPorts);
    services.push(balancer.service);
    await balancer.ready();
  }

  const password = dbEnv.DEMO_PASSWORD;
  const width = Math.max(...DEMO_ACCOUNTS.map(([email]) => email.length));
  console.log(`
Filmsheet is running.

  App              http://127.0.0.1:${ports.app}   (or http://localhost:${ports.app})${instances > 1 ? `\n  Instances        ${appPorts.map((p) => `127.0.0.1:${p}`).join(", ")} behind nginx on :${ports.app}` : ""}
  Job worker       a process of its own (npm run worker): report builds and e-mail
  Health           http://127.0.0.1:${ports.app}/api/health
  Mail inbox       http://127.0.0.1:${ports.mailWeb}   (SMTP 127.0.0.1:${ports.smtp})
  Stripe stand-in  http://127.0.0.1:${ports.stripe}   (test Checkout and portal pages; webhooks to the app)
  PostgreSQL       ${url.replace(/:[^:@/]+@/, ":***@")}${process.env.DATABASE_URL ? "" : `  (private cluster, user ${DB_USER})`}${pgbouncer ? `\n  PgBouncer        127.0.0.1:${pgbouncerPort}  (transaction mode; the web instances' queries)` : ""}

Demo sign-in (password: ${password})
${DEMO_ACCOUNTS.map(([email, role]) => `  ${email.padEnd(width)}  ${role}`).join("\n")}

Press Ctrl-C to stop everything.`);

  // If any service dies on its own, take the rest down rather than run half a system.
  const watch = setInterval(() => {
    const dead = services.find((s) => s.exited);
    if (dead && !stopping) {
      clearInterval(watch);
      console.error(`\n${dead.name} exited unexpectedly (${dead.exitCode}).`);
      shutdown(1);
    }
  }, 500);
}

main().catch((err) => {
  console.error(`\nnpm start failed: ${err.message}`);
  shutdown(1);
});
