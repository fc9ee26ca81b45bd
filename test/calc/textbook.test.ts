// Worked examples and tables from standard heat-transfer textbooks, recalled from
// memory. Each case names its source; tolerances cover the books' rounding and
// their property tables against the contract's property model (Lemmon & Jacobsen).
// Incropera's Table A.4 densities correspond to 100 kPa, so cases built on that
// table are entered at pressure_Pa = 100000 (ρ, ν, α then share the table's basis).
import { describe, expect, test } from "vitest";
import { expectClose, hasWarning, num, run } from "./helpers";

type Example = {
  label: string;
  source: string;
  request: Record<string, unknown>;
  expect: Record<string, number>;
  tol: number;
  warning?: string;
};

const examples: Example[] = [
  {
    label: "flat plate, air 27 °C at 2 m/s over a 60 °C plate, x = L = 0.2 m",
    source: "Holman, Heat Transfer, Example 5-4 (from memory): Re_x 23 041, h_x 6.15, h̄ 12.3 W/m²K (q 81.18 W/m)",
    request: { kind: "plate_forced", T_surface_C: 60, T_air_C: 27, velocity_m_s: 2, length_m: 0.2, x_m: 0.2 },
    expect: { Re_x: 23041, h_x_W_m2K: 6.15, h_W_m2K: 12.3 },
    tol: 0.03,
  },
  {
    label: "vertical glass firescreen 0.71 m high, 232 °C in a 23 °C room",
    source: "Incropera & DeWitt, 6th ed., Example 9.2 (from memory): Ra_L 1.813e9, Nu_L 147, h 7.0 W/m²K",
    request: { kind: "plate_natural", T_surface_C: 232, T_air_C: 23, tilt_deg: 90, length_m: 0.71, pressure_Pa: 100000 },
    expect: { Ra: 1.813e9, Nu: 147, h_W_m2K: 7.0 },
    tol: 0.04,
  },
  {
    // Recomputing Churchill & Chu from the book's properties at 367 K gives Nu 23.1,
    // h 7.23; the recalled printed values are 23.3 and 7.29. 4 % covers both.
    label: "horizontal steam pipe 0.1 m, 165 °C in a 23 °C room",
    source: "Incropera & DeWitt, 6th ed., Example 9.3 (from memory): Ra_D 5.08e6, Nu_D ≈ 23.2, h ≈ 7.25 W/m²K",
    request: { kind: "cylinder_natural", T_surface_C: 165, T_air_C: 23, diameter_m: 0.1, pressure_Pa: 100000 },
    expect: { Ra: 5.08e6, Nu: 23.2, h_W_m2K: 7.25 },
    tol: 0.04,
  },
  {
    label: "steam pipe 0.1 m at 110 °C in 10 °C wind at 8 m/s",
    source: "Cengel & Ghajar, Heat and Mass Transfer, ch. 7 example 'heat loss from a steam pipe in windy air' (from memory): Re 4.219e4, Nu 124, h 34.8 W/m²K, 1093 W/m",
    request: { kind: "cylinder_crossflow", T_surface_C: 110, T_air_C: 10, velocity_m_s: 8, diameter_m: 0.1 },
    expect: { Re: 42190, Nu: 124, h_W_m2K: 34.8 },
    tol: 0.03,
  },
  {
    label: "stainless ball 0.25 m, mean surface 250 °C, in 25 °C air at 3 m/s",
    source: "Cengel & Ghajar, Heat and Mass Transfer, ch. 7 example 'cooling of a steel ball by forced air' (from memory): Re 4.80e4, Nu 135, h 13.8 W/m²K",
    request: { kind: "sphere_forced", T_surface_C: 250, T_air_C: 25, velocity_m_s: 3, diameter_m: 0.25 },
    expect: { Re: 48020, Nu: 135, h_W_m2K: 13.8 },
    tol: 0.03,
    warning: "out_of_range", // μ/μ_s = 0.67 lies below Whitaker's 1…3.2
  },
  {
    label: "copper sphere 10 mm, mean surface 55 °C, in 23 °C air at 10 m/s",
    source: "Incropera & DeWitt, 6th ed., ch. 7 sphere example (plastic film cured on a copper sphere) (from memory): Re 6510, Nu 47.4, h ≈ 123 W/m²K",
    request: { kind: "sphere_forced", T_surface_C: 55, T_air_C: 23, velocity_m_s: 10, diameter_m: 0.01, pressure_Pa: 100000 },
    expect: { Re: 6510, Nu: 47.4, h_W_m2K: 123 },
    tol: 0.03,
    warning: "out_of_range", // μ/μ_s = 0.92 lies below Whitaker's 1…3.2
  },
  {
    // Cengel's own answer (0.27 Ra^1/4: Nu 15.9, h 2.97) uses another correlation; the
    // contract prescribes 0.52 Ra^1/5 (Incropera 7th ed. Eq. 9.32). Hand computation
    // with Cengel's properties at 60 °C: Ra 1.195e7 on L = A/P = 0.15 m.
    label: "0.6 m square plate at 90 °C facing down in 30 °C air (stable side)",
    source: "Cengel & Ghajar, Example 9-2 (c) properties and Ra (from memory) with Incropera 7th ed. Eq. 9.32: Nu 13.54, h 2.53 W/m²K",
    request: { kind: "plate_natural", T_surface_C: 90, T_air_C: 30, tilt_deg: 180, length_m: 0.15 },
    expect: { Ra: 1.195e7, Nu: 13.54, h_W_m2K: 2.53 },
    tol: 0.03,
  },
];

describe("textbook worked examples", () => {
  test.each(examples)("$label — $source", (ex) => {
    const r = run(ex.request);
    for (const [key, value] of Object.entries(ex.expect)) expectClose(num(r, key), value, ex.tol, 0, key);
    if (ex.warning !== undefined) expect(hasWarning(r, ex.warning), JSON.stringify(r.warnings)).toBe(true);
  });
});

describe("fully developed laminar duct flow, Incropera 6th ed. Table 8.1 (from memory)", () => {
  // Table 8.1 rounds Nu to 0.01 and f·Re to integers; ±1.5 % covers that rounding
  // and the Shah & London polynomial the contract prescribes.
  const table = [
    { ba: 1.43, Nu: 3.08, fRe: 59 },
    { ba: 3.0, Nu: 3.96, fRe: 69 },
    { ba: 4.0, Nu: 4.44, fRe: 73 },
    { ba: 8.0, Nu: 5.6, fRe: 82 },
  ];
  test.each(table)("rectangular b/a = $ba: Nu_T $Nu, f·Re $fRe", ({ ba, Nu, fRe }) => {
    const a = 0.2;
    const b = ba * a;
    const Dh = (2 * a * b) / (a + b);
    const flow = ((1000 * 1.5e-5) / Dh) * a * b; // Re ≈ 1000
    const r = run({ kind: "duct_internal", shape: "rect", width_m: b, height_m: a, flow_m3_s: flow, T_air_C: 20 });
    expect(r.regime).toBe("laminar");
    expectClose(num(r, "Nu"), Nu, 0.015, 0, "Nu");
    expectClose(num(r, "f_darcy") * num(r, "Re"), fRe, 0.015, 0, "f·Re");
  });

  test("round duct: Nu_D 3.66 (constant wall temperature), f·Re 64 (Incropera Eqs. 8.55, 8.19)", () => {
    const r = run({ kind: "duct_internal", shape: "round", diameter_m: 0.2, flow_m3_s: 0.002, T_air_C: 20 });
    expect(r.regime).toBe("laminar");
    expectClose(num(r, "Nu"), 3.66, 0.002, 0, "Nu");
    expectClose(num(r, "f_darcy") * num(r, "Re"), 64, 1e-4, 0, "f·Re");
  });
});

describe("flat-plate relations (Incropera 6th ed. Eqs. 7.23, 7.30, 7.36; from memory)", () => {
  const plate = { kind: "plate_forced", T_surface_C: 40, T_air_C: 20, velocity_m_s: 3, length_m: 1 };
  test("laminar local h falls as x^-1/2: h_x(0.05 m) = 2·h_x(0.2 m)", () => {
    const near = num(run({ ...plate, x_m: 0.05 }), "h_x_W_m2K");
    const far = num(run({ ...plate, x_m: 0.2 }), "h_x_W_m2K");
    expectClose(near / far, 2, 1e-3);
  });
  test("laminar average over 0…L is twice the local value at L", () => {
    const r = run({ ...plate, x_m: 1 });
    expect(r.regime).toBe("laminar");
    expectClose(num(r, "h_W_m2K") / num(r, "h_x_W_m2K"), 2, 1e-3);
  });
  test("turbulent local h (tripped, Re_crit 0) falls as x^-1/5: h_x(1 m)/h_x(4 m) = 4^0.2", () => {
    const tripped = { ...plate, velocity_m_s: 10, length_m: 4, Re_crit: 0 };
    const r1 = run({ ...tripped, x_m: 1 });
    const r4 = run({ ...tripped, x_m: 4 });
    expect(r4.regime).toBe("turbulent");
    expectClose(num(r1, "h_x_W_m2K") / num(r4, "h_x_W_m2K"), 4 ** 0.2, 1e-3);
  });
});

describe("air properties, Incropera 6th ed. Table A.4 (from memory), at 100 kPa", () => {
  // Tolerances: ρ 1 % (real-gas effects at 200 K), cp 1 %, μ 2 %, ν 2.5 %, k 3 %,
  // α 3.5 %, Pr 3 % — the table's older data against Lemmon & Jacobsen (2004).
  const tol: Record<string, number> = {
    rho_kg_m3: 0.01, cp_J_kgK: 0.01, mu_Pa_s: 0.02, nu_m2_s: 0.025, k_W_mK: 0.03, alpha_m2_s: 0.035, Pr: 0.03,
  };
  const rows = [
    { T_K: 200, warn: true, v: { rho_kg_m3: 1.7458, cp_J_kgK: 1007, mu_Pa_s: 132.5e-7, nu_m2_s: 7.59e-6, k_W_mK: 18.1e-3, alpha_m2_s: 10.3e-6, Pr: 0.737 } },
    { T_K: 400, warn: false, v: { rho_kg_m3: 0.8711, cp_J_kgK: 1014, mu_Pa_s: 230.1e-7, nu_m2_s: 26.41e-6, k_W_mK: 33.8e-3, alpha_m2_s: 38.3e-6, Pr: 0.69 } },
    { T_K: 450, warn: true, v: { rho_kg_m3: 0.774, cp_J_kgK: 1021, mu_Pa_s: 250.7e-7, nu_m2_s: 32.39e-6, k_W_mK: 37.3e-3, alpha_m2_s: 47.2e-6, Pr: 0.686 } },
  ];
  test.each(rows)("T = $T_K K (out_of_range warning outside −50…150 °C: $warn)", ({ T_K, warn, v }) => {
    const r = run({ kind: "air_properties", T_C: T_K - 273.15, pressure_Pa: 100000 });
    for (const [key, value] of Object.entries(v)) expectClose(num(r, key), value, tol[key]!, 0, key);
    expect(hasWarning(r, "out_of_range"), JSON.stringify(r.warnings)).toBe(warn);
  });
});
