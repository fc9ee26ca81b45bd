// A row's working is the engine's own trace: its result is the API's result, its lines agree with
// each other by the definitions they print, and its charts follow the published flat-plate laws.
import { readFileSync } from "node:fs";
import { describe, expect, test } from "vitest";
import { calculateCase, working, type WorkingLine } from "../../src/calc/index";

const wall = {
  id: "w1", kind: "surface", area_m2: 20, tilt_deg: 90, azimuth_deg: 270, height_m: 10, length_m: 12, panel_height_m: 3,
  R_construction_m2K_W: 2.5, T_inside_C: 21, T_outside_C: -5, V_met_m_s: 6, wind_from_deg: 285, terrain: "suburban",
  emissivity: 0.9, absorptance: 0.6, method: "boundary_layer",
};
const duct = {
  id: "d1", kind: "duct_run", shape: "round", diameter_m: 0.5, length_m: 30, flow_m3_s: 1.2, T_entering_C: 13, T_ambient_C: 35,
  RH_ambient_pct: 60, insulation_thickness_m: 0.025, insulation_k_W_mK: 0.04, jacket_emissivity: 0.9, location: "outdoor", V_wind_m_s: 4,
};

const line = (lines: WorkingLine[], symbol: string) => {
  const l = lines.find((x) => x.symbol === symbol);
  if (l === undefined) throw new Error(`no line ${symbol}`);
  return l.value as number;
};

describe("surface working", () => {
  const w = working(wall);
  test("its result is exactly what the API answers", () => {
    expect(JSON.parse(JSON.stringify(w.result))).toEqual(JSON.parse(JSON.stringify(calculateCase(wall))));
  });
  test("sections come in calculation order", () => {
    const sections = [...new Set(w.lines.map((l) => l.section))];
    expect(sections).toEqual(["Inputs", "Wind at the surface", "Sky and surroundings", "Surface balance", "Air properties", "Convection", "Results"]);
  });
  test("the lines agree with each other by the definitions they print", () => {
    const L = w.lines;
    expect(line(L, "Re_L")).toBeCloseTo((line(L, "V") * 12) / line(L, "ν"), 6);
    expect(line(L, "Pr")).toBeCloseTo((line(L, "c_p") * line(L, "μ")) / line(L, "k"), 12);
    expect(line(L, "Nu")).toBeCloseTo(Math.cbrt(line(L, "Nu_F") ** 3 + line(L, "Nu_N") ** 3), 9);
    expect(line(L, "Nu_N")).toBeCloseTo((line(L, "Nu_N,H") * 12) / 3, 9);
    expect(line(L, "h_o")).toBeCloseTo(line(L, "h_c") + line(L, "h_r"), 12);
    expect(line(L, "h_c")).toBe(w.result.ok ? w.result.h_c_W_m2K : NaN);
  });
  test("names every method it applies with its source", () => {
    const ids = w.methods.map((m) => m.id);
    for (const id of ["wind-power-law", "sky-swinbank", "air-lemmon-jacobsen", "churchill-chu-vertical-plate", "churchill-combined-plate", "radiation-linearised"]) {
      expect(ids).toContain(id);
    }
    expect(w.methods.find((m) => m.id === "churchill-chu-vertical-plate")?.source).toMatch(/Churchill.*Chu.*1975/);
  });
  test("default (turbulent from the leading edge): local h is turbulent throughout and falls as x^−0.2 (0.0296 Re_x^0.8)", () => {
    const pts = w.charts.local_h ?? [];
    expect(pts.every((p) => p.regime === "turbulent")).toBe(true);
    const [a, b] = [pts[0], pts[pts.length - 1]];
    expect(a.h_W_m2K / b.h_W_m2K).toBeCloseTo(Math.pow(b.x_m / a.x_m, 0.2), 9);
  });
  test("with Re_crit 5×10⁵ local h falls as x^−½ in the laminar part and jumps up at transition (flat-plate laws)", () => {
    const pts = working({ ...wall, Re_crit: 5e5 }).charts.local_h ?? [];
    const lam = pts.filter((p) => p.regime === "laminar");
    const turb = pts.filter((p) => p.regime === "turbulent");
    expect(lam.length).toBeGreaterThan(2);
    expect(turb.length).toBeGreaterThan(2);
    const [a, b] = [lam[0], lam[lam.length - 1]];
    expect(a.h_W_m2K / b.h_W_m2K).toBeCloseTo(Math.sqrt(b.x_m / a.x_m), 9);
    expect(turb[0].h_W_m2K).toBeGreaterThan(lam[lam.length - 1].h_W_m2K);
  });
  test("h against wind: natural alone at 0 m/s, rising with speed, the row's point on the combined curve", () => {
    const pts = w.charts.h_vs_wind ?? [];
    expect(pts[0].V_m_s).toBe(0);
    expect(pts[0].h_forced_W_m2K).toBe(0);
    expect(pts[0].h_combined_W_m2K).toBeCloseTo(pts[0].h_natural_W_m2K, 12);
    for (let i = 1; i < pts.length; i++) expect(pts[i].h_combined_W_m2K).toBeGreaterThanOrEqual(pts[i - 1].h_combined_W_m2K);
    expect(w.charts.current?.V_m_s).toBe(w.result.ok ? w.result.V_surface_m_s : NaN);
  });
});

describe("duct-run working", () => {
  const w = working(duct);
  test("its result is exactly what the API answers, and T_L follows from its own lines", () => {
    expect(JSON.parse(JSON.stringify(w.result))).toEqual(JSON.parse(JSON.stringify(calculateCase(duct))));
    const L = w.lines;
    const Tenv = line(L, "T_env");
    expect(line(L, "T_L")).toBeCloseTo(Tenv + (13 - Tenv) * Math.exp(-line(L, "NTU")), 9);
    expect(line(L, "R′_ins")).toBeCloseTo(Math.log(0.55 / 0.5) / (2 * Math.PI * 0.04), 12);
    expect(w.methods.map((m) => m.id)).toEqual(expect.arrayContaining(["gnielinski-petukhov", "churchill-bernstein-cylinder", "dew-point-hyland-wexler", "duct-run-exponential"]));
  });
});

// Python3-fluids 1.0.22 (Debian), fluids.friction.Colebrook on a grid of Re and ε/D: written by
// scripts/fixtures/make-fluids-fixtures.py into test/calc/fixtures/fluids-1.0.22.json.
const fluids = JSON.parse(readFileSync(new URL("./fixtures/fluids-1.0.22.json", import.meta.url), "utf8")) as { colebrook: { Re: number[]; eD: number[]; f_darcy: number[][] } };

const lineOf = (lines: WorkingLine[], symbol: string) => {
  const l = lines.find((x) => x.symbol === symbol);
  if (l === undefined) throw new Error(`no line ${symbol}`);
  return l;
};

describe("duct-run working: the friction factor used for each purpose", () => {
  // A galvanised-steel-like roughness, so the two factors differ clearly (Colebrook above Petukhov).
  const rough = { ...duct, roughness_m: 0.00015 };
  const w = working(rough);
  const L = w.lines;
  const Re = line(L, "Re");

  test("the Nusselt number uses Petukhov's smooth-duct factor, shown and cited beside it: f = (0.790 ln Re − 1.64)⁻²", () => {
    const fP = lineOf(L, "f_P");
    expect(fP.method).toBe("petukhov-friction");
    expect(fP.label).toMatch(/heat transfer/);
    // The published form, written out here, not the engine's function.
    expect(fP.value as number).toBeCloseTo(Math.pow(0.79 * Math.log(Re) - 1.64, -2), 14);
    const Nu = lineOf(L, "Nu");
    expect(Nu.method).toBe("gnielinski-petukhov");
    const Pr = line(L.filter((l) => l.section === "Inside the duct"), "Pr");
    const f8 = (fP.value as number) / 8;
    expect(Nu.value as number).toBeCloseTo((f8 * (Re - 1000) * Pr) / (1 + 12.7 * Math.sqrt(f8) * (Math.pow(Pr, 2 / 3) - 1)), 9);
    // Petukhov's line comes before the Nusselt number it feeds.
    expect(L.indexOf(fP)).toBeLessThan(L.indexOf(Nu));
  });

  test("the pressure drop uses Colebrook–White on the wall's roughness: the shown f satisfies the published equation and python3-fluids' Colebrook", () => {
    const f = lineOf(L, "f");
    expect(f.method).toBe("colebrook");
    expect(f.label).toMatch(/pressure drop/);
    const eD = line(L, "ε_r/D_h");
    expect(eD).toBeCloseTo(0.00015 / 0.5, 15);
    const fC = f.value as number;
    // 1/√f = −2 log10(ε/(3.7 D) + 2.51/(Re √f)): the residual of the implicit equation at the shown f.
    expect(1 / Math.sqrt(fC) + 2 * Math.log10(eD / 3.7 + 2.51 / (Re * Math.sqrt(fC)))).toBeCloseTo(0, 10);
    // Source: python3-fluids 1.0.22 fluids.friction.Colebrook, ε/D 2.5×10⁻⁴ and 5×10⁻⁴ around ε/D 3×10⁻⁴,
    // at the grid's Re on either side; the shown value lies between the library's neighbours.
    const { Re: Res, eD: eDs, f_darcy } = fluids.colebrook;
    const j = Res.findIndex((r) => r > Re);
    const lo = f_darcy[eDs.indexOf(0.00025)]!;
    const hi = f_darcy[eDs.indexOf(0.0005)]!;
    expect(fC).toBeGreaterThan(Math.min(lo[j - 1]!, lo[j]!));
    expect(fC).toBeLessThan(Math.max(hi[j - 1]!, hi[j]!));
    // The two factors are different numbers, and both are on the page.
    expect(fC).toBeGreaterThan(line(L, "f_P") * 1.05);
    const dp = lineOf(L, "Δp/L");
    expect(dp.unit).toBe("Pa/m");
    expect(dp.value as number).toBeCloseTo((fC * line(L.filter((l) => l.section === "Inside the duct"), "ρ") * line(L, "v") ** 2) / (2 * 0.5), 9);
  });

  test("both methods are listed with their sources; Colebrook is no longer cited for the Nusselt number", () => {
    const ids = w.methods.map((m) => m.id);
    expect(ids).toEqual(expect.arrayContaining(["petukhov-friction", "colebrook", "gnielinski-petukhov"]));
    expect(w.methods.find((m) => m.id === "petukhov-friction")?.source).toMatch(/Petukhov.*1970/);
    expect(w.methods.find((m) => m.id === "colebrook")?.source).toMatch(/Colebrook.*1939/);
  });

  test("laminar flow: no Petukhov line, the pressure-drop factor is 64/Re", () => {
    const slow = working({ ...duct, flow_m3_s: 0.01 });
    const Re2 = line(slow.lines, "Re");
    expect(Re2).toBeLessThan(2300);
    expect(slow.lines.some((l) => l.symbol === "f_P")).toBe(false);
    expect(line(slow.lines, "f")).toBeCloseTo(64 / Re2, 12);
  });

  test("transitional flow: Petukhov's factor is taken at Re 3000, where the Nusselt blend ends", () => {
    // ν of air near 24 °C ≈ 1.55×10⁻⁵ m²/s: aim at Re ≈ 2650 in the 0.5 m duct.
    const mid = working({ ...duct, flow_m3_s: (2650 * 1.55e-5 * Math.PI * 0.5) / 4 });
    const Re3 = line(mid.lines, "Re");
    expect(Re3).toBeGreaterThan(2300);
    expect(Re3).toBeLessThan(3000);
    expect(line(mid.lines, "f_P")).toBeCloseTo(Math.pow(0.79 * Math.log(3000) - 1.64, -2), 14);
    expect(lineOf(mid.lines, "Nu").method).toBe("duct-transitional-blend");
  });
});

describe("other kinds and bad input", () => {
  test("a single correlation lists inputs, the correlation and outputs", () => {
    const w = working({ kind: "plate_forced", T_surface_C: 40, T_air_C: 20, velocity_m_s: 3, length_m: 2 });
    expect(w.lines.find((l) => l.symbol === "length_m")?.value).toBe(2);
    expect(w.methods[0].id).toBe("flat-plate-laminar");
  });
  test("a bad case has no working, only the error naming the field", () => {
    const w = working({ ...wall, emissivity: 2 });
    expect(w.result).toMatchObject({ ok: false, error: { field: "emissivity" } });
    expect(w.lines).toEqual([]);
  });
});
