// Contract rules for bad input (shared/design/calc-contract.md, "Rules"): every input
// error is ok: false with error.code "invalid_input" and the field named; an unknown
// or missing kind names `kind`; nothing throws; NaN and Infinity never appear.
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { calculate, CalcBodyError } from "../../src/calc/index";
import { optionalInputs, outOfPhysics, sampleCases, wordInputs } from "./arbitraries";
import { evaluate, nonFinitePaths, type AnyResult } from "./helpers";

const kinds = Object.keys(sampleCases);
const notANumber: unknown[] = ["abc", "", NaN, Infinity, -Infinity, {}, [], true, [1]];
const notAWord: unknown[] = ["hexagon", "", 5, NaN, {}, [], true];

/** A label for any generated value; String() itself throws on e.g. { toString: [] }. */
function show(v: unknown): string {
  try {
    return typeof v === "number" ? String(v) : (JSON.stringify(v) ?? typeof v);
  } catch {
    return Object.prototype.toString.call(v);
  }
}

/** "" when r is the expected field error, else a line saying what came back. */
function fieldError(r: AnyResult, field: string, what: string): string {
  if (!r.ok && r.error.code === "invalid_input" && r.error.field === field) return "";
  return `${what}: ${JSON.stringify(r)}`;
}

describe("every sample case is valid (so the mutations below test one thing each)", () => {
  test.each(kinds)("%s", (kind) => {
    expect(evaluate(sampleCases[kind]).ok).toBe(true);
  });
});

describe("nonsense in one input → invalid_input naming that input", () => {
  test.each(kinds)("%s", (kind) => {
    const sample = sampleCases[kind]!;
    const problems: string[] = [];
    for (const field of Object.keys(sample)) {
      const required = !optionalInputs.has(field);
      const bad = [...(wordInputs.has(field) ? notAWord : notANumber), ...(required ? [null] : [])];
      for (const v of bad) {
        problems.push(fieldError(evaluate({ ...sample, [field]: v }), field, `${field} = ${show(v)}`));
      }
      for (const v of outOfPhysics[`${kind}.${field}`] ?? outOfPhysics[field] ?? []) {
        problems.push(fieldError(evaluate({ ...sample, [field]: v }), field, `${field} = ${v} (out of physics)`));
      }
      if (required) {
        const { [field]: _omit, ...missing } = sample;
        problems.push(fieldError(evaluate(missing), field, `${field} missing`));
      }
    }
    expect(problems.filter((p) => p !== "")).toEqual([]);
  });

  test.each(["plate_forsed", "PLATE_FORCED", "", "surface ", "toString", "__proto__"])("unknown kind %j names `kind`", (kind) => {
    expect(fieldError(evaluate({ ...sampleCases.plate_forced, kind }), "kind", kind)).toBe("");
  });

  test.each([null, undefined, 5, "surface", [], true])("a case that is %j is refused, not thrown", (c) => {
    const r = evaluate(c);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.code).toBe("invalid_input");
  });

  test("RH 0 is refused by dew_point and by duct_run (no dew point exists)", () => {
    expect(fieldError(evaluate({ ...sampleCases.dew_point, RH_pct: 0 }), "RH_pct", "dew_point")).toBe("");
    expect(fieldError(evaluate({ ...sampleCases.duct_run, RH_ambient_pct: 0 }), "RH_ambient_pct", "duct_run")).toBe("");
  });
});

describe("random nonsense never throws (fast-check)", () => {
  test("any value as a case: ok:false with invalid_input, or a finite answer", () => {
    fc.assert(
      fc.property(fc.anything(), (c) => {
        const r = evaluate(c);
        expect(nonFinitePaths(r)).toEqual([]);
        if (!r.ok) expect(r.error.code).toBe("invalid_input");
      }),
      { numRuns: 200 },
    );
  });

  test("any value in one input of a valid case: non-numbers in numeric inputs name that input", () => {
    fc.assert(
      fc.property(fc.constantFrom(...kinds), fc.nat(), fc.anything(), (kind, i, v) => {
        const sample = sampleCases[kind]!;
        const fields = Object.keys(sample);
        const field = fields[i % fields.length]!;
        const r = evaluate({ ...sample, [field]: v });
        expect(nonFinitePaths(r)).toEqual([]);
        if (!r.ok) expect(r.error.code).toBe("invalid_input");
        const absentOptional = optionalInputs.has(field) && (v === undefined || v === null);
        if (!wordInputs.has(field) && typeof v !== "number" && !absentOptional) {
          expect(fieldError(r, field, `${field} = ${show(v)}`)).toBe("");
        }
      }),
      { numRuns: 300 },
    );
  });

  test("calculate with any list of cases answers per case, or refuses the body with CalcBodyError", () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.anything(), fc.constantFrom(...Object.values(sampleCases))), { maxLength: 6 }), (cases) => {
        try {
          const { results } = calculate({ cases });
          expect(results).toHaveLength(cases.length);
          expect(nonFinitePaths(results)).toEqual([]);
        } catch (e) {
          expect(e).toBeInstanceOf(CalcBodyError);
        }
      }),
      { numRuns: 100 },
    );
  });
});

describe("edge values: zero is valid where physics allows it; never NaN or Infinity", () => {
  const s = sampleCases;
  const edges: [string, Record<string, unknown>][] = [
    ["plate_forced at 0 m/s", { ...s.plate_forced, velocity_m_s: 0 }],
    ["plate_natural with no temperature difference, facing up", { ...s.plate_natural, T_surface_C: 20, tilt_deg: 0 }],
    ["plate_natural with no temperature difference, vertical", { ...s.plate_natural, T_surface_C: 20 }],
    ["plate_natural with no temperature difference, facing down", { ...s.plate_natural, T_surface_C: 20, tilt_deg: 180 }],
    ["plate_combined at 0 m/s", { ...s.plate_combined, velocity_m_s: 0 }],
    ["plate_combined at 0 m/s and no temperature difference", { ...s.plate_combined, velocity_m_s: 0, T_surface_C: 20 }],
    ["cylinder_crossflow at 0 m/s", { ...s.cylinder_crossflow, velocity_m_s: 0 }],
    ["cylinder_natural with no temperature difference", { ...s.cylinder_natural, T_surface_C: 20 }],
    ["sphere_forced at 0 m/s", { ...s.sphere_forced, velocity_m_s: 0 }],
    ["sphere_natural with no temperature difference", { ...s.sphere_natural, T_surface_C: 20 }],
    ["duct_internal with no flow", { ...s.duct_internal, flow_m3_s: 0 }],
    ["duct_internal with smooth walls", { ...s.duct_internal, roughness_m: 0 }],
    ["wind_at_height at 0 m/s", { ...s.wind_at_height, V_met_m_s: 0 }],
    ["wind_at_height at ground level", { ...s.wind_at_height, height_m: 0 }],
    ["radiation with emissivity 0", { ...s.radiation, emissivity: 0 }],
    ["radiation at 0 °C both sides", { ...s.radiation, T_surface_C: 0, T_surround_C: 0 }],
    ["dew_point at 100 % RH and −40 °C", { ...s.dew_point, T_C: -40, RH_pct: 100 }],
    ["surface: still, emissivity 0, facing down, no temperature difference",
      { ...s.surface, V_met_m_s: 0, emissivity: 0, tilt_deg: 180, T_inside_C: -4, solar_W_m2: 0 }],
    ["surface: no resistance inside the outer face", { ...s.surface, R_si_m2K_W: 0, R_construction_m2K_W: 0 }],
    ["surface: iso6946, still air, 0 °C", { ...s.surface, method: "iso6946", V_met_m_s: 0, T_outside_C: 0 }],
    ["duct_run: bare, still, at ambient temperature", { ...s.duct_run, insulation_thickness_m: 0, V_wind_m_s: 0, T_entering_C: 30, T_surround_C: 30 }],
    ["duct_run: jacket emissivity 0, no temperature difference", { ...s.duct_run, jacket_emissivity: 0, T_entering_C: 30, T_surround_C: 30, V_wind_m_s: 0 }],
  ];
  test.each(edges)("%s", (_label, c) => {
    const r = evaluate(c);
    expect(nonFinitePaths(r)).toEqual([]);
    if (!r.ok) expect(r.error.code).toBe("invalid_input");
  });

  // A speed of 1e-200 m/s is a valid input (finite, not negative); it must answer like
  // a still day, not refuse. Re² underflows to 0 there, which an engine must survive.
  test.each([
    ["plate_combined at 1e-200 m/s", { ...s.plate_combined, velocity_m_s: 1e-200 }],
    ["surface (boundary layer) at V_met 1e-200 m/s", { ...s.surface, V_met_m_s: 1e-200 }],
    ["surface (boundary layer), leeward, leeward factor 1e-300", { ...s.surface, wind_from_deg: 20, leeward_factor: 1e-300 }],
    ["cylinder_crossflow at 1e-200 m/s", { ...s.cylinder_crossflow, velocity_m_s: 1e-200 }],
  ] as [string, Record<string, unknown>][])("%s answers ok", (_label, c) => {
    const r = evaluate(c);
    expect(r.ok, JSON.stringify(r)).toBe(true);
    expect(nonFinitePaths(r)).toEqual([]);
  });
});
