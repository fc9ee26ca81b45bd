// The settings of the scaled-out arrangement: the pooler URL in the app's environment, the
// instance count and ports of `npm start`, and the balancer's configuration.
import { describe, expect, test } from "vitest";
import { parseEnv, queryDatabaseUrl } from "@/server/env";
import { nginxConfig } from "../../scripts/lib/balancer.mjs";
import { instancePorts, instancesFromArgs } from "../../scripts/lib/services.mjs";

const DB = "postgres://u:p@127.0.0.1:5432/app";

describe("DATABASE_POOL_URL", () => {
  test("the app's queries go to the pooler when it is set, else to the database", () => {
    expect(queryDatabaseUrl(parseEnv({ DATABASE_URL: DB }))).toBe(DB);
    expect(queryDatabaseUrl(parseEnv({ DATABASE_URL: DB, DATABASE_POOL_URL: "" }))).toBe(DB);
    expect(queryDatabaseUrl(parseEnv({ DATABASE_URL: DB, DATABASE_POOL_URL: "postgres://u:p@127.0.0.1:6432/app" }))).toBe("postgres://u:p@127.0.0.1:6432/app");
  });

  test("a value that is not a postgres:// URL is refused, naming the variable", () => {
    expect(() => parseEnv({ DATABASE_URL: DB, DATABASE_POOL_URL: "mysql://x" })).toThrow(/DATABASE_POOL_URL/);
  });
});

describe("npm start --instances", () => {
  test("read from the command line, then INSTANCES, else 1", () => {
    expect(instancesFromArgs(["--instances", "3"])).toBe(3);
    expect(instancesFromArgs(["--instances=2"])).toBe(2);
    expect(instancesFromArgs([])).toBe(Number(process.env.INSTANCES || 1));
    expect(() => instancesFromArgs(["--instances", "0"])).toThrow(/1 to 16/);
    expect(() => instancesFromArgs(["--instances", "two"])).toThrow(/whole number/);
  });

  test("one instance takes the port itself; more sit behind the balancer on the ports after it", () => {
    expect(instancePorts(3000, 1)).toEqual([3000]);
    expect(instancePorts(3000, 3)).toEqual([3001, 3002, 3003]);
  });
});

describe("the nginx configuration", () => {
  const conf = nginxConfig({ port: 3000, upstreams: [3001, 3002], dir: "/tmp/x" });

  test("listens on loopback and balances over every instance", () => {
    expect(conf).toContain("listen 127.0.0.1:3000;");
    expect(conf).toContain("server 127.0.0.1:3001");
    expect(conf).toContain("server 127.0.0.1:3002");
  });

  test("appends to X-Forwarded-For (the sign-in limit reads the last hop) and never resends a write", () => {
    expect(conf).toContain("X-Forwarded-For $proxy_add_x_forwarded_for");
    expect(conf).not.toContain("non_idempotent");
    // Below Node's 5 s keep-alive, so nginx never reuses a connection the app is closing.
    expect(conf).toMatch(/keepalive_timeout [1-4]s;/);
  });
});
