// Helpers for the engine's independent checks. They use only the public entry
// point and the contract's field names, so they hold whatever the internals.
import { expect } from "vitest";
import { calculateCase } from "../../src/calc/index";

export type Warning = { code: string; message: string };
export type OkResult = { ok: true; correlation: string; warnings: Warning[] } & Record<string, unknown>;
export type ErrResult = { ok: false; error: { code: string; field: string; message: string } };
export type AnyResult = OkResult | ErrResult;

export const ZERO_C = 273.15;

/** Run one case through the public entry point; the result as a loose record. */
export function evaluate(c: unknown): AnyResult {
  return calculateCase(c) as unknown as AnyResult;
}

/** Run a case that must succeed; a failure shows the engine's error. */
export function run(c: Record<string, unknown>): OkResult {
  const r = evaluate(c);
  if (!r.ok) {
    throw new Error(`expected ok for ${JSON.stringify(c)}, got ${JSON.stringify(r.error)}`);
  }
  return r;
}

/** A numeric output, which must be present and finite. */
export function num(r: OkResult, key: string): number {
  const v = r[key];
  if (typeof v !== "number" || !Number.isFinite(v)) {
    throw new Error(`output ${key} is not a finite number: ${JSON.stringify(v)}`);
  }
  return v;
}

/** |got - want| <= max(abs, rel·|want|), with the label and both numbers in the message. */
export function expectClose(got: number, want: number, rel: number, abs = 0, label = ""): void {
  const allowed = Math.max(abs, rel * Math.abs(want));
  const dev = Math.abs(got - want);
  expect(dev, `${label} got ${got}, expected ${want} ± ${allowed} (off by ${dev})`).toBeLessThanOrEqual(allowed);
}

/** Paths of every number in a value that is NaN or infinite (the contract forbids both). */
export function nonFinitePaths(value: unknown, path = "$"): string[] {
  if (typeof value === "number") return Number.isFinite(value) ? [] : [`${path} = ${value}`];
  if (Array.isArray(value)) return value.flatMap((v, i) => nonFinitePaths(v, `${path}[${i}]`));
  if (value !== null && typeof value === "object") {
    return Object.entries(value).flatMap(([k, v]) => nonFinitePaths(v, `${path}.${k}`));
  }
  return [];
}

export function hasWarning(r: OkResult, code: string): boolean {
  return r.warnings.some((w) => w.code === code);
}
