// calculateCase checks a `surface` result's numbers by name (surfaceResultFinite) instead of a loop
// over its keys: every number the result carries must be among those it checks.
import { describe, expect, test } from "vitest";
import { calculateCase } from "../../src/calc/index";
import { surfaceResultFinite, type SurfaceResult } from "../../src/calc/surface";
import { sampleCases } from "./arbitraries";

describe("surfaceResultFinite", () => {
  const result = calculateCase(sampleCases.surface) as SurfaceResult;
  const numeric = Object.keys(result).filter((k) => typeof (result as Record<string, unknown>)[k] === "number");

  test("a computed surface result is finite", () => {
    expect(result.ok).toBe(true);
    expect(numeric.length).toBeGreaterThanOrEqual(14);
    expect(surfaceResultFinite(result)).toBe(true);
  });

  test.each([NaN, Infinity, -Infinity])("any number of the result set to %s is caught", (bad) => {
    for (const k of numeric) {
      expect(surfaceResultFinite({ ...result, [k]: bad }), k).toBe(false);
    }
  });
});
