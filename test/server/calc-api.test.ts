// POST /api/calc against the built app, and `npm run --silent calc`: same body, same answer.
// The endpoint needs a session or an API token; these tests use a viewer's token (any role may calculate).
import { spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { calculate } from "../../src/calc/index";
import { startBuiltApp } from "../support/built-app";
import { closeTestDb } from "../support/db";
import { bearer, makeToken } from "../support/tokens";
import { ROOT } from "../support/paths";

let app: Awaited<ReturnType<typeof startBuiltApp>>;
let auth: Record<string, string>;
const post = () => request(app.server).post("/api/calc").set(auth);

beforeAll(async () => {
  app = await startBuiltApp();
  auth = bearer(await makeToken("tarnbrook-sill", "viewer"));
});
afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

// The published reference cases make a realistic body of every kind, good and bad.
const ref = JSON.parse(readFileSync(join(ROOT, "../shared/reference/public-cases.json"), "utf8")) as {
  cases: { id: string; request: Record<string, unknown> }[];
};
const body = { cases: ref.cases.map((c) => ({ id: c.id, ...c.request })) };

// What `npm run calc` runs: the launcher, which builds the bundle (.build/calc) when stale.
function cli(input: string) {
  const r = spawnSync(process.execPath, [join(ROOT, "scripts/run-calc.mjs")], { cwd: ROOT, input, encoding: "utf8", maxBuffer: 64 * 1024 * 1024 });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

describe("POST /api/calc", () => {
  test("401 without a session or an API token", async () => {
    const res = await request(app.server).post("/api/calc").send(body);
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe("unauthenticated");
  });

  test("answers every case in order, per-case errors included, as the engine does", async () => {
    const res = await post().send(body);
    expect(res.status).toBe(200);
    expect(res.body.results).toHaveLength(body.cases.length);
    expect(res.body).toEqual(JSON.parse(JSON.stringify(calculate(body))));
    const bad = res.body.results.find((r: { id: string }) => r.id === "ERR-unknown-kind");
    expect(bad).toMatchObject({ ok: false, error: { code: "invalid_input", field: "kind" } });
  });

  test("gives the same bytes as npm run --silent calc", async () => {
    const res = await post().send(body);
    const out = cli(JSON.stringify(body));
    expect(out.status, out.stderr).toBe(0);
    expect(out.stdout.trim()).toBe(res.text.trim());
  });

  test.each([
    ["not JSON", "{cases: nope", "Body is not valid JSON"],
    ["no cases array", JSON.stringify({ case: [] }), "Invalid body"],
    ["cases not an array", JSON.stringify({ cases: { kind: "radiation" } }), "Invalid body"],
    ["an array body", JSON.stringify([{ kind: "radiation" }]), "Invalid body"],
  ])("400 for a body that is not of the contract's shape: %s", async (_label, text, message) => {
    const res = await post().set("content-type", "application/json").send(text);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("bad_request");
    expect(res.body.error.message).toBe(message);
    const out = cli(text);
    expect(out.status).toBe(2);
    expect(JSON.parse(out.stdout).error.message).toBe(message);
  });

  test("413 over 10,000 cases; exactly 10,000 is accepted", async () => {
    const one = { kind: "radiation", T_surface_C: 10, T_surround_C: 0, emissivity: 0.9 };
    const over = await post().send({ cases: Array(10_001).fill(one) });
    expect(over.status).toBe(413);
    expect(over.body.error.code).toBe("payload_too_large");
    const at = await post().send({ cases: Array(10_000).fill(one) });
    expect(at.status).toBe(200);
    expect(at.body.results).toHaveLength(10_000);
  });

  test("413 over 5 MiB, whatever the number of cases", async () => {
    const big = { cases: [{ kind: "radiation", T_surface_C: 10, T_surround_C: 0, emissivity: 0.9, note: "x".repeat(5.5 * 1024 * 1024) }] };
    const res = await post().send(big);
    expect(res.status).toBe(413);
  });

  test("the command line takes any size", () => {
    const one = { kind: "dew_point", T_C: 20, RH_pct: 50 };
    const out = cli(JSON.stringify({ cases: Array(10_050).fill(one) }));
    expect(out.status, out.stderr).toBe(0);
    expect(JSON.parse(out.stdout).results).toHaveLength(10_050);
  });
});
