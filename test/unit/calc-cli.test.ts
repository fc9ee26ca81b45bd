// The compiled command-line calculator (.build/calc/calc.mjs, built by scripts/lib/calc-bundle.mjs)
// spawned as a child process: the same answer as calculate() through the shared writer, the
// endpoint's error bodies with exit code 2, and never a NaN or Infinity on stdout.
import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { calculate } from "../../src/calc/index";
import { ANSWER_BATCH, calcAnswerText } from "../../src/calc/serialize";
import { ZCalcBody, calcBodyError } from "../../src/schemas/calc";
import { CALC_BUNDLE, bundleIsStale, ensureBundle } from "../../scripts/lib/calc-bundle.mjs";
import { ROOT } from "../support/paths";
import { splitCases } from "../../scripts/lib/calc-split";

beforeAll(async () => {
  await ensureBundle();
}, 120_000);

function run(file: string, input: string, env: Record<string, string> = {}) {
  const r = spawnSync(process.execPath, [file], { cwd: ROOT, input, encoding: "utf8", env: { ...process.env, ...env }, maxBuffer: 64 * 1024 * 1024 });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}
const cli = (input: string, env?: Record<string, string>) => run(CALC_BUNDLE, input, env);

const ref = JSON.parse(readFileSync(join(ROOT, "../shared/reference/public-cases.json"), "utf8")) as {
  cases: { id: string; request: Record<string, unknown> }[];
};
const publicCases = ref.cases.map((c) => ({ id: c.id, ...c.request }));

// Each test starts Node at least once; a loaded 2-core machine needs more than vitest's 5 s.
describe("npm run calc (the bundle)", { timeout: 60_000 }, () => {
  test("answers the public cases exactly as calculate() and the shared writer, plus a newline", () => {
    const body = { cases: publicCases };
    const out = cli(JSON.stringify(body));
    expect(out.status, out.stderr).toBe(0);
    expect(out.stdout).toBe(calcAnswerText(body.cases) + "\n");
    expect(out.stdout).toBe(JSON.stringify(calculate(body)) + "\n");
  });

  test("answers a body of several batches in order, bad cases in place", () => {
    const cases = Array.from({ length: 2 * ANSWER_BATCH + 5 }, (_, i) => ({ ...publicCases[i % publicCases.length], id: `c${i}` }));
    const out = cli(JSON.stringify({ cases }));
    expect(out.status, out.stderr).toBe(0);
    const answer = JSON.parse(out.stdout) as { results: { id: string }[] };
    expect(answer.results.map((r) => r.id)).toEqual(cases.map((c) => c.id));
    expect(out.stdout).toBe(JSON.stringify(calculate({ cases })) + "\n");
  });

  test("text outside ASCII (ids, a bad kind) comes back as the same UTF-8", () => {
    const cases = [
      { id: "Façade N° 3 — 北", kind: "dew_point", T_C: 20, RH_pct: 50 },
      { id: "ü", kind: "größe" },
    ];
    const out = cli(JSON.stringify({ cases }));
    expect(out.status, out.stderr).toBe(0);
    expect(out.stdout).toBe(JSON.stringify(calculate({ cases })) + "\n");
  });

  test("the launcher npm run calc uses gives the same answer", () => {
    const input = JSON.stringify({ cases: publicCases.slice(0, 5) });
    const out = run(join(ROOT, "scripts/run-calc.mjs"), input);
    expect(out.status, out.stderr).toBe(0);
    expect(out.stdout).toBe(cli(input).stdout);
  });

  test("invalid JSON: the endpoint's error body and exit code 2", () => {
    const out = cli("{cases: nope");
    expect(out.status).toBe(2);
    expect(JSON.parse(out.stdout)).toEqual({ error: { code: "bad_request", message: "Body is not valid JSON" } });
  });

  test.each([
    ["no cases array", { case: [] }],
    ["cases not an array", { cases: { kind: "radiation" } }],
    ["an array body", [{ kind: "radiation" }]],
    ["null", null],
  ])("a body not of the contract's shape (%s): the endpoint's error body and exit code 2", (_label, body) => {
    const out = cli(JSON.stringify(body));
    expect(out.status).toBe(2);
    const parsed = ZCalcBody.safeParse(body);
    expect(parsed.success).toBe(false);
    expect(JSON.parse(out.stdout)).toEqual(calcBodyError(parsed.error!));
  });

  test("inputs that overflow the engine answer ok: false, never NaN or Infinity", () => {
    const cases = [
      { id: "huge-Re", kind: "plate_forced", T_surface_C: 40, T_air_C: 20, velocity_m_s: 1e300, length_m: 1e300 },
      { id: "huge-T", kind: "radiation", T_surface_C: 1e300, T_surround_C: 0, emissivity: 0.9 },
      { id: "fine", kind: "dew_point", T_C: 20, RH_pct: 50 },
    ];
    const out = cli(JSON.stringify({ cases }));
    expect(out.status, out.stderr).toBe(0);
    expect(out.stdout).not.toMatch(/NaN|Infinity/);
    const { results } = JSON.parse(out.stdout) as { results: { id: string; ok: boolean; error?: { code: string } }[] };
    expect(results.map((r) => [r.id, r.ok, r.error?.code])).toEqual([
      ["huge-Re", false, "invalid_input"],
      ["huge-T", false, "invalid_input"],
      ["fine", true, undefined],
    ]);
  });

  test("FILMSHEET_CALC_TIMING=1 reports the phases on stderr and leaves stdout alone", () => {
    const input = JSON.stringify({ cases: publicCases });
    const out = cli(input, { FILMSHEET_CALC_TIMING: "1" });
    expect(out.status, out.stderr).toBe(0);
    expect(out.stdout).toBe(cli(input).stdout);
    const timing = JSON.parse(out.stderr.trim().split("\n").pop()!);
    expect(timing.cases).toBe(publicCases.length);
    expect(Object.keys(timing.phases).sort()).toEqual(["engine", "parse", "read", "serialize", "write"]);
  });
});

// From 1 MiB up the CLI cuts the body between cases and computes the second half on a worker
// thread (scripts/calc.ts) when a core is free; FILMSHEET_CALC_THREADS=2 asks for the worker
// whatever the load, FILMSHEET_CALC_THREADS=1 keeps the body on one thread.
describe("npm run calc on a large body (two threads)", { timeout: 120_000 }, () => {
  const tricky = ['","', "]", "}", "[{", '\\"},{"kind":"x"', "Façade N° 3 — 北 , ] }"];
  const large = Array.from({ length: 2600 }, (_, i) => ({
    ...publicCases[i % publicCases.length],
    id: `${tricky[i % tricky.length]}#${i}`,
    note: "x".repeat(300),
  }));
  const text = JSON.stringify({ cases: large });
  const oneThread = { FILMSHEET_CALC_THREADS: "1" };
  const twoThreads = { FILMSHEET_CALC_THREADS: "2" };
  /** The body with a second comma where the CLI cuts it: each half parses, the whole does not. */
  function strayCommaAtCut(body: string): string {
    const b = Buffer.from(body);
    const cut = splitCases(b)!;
    return Buffer.concat([b.subarray(0, cut.tailStart), Buffer.from(","), b.subarray(cut.tailStart)]).toString();
  }

  test("the answer is the bytes of calculate() and of one thread, and the worker computed part of it", () => {
    expect(Buffer.byteLength(text)).toBeGreaterThan(1 << 20);
    const out = cli(text, { ...twoThreads, FILMSHEET_CALC_TIMING: "1" });
    expect(out.status, out.stderr).toBe(0);
    expect(out.stdout).toBe(JSON.stringify(calculate({ cases: large })) + "\n");
    expect(out.stdout).toBe(cli(text, oneThread).stdout);
    const timing = JSON.parse(out.stderr.trim().split("\n").pop()!);
    expect(timing.cases).toBe(large.length);
    expect(timing.threads.first_half_cases).toBeGreaterThan(0);
    expect(timing.threads.first_half_cases).toBeLessThan(large.length);
  });

  test.each([
    ["the second half", text.slice(0, -200) + ",,]}"],
    ["the first half", text.replace('"kind"', "kind")],
    ["a stray comma at the cut", strayCommaAtCut(text)],
  ])("invalid JSON in %s: the endpoint's error body, nothing else, exit code 2", (_label, bad) => {
    const out = cli(bad, twoThreads);
    expect(out.status).toBe(2);
    expect(out.stdout).toBe(JSON.stringify({ error: { code: "bad_request", message: "Body is not valid JSON" } }) + "\n");
  });

  test("a large body of another shape (a second key) is answered on one thread, as before", () => {
    const other = text.slice(0, -1) + ',"note":[1,2]}';
    const out = cli(other, twoThreads);
    expect(out.status, out.stderr).toBe(0);
    expect(out.stdout).toBe(cli(other, oneThread).stdout);
    expect(out.stdout).toBe(JSON.stringify(calculate({ cases: large })) + "\n");
  });
});

describe("the bundle is rebuilt when a source changes", () => {
  const dir = mkdtempSync(join(tmpdir(), "calc-bundle-"));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  test("a changed entry makes the bundle stale and the next ensureBundle rebuilds it", async () => {
    const entry = join(dir, "entry.ts");
    const outfile = join(dir, "out", "entry.mjs");
    writeFileSync(entry, "const n: number = 1;\nconsole.log(n);\n");
    expect(bundleIsStale(outfile)).toBe(true);
    await ensureBundle(entry, outfile);
    expect(bundleIsStale(outfile)).toBe(false);
    expect(run(outfile, "").stdout).toBe("1\n");
    writeFileSync(entry, "const n: number = 22;\nconsole.log(n);\n");
    expect(bundleIsStale(outfile)).toBe(true);
    await ensureBundle(entry, outfile);
    expect(run(outfile, "").stdout).toBe("22\n");
  }, 60_000);
});
