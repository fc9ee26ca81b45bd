// Dew points against psychrolib 1.1.1 (npm), the published implementation of the
// ASHRAE Handbook—Fundamentals (2017) ch. 1 psychrometric formulas (Hyland &
// Wexler saturation pressure over ice at and below 0.01 °C, over water above).
/// <reference path="../../types/psychrolib.d.ts" />
import psychrolib from "psychrolib";
import { describe, expect, test } from "vitest";
import { evaluate, expectClose, num, run } from "./helpers";

psychrolib.SetUnitSystem(psychrolib.SI);

// psychrolib iterates to 0.001 K; 0.05 K is the tolerance.
const TOL_K = 0.05;
const temps = Array.from({ length: 17 }, (_, i) => -30 + 5 * i); // −30 … 50 °C
const rhs = [5, 10, 20, 30, 40, 50, 60, 70, 80, 90, 95, 100]; // %
const grid = temps.flatMap((T) => rhs.map((RH) => ({ T, RH })));

describe("dew_point vs psychrolib GetTDewPointFromRelHum (SI), ±0.05 K", () => {
  test.each(grid)("T = $T °C, RH = $RH %", ({ T, RH }) => {
    const r = run({ kind: "dew_point", T_C: T, RH_pct: RH });
    expectClose(num(r, "T_dp_C"), psychrolib.GetTDewPointFromRelHum(T, RH / 100), 0, TOL_K);
  });

  // The ASHRAE formulas carry no enhancement factor: the dew point of a given RH
  // does not depend on the site pressure (psychrolib takes none).
  test.each([
    { T: 22, RH: 45, P: 80000 },
    { T: -8, RH: 75, P: 70000 },
    { T: 35, RH: 65, P: 95000 },
  ])("T = $T °C, RH = $RH % at $P Pa", ({ T, RH, P }) => {
    const r = run({ kind: "dew_point", T_C: T, RH_pct: RH, pressure_Pa: P });
    expectClose(num(r, "T_dp_C"), psychrolib.GetTDewPointFromRelHum(T, RH / 100), 0, TOL_K);
  });

  test("off-grid points in the frost/dew changeover, −2 … 2 °C", () => {
    for (const T of [-2, -1, -0.5, 0, 0.01, 0.5, 1, 2]) {
      for (const RH of [33, 67, 99]) {
        const r = run({ kind: "dew_point", T_C: T, RH_pct: RH });
        expectClose(num(r, "T_dp_C"), psychrolib.GetTDewPointFromRelHum(T, RH / 100), 0, TOL_K, `T ${T} RH ${RH}`);
      }
    }
  });
});

describe("dew_point input rules (contract)", () => {
  test.each([
    { RH: 0, why: "RH 0 has no dew point" },
    { RH: -5, why: "negative RH" },
    { RH: 100.5, why: "RH above 100 %" },
  ])("$why → invalid_input on RH_pct", ({ RH }) => {
    const r = evaluate({ kind: "dew_point", T_C: 20, RH_pct: RH });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatchObject({ code: "invalid_input", field: "RH_pct" });
  });
});

describe("duct_run ambient dew point vs psychrolib, ±0.05 K", () => {
  test.each([
    { T: 30, RH: 70 },
    { T: 24, RH: 55 },
    { T: 5, RH: 90 },
    { T: -5, RH: 80 },
  ])("ambient $T °C, RH $RH %", ({ T, RH }) => {
    const r = run({
      kind: "duct_run", shape: "round", diameter_m: 0.4, length_m: 10, flow_m3_s: 0.5,
      T_entering_C: 13, T_ambient_C: T, RH_ambient_pct: RH, insulation_thickness_m: 0.025,
      insulation_k_W_mK: 0.035, jacket_emissivity: 0.9, location: "indoor",
    });
    expectClose(num(r, "T_dp_C"), psychrolib.GetTDewPointFromRelHum(T, RH / 100), 0, TOL_K);
  });
});
