/**
 * The registry is the one table of methods. A known failure of such tables is an entry that
 * dispatches to its neighbour's function, so every entry is checked against the module export
 * it names, and every correlation id the engine reports must be registered.
 */
import { describe, expect, test } from "vitest";
import { calculate } from "../../src/calc/index";
import { METHODS, METHOD_BY_ID, MODULES, dispatch, methodOrThrow } from "../../src/calc/registry";

describe("registry", () => {
  test("ids are unique", () => {
    expect(new Set(METHODS.map((m) => m.id)).size).toBe(METHODS.length);
  });

  test.each(METHODS.map((m) => [m.id, m] as const))("%s dispatches to the function it names", (id, m) => {
    const mod = MODULES[m.module];
    expect(mod, `module ${m.module}`).toBeDefined();
    expect(mod[m.fnName], `${m.module}.${m.fnName}`).toBe(m.fn);
    expect(m.fn.name).toBe(m.fnName);
    expect(METHOD_BY_ID[id]).toBe(m);
    // dispatch() calls that same function: same arguments, same answer.
    const wind = [5, 25, "city", 10];
    const args = m.family === "wind" ? wind : Array.from({ length: m.fn.length }, (_, i) => [300, 0.71, 5e5, 2, 0.5, 1][i] ?? 1);
    const a = dispatch(id, ...args);
    const b = m.fn(...args);
    if (typeof b === "number" && Number.isNaN(b)) expect(Number.isNaN(a)).toBe(true);
    else expect(a).toEqual(b);
  });

  test.each(METHODS.map((m) => [m.id, m] as const))("%s is documented: equation, source, evaluation, numeric ranges", (_id, m) => {
    expect(m.title.length).toBeGreaterThan(5);
    expect(m.equation.length).toBeGreaterThan(3);
    expect(m.source.length).toBeGreaterThan(10);
    expect(m.evaluation.length).toBeGreaterThan(0);
    for (const r of Object.values(m.ranges)) {
      if (r.min !== undefined) expect(Number.isFinite(r.min)).toBe(true);
      if (r.max !== undefined) expect(Number.isFinite(r.max)).toBe(true);
      if (r.min !== undefined && r.max !== undefined) expect(r.min).toBeLessThan(r.max);
    }
  });

  test("an unknown id fails loudly and lists the valid ones", () => {
    expect(() => methodOrThrow("flat-plate-laminaar")).toThrow(/unknown method "flat-plate-laminaar".*flat-plate-laminar/);
  });

  test("every correlation id the engine reports is registered", () => {
    const T = { T_surface_C: 40, T_air_C: 20 };
    const { results } = calculate({
      cases: [
        { kind: "air_properties", T_C: 20 },
        { kind: "plate_forced", ...T, velocity_m_s: 0.5, length_m: 1, x_m: 0.5 },
        { kind: "plate_forced", ...T, velocity_m_s: 10, length_m: 5, x_m: 4 },
        { kind: "plate_forced", ...T, velocity_m_s: 10, length_m: 5, Re_crit: 0 },
        { kind: "plate_natural", ...T, tilt_deg: 90, length_m: 1 },
        { kind: "plate_natural", ...T, tilt_deg: 0, length_m: 1 },
        { kind: "plate_natural", ...T, tilt_deg: 0, length_m: 0.05 },
        { kind: "plate_natural", ...T, tilt_deg: 180, length_m: 1 },
        { kind: "plate_natural", ...T, tilt_deg: 120, length_m: 1 },
        { kind: "plate_combined", ...T, velocity_m_s: 1, length_m: 3, tilt_deg: 90, height_m: 3 },
        { kind: "cylinder_crossflow", ...T, velocity_m_s: 2, diameter_m: 0.1 },
        { kind: "cylinder_natural", ...T, diameter_m: 0.1 },
        { kind: "sphere_forced", ...T, velocity_m_s: 2, diameter_m: 0.1 },
        { kind: "sphere_natural", ...T, diameter_m: 0.1 },
        { kind: "duct_internal", shape: "round", diameter_m: 0.15, flow_m3_s: 0.003, T_air_C: 20 },
        { kind: "duct_internal", shape: "rect", width_m: 0.6, height_m: 0.3, flow_m3_s: 0.01, T_air_C: 20 },
        { kind: "duct_internal", shape: "round", diameter_m: 0.15, flow_m3_s: 0.0044, T_air_C: 20 },
        { kind: "duct_internal", shape: "round", diameter_m: 0.4, flow_m3_s: 1, T_air_C: 20 },
        { kind: "wind_at_height", V_met_m_s: 5, height_m: 20, terrain: "city" },
        { kind: "wind_at_height", V_met_m_s: 5, height_m: 20, terrain: "city", law: "log" },
        { kind: "radiation", T_surface_C: 10, T_surround_C: 0, emissivity: 0.9 },
        { kind: "dew_point", T_C: 20, RH_pct: 50 },
        ...(["boundary_layer", "iso6946", "mcadams"] as const).map((method) => ({
          kind: "surface", area_m2: 10, tilt_deg: 90, azimuth_deg: 180, height_m: 6, length_m: 5, panel_height_m: 3,
          R_construction_m2K_W: 2, T_inside_C: 20, T_outside_C: 0, V_met_m_s: 4, wind_from_deg: 180,
          terrain: "suburban", emissivity: 0.9, absorptance: 0.6, method,
        })),
        { kind: "duct_run", shape: "round", diameter_m: 0.4, length_m: 20, flow_m3_s: 0.8, T_entering_C: 14,
          T_ambient_C: 28, RH_ambient_pct: 50, insulation_thickness_m: 0.025, insulation_k_W_mK: 0.04,
          jacket_emissivity: 0.9, location: "outdoor", V_wind_m_s: 3 },
      ],
    });
    const ids = new Set<string>();
    for (const r of results) {
      expect(r.ok, JSON.stringify(r)).toBe(true);
      if (r.ok) ids.add(r.correlation);
      if (r.ok) for (const w of r.warnings) if (w.method !== undefined) ids.add(w.method);
    }
    for (const id of ids) expect(METHOD_BY_ID[id], id).toBeDefined();
    // The cases above reach these branches of the method selection.
    for (const id of [
      "flat-plate-laminar", "flat-plate-mixed", "flat-plate-turbulent", "churchill-chu-vertical-plate",
      "horizontal-plate-unstable-turbulent", "horizontal-plate-stable", "churchill-chu-inclined-plate",
      "laminar-round-duct", "shah-london-rectangular", "duct-transitional-blend", "gnielinski-petukhov",
      "wind-power-law", "wind-log-law-en1991", "iso6946-simplified", "mcadams-wind", "churchill-combined-plate",
    ]) {
      expect(ids.has(id), id).toBe(true);
    }
  });
});
