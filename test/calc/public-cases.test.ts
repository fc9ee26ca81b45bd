/**
 * The published check cases of shared/reference/public-cases.json, read in place (never copied):
 * every case must pass within its own stated tolerance. Each case names its source in the file.
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, test } from "vitest";
import { calculate } from "../../src/calc/index";

interface RefCase {
  id: string;
  request: Record<string, unknown>;
  expect?: Record<string, number | string | boolean | null>;
  tolerance_rel: number;
  tolerance_abs?: number;
  expect_warning?: string;
  expect_error_field?: string;
  source: string;
}

const file = fileURLToPath(new URL("../../../shared/reference/public-cases.json", import.meta.url));
const ref = JSON.parse(readFileSync(file, "utf8")) as { cases: RefCase[] };
const body = { cases: ref.cases.map((c) => ({ id: c.id, ...c.request })) };
const { results } = calculate(body);

/** NaN or Infinity anywhere in the answer fails the case. */
function hasNonFinite(v: unknown): boolean {
  if (typeof v === "number") return !Number.isFinite(v);
  if (v && typeof v === "object") return Object.values(v).some(hasNonFinite);
  return false;
}

describe("shared/reference/public-cases.json", () => {
  test("holds cases and answers each in order", () => {
    expect(ref.cases.length).toBeGreaterThan(50);
    expect(results.map((r) => r.id)).toEqual(ref.cases.map((c) => c.id));
  });

  test.each(ref.cases.map((c, i) => [c.id, c, i] as const))("%s", (_id, c, i) => {
    const r = results[i] as Record<string, unknown>;
    expect(hasNonFinite(r), "no NaN or Infinity").toBe(false);
    if (c.expect_error_field !== undefined) {
      expect(r.ok).toBe(false);
      expect((r.error as { field: string; code: string }).field).toBe(c.expect_error_field);
      expect((r.error as { code: string }).code).toBe("invalid_input");
      return;
    }
    expect(r.ok, JSON.stringify(r.error)).toBe(true);
    for (const [k, want] of Object.entries(c.expect ?? {})) {
      const got = r[k];
      if (typeof want === "number") {
        expect(typeof got, `${k} is a number`).toBe("number");
        const tol = Math.max(c.tolerance_abs ?? 0, c.tolerance_rel * Math.abs(want));
        expect(Math.abs((got as number) - want), `${k}: got ${got}, expected ${want} ± ${tol} (${c.source})`).toBeLessThanOrEqual(tol);
      } else {
        expect(got, k).toBe(want);
      }
    }
    if (c.expect_warning !== undefined) {
      const codes = (r.warnings as { code: string }[]).map((w) => w.code);
      expect(codes).toContain(c.expect_warning);
    }
  });
});
