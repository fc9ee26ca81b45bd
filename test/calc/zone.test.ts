// Zone totals: heat loss and gain through surfaces and from duct runs, in W and W/m² of floor.
// Expected values follow by hand from the sign conventions of the contract (definition).
import { describe, expect, test } from "vitest";
import { calculate, zoneTotals } from "../../src/calc/index";

describe("zoneTotals", () => {
  test("sorts surface and duct-run flows into loss and gain by their sign conventions", () => {
    const t = zoneTotals(
      [
        { source: "surface", Q_W: 500 }, // loss through a wall
        { source: "surface", Q_W: -120 }, // solar-driven gain through a roof
        { source: "duct_run", Q_W: -300 }, // warm supply air cooling on its way: a loss
        { source: "duct_run", Q_W: 80 }, // cool supply air warming up: a gain
      ],
      100,
    );
    expect(t.loss_W).toBe(800);
    expect(t.gain_W).toBe(200);
    expect(t.net_loss_W).toBe(600);
    expect(t.loss_W_m2).toBe(8);
    expect(t.gain_W_m2).toBe(2);
    expect(t.surfaces_loss_W).toBe(500);
    expect(t.ducts_gain_W).toBe(80);
    expect(t.rows).toBe(4);
  });

  test("a zone without floor area has no per-area figures, never Infinity", () => {
    const t = zoneTotals([{ source: "surface", Q_W: 50 }], 0);
    expect(t.loss_W).toBe(50);
    expect(t.loss_W_m2).toBeNull();
    expect(t.gain_W_m2).toBeNull();
  });

  test("totals a zone straight from engine results", () => {
    const wall = {
      kind: "surface", area_m2: 30, tilt_deg: 90, azimuth_deg: 0, height_m: 6, length_m: 8, panel_height_m: 3,
      R_construction_m2K_W: 2.5, T_inside_C: 21, T_outside_C: -4, V_met_m_s: 5, wind_from_deg: 10,
      terrain: "suburban", emissivity: 0.9, absorptance: 0.6, method: "iso6946",
    };
    const { results } = calculate({ cases: [wall, { ...wall, area_m2: 10 }] });
    const q = results.map((r) => (r.ok ? (r.Q_W as number) : NaN));
    const t = zoneTotals(q.map((Q_W) => ({ source: "surface" as const, Q_W })), 40);
    // Same construction and exposure: the loss scales with area, 30 + 10 = 40 m² of the same wall.
    expect(t.loss_W).toBeCloseTo((q[0] * 40) / 30, 6);
    expect(t.loss_W_m2).toBeCloseTo(t.loss_W / 40, 9);
    expect(t.gain_W).toBe(0);
  });
});
