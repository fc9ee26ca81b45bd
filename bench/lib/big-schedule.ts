// The large schedule the benchmarks build through the API: four zones, three build-ups, three
// design cases and as many surfaces and duct runs as asked, from a seeded generator so every run
// sends the same rows. Shared by bench:api and bench:browser.

/** Small deterministic generator (mulberry32), so every run sends the same schedule. */
function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), a | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
const r = rng(2417);
const pick = <T>(xs: readonly T[]): T => xs[Math.floor(r() * xs.length)]!;
export const between = (lo: number, hi: number, d = 2) => (lo + (hi - lo) * r()).toFixed(d);

export const ZONES = ["Hall", "Offices north", "Offices south", "Plant deck"];
export const BUILDUPS = [
  { name: "Rainscreen wall", layers: [{ material: "Mineral wool", thickness_m: 0.2, k_W_mK: 0.038 }], R_direct_m2K_W: null, absorptance: 0.55, emissivity: 0.9 },
  { name: "Flat roof", layers: [{ material: "PIR", thickness_m: 0.16, k_W_mK: 0.022 }], R_direct_m2K_W: null, absorptance: 0.85, emissivity: 0.9 },
  { name: "Spandrel", layers: [], R_direct_m2K_W: 2.2, absorptance: 0.8, emissivity: 0.84 },
];
export const CASES = [
  { name: "Winter, windy", kind: "heating", T_outdoor_C: -5, RH_outdoor_pct: 90, V_met_m_s: 11, wind_from_deg: 240, solar_W_m2: {} },
  { name: "Summer, sunny", kind: "cooling", T_outdoor_C: 28, RH_outdoor_pct: 45, V_met_m_s: 4, wind_from_deg: 200, solar_W_m2: { S: 350, W: 470, horizontal: 850 } },
  { name: "Summer, still", kind: "cooling", T_outdoor_C: 29, RH_outdoor_pct: 50, V_met_m_s: 0.5, wind_from_deg: 90, solar_W_m2: { W: 590, horizontal: 720 } },
];

export function surfacesCsv(n: number): string {
  const head = "Label,Zone,Build-up,Area (m²),Tilt (°),Azimuth (°),Centroid height (m),Length along the wind (m),Panel height (m),Method";
  const rows = Array.from({ length: n }, (_, i) => {
    const roof = r() < 0.2;
    return [`Panel ${i + 1}`, pick(ZONES), roof ? "Flat roof" : pick(["Rainscreen wall", "Spandrel"]), between(2, 60), roof ? 0 : pick([90, 90, 90, 70]), pick([0, 45, 90, 135, 180, 225, 270, 315]), between(0.5, 30, 1), between(1, 12, 1), between(0.8, 4, 1), pick(["", "", "", "ISO 6946 linear", "McAdams wind formula"])].join(",");
  });
  return [head, ...rows].join("\n");
}

export function ductsCsv(n: number): string {
  const head = "Label,Zone,Shape,Diameter (mm),Width (mm),Height (mm),Length (m),Airflow (m³/s),Entering air heating (°C),Entering air cooling (°C),Location,Surrounding air (°C),Elevation (m),Insulation (mm),Insulation conductivity (W/(m·K)),Jacket emissivity,Condensation margin (K)";
  const rows = Array.from({ length: n }, (_, i) => {
    const round = r() < 0.5;
    const outdoor = r() < 0.5;
    return [`Duct ${i + 1}`, pick(ZONES), round ? "Round" : "Rectangular", round ? pick([250, 315, 400, 500]) : "", round ? "" : pick([400, 600, 800]), round ? "" : pick([250, 300, 400]), between(4, 40, 1), between(0.2, 1.6), 32, 13, outdoor ? "Outdoors" : "Indoors", outdoor ? "" : between(16, 24, 1), outdoor ? between(4, 12, 1) : "", pick([0, 25, 50]), 0.035, pick([0.1, 0.9]), 1].join(",");
  });
  return [head, ...rows].join("\n");
}

type Call = (method: string, path: string, body?: unknown, type?: string) => Promise<any>; // eslint-disable-line @typescript-eslint/no-explicit-any

/** A new project with the zones, build-ups and design cases above; returns its id. */
export async function newProject(call: Call, ref: string): Promise<string> {
  const p = await call("POST", "/api/projects", { name: `Bench ${ref}`, reference: ref, altitude_m: 80, terrain: "suburban" });
  for (const c of CASES) await call("POST", `/api/projects/${p.id}/design-cases`, c);
  for (const z of ZONES) await call("POST", `/api/projects/${p.id}/zones`, { name: z, floor_area_m2: 400, T_heating_C: 21, T_cooling_C: 24, RH_inside_pct: 50 });
  for (const b of BUILDUPS) await call("POST", `/api/projects/${p.id}/buildups`, b);
  return p.id as string;
}

/** A project of `surfaces` + `ducts` rows, imported as CSV. */
export async function bigProject(call: Call, ref: string, surfaces = 4000, ducts = 1000): Promise<string> {
  const id = await newProject(call, ref);
  await call("POST", `/api/projects/${id}/import?sheet=surfaces`, surfacesCsv(surfaces), "text/csv");
  await call("POST", `/api/projects/${id}/import?sheet=duct_runs`, ductsCsv(ducts), "text/csv");
  return id;
}
