// The report's v2 results as a reader gets them (text read back with pdfjs-dist): zone totals with
// distribution on its own line and the exclusions, the h_o and Q bands with the method-sensitive
// mark, the "Spread between methods" list, and inside-surface risks among the warnings.
import { describe, expect, test } from "vitest";
import { exclusionsSentence, scheduleResults, type Schedule } from "../../src/calc/index";
import { buildReport } from "../../src/report/build-report";
import { factorCell } from "../../src/report/checks";
import { cell } from "../../src/report/format";
import { pdfText } from "../../src/report/pdf-text";
import type { ReportMeta } from "../../src/report/types";
import { pdfPages } from "../support/pdf-text";
import { SAMPLE_CASES, sampleSchedule } from "../support/sample-schedule";

const meta: ReportMeta = {
  projectName: "Larchfield Community Library extension", projectReference: "TS-2417", siteDescription: "Larchfield; suburban; 85 m",
  firmName: "Tarnbrook & Sill Building Services", author: "Mina Okafor", checker: null, date: "2026-12-04",
  status: "draft", revision: null, unitSystem: "SI", watermark: true,
};

/** The sample schedule with rows that exercise every v2 result: a sunny roof, a single-skin panel, a duct inside its zone. */
function v2Schedule(): Schedule {
  const s = sampleSchedule(8, 2);
  s.buildups.push(
    { id: "b-sunroof", name: "Sunny roof", layers: [], R_direct_m2K_W: 2.5, absorptance: 0.6, emissivity: 0.9 },
    { id: "b-skin", name: "Single-skin panel", layers: [], R_direct_m2K_W: 0.01, absorptance: 0.5, emissivity: 0.9 },
  );
  const base = { area_m2: 20, azimuth_deg: 180, height_m: 6, length_m: 8, panel_height_m: 4, method: null, absorptance: null, emissivity: null };
  s.surfaces.push(
    { ...base, id: "s-roof", zone_id: "z-read", buildup_id: "b-sunroof", label: "V2 sunny flat roof", tilt_deg: 0 },
    { ...base, id: "s-skin", zone_id: "z-read", buildup_id: "b-skin", label: "V2 single-skin panel", tilt_deg: 90 },
  );
  s.ductRuns.push({ ...s.ductRuns[1]!, id: "d-in", label: "V2 duct inside its zone", in_served_zone: true });
  return s;
}

describe("report: v2 results", { timeout: 60_000 }, () => {
  const schedule = v2Schedule();
  const report = buildReport({ meta, schedule, designCases: SAMPLE_CASES });
  const results = SAMPLE_CASES.map((dc) => scheduleResults(schedule, dc));
  const text = pdfPages(report.pdf).then((p) => p.join(" "));

  test("the fixture has what the report must show (computed by the engine, not assumed)", () => {
    const summer = results[1]!;
    expect(summer.surfaces.find((r) => r.row_id === "s-roof")!.spread!.sensitive).toBe(true);
    expect(results[0]!.surfaces.find((r) => r.row_id === "s-skin")!.inside!.mould_risk).toBe(true);
    expect(results[0]!.zones.some((z) => z.ducts_in_zone_W !== 0)).toBe(true);
  });

  test("zone totals list distribution on its own line, the ducts inside their zone for reference, and the exclusions", async () => {
    const t = await text;
    // Units in the headings, bare numbers by the heat flow's rule in the cells.
    for (const h of ["Fabric loss (W)", "Distribution loss (W)", "Fabric gain (W)", "Distribution gain (W)"]) expect(t).toContain(h);
    for (const r of results) {
      for (const z of r.zones) {
        expect(t).toContain(`${z.name} ${cell(z.floor_area_m2, "m²")} ${cell(z.surfaces_loss_W, "W")} ${cell(z.ducts_loss_W, "W")}`);
      }
    }
    expect(t).toContain("Ducts inside the zone they serve, for reference, not in the totals");
    // The sentence wraps over lines: compare its words.
    const words = (x: string) => x.replace(/\s+/g, " ").trim();
    expect(words(t)).toContain(words(pdfText(exclusionsSentence())).slice(0, 60));
    expect(t).toContain("thermal bridges");
    expect(t).toContain("solar gain through glazing");
  });

  test("surface tables carry the h_o and Q bands, the method-sensitive mark, T_si, f_Rsi and the inside verdict", async () => {
    const t = await text;
    expect(t).toContain("h_o (W/m²K), band");
    expect(t).toContain("Heat loss, + out (W), band");
    expect(t).toContain("Method-sensitive");
    const roof = results[1]!.surfaces.find((r) => r.row_id === "s-roof")!;
    expect(t).toContain(`YES ${Math.round(roof.spread!.Q_spread_ratio! * 100)} %`);
    expect(t).toContain(`${cell(roof.spread!.h_o_min_W_m2K, "W/m²K")} to ${cell(roof.spread!.h_o_max_W_m2K, "W/m²K")}`);
    expect(t).toContain(`${cell(roof.spread!.Q_min_W, "W")} to ${cell(roof.spread!.Q_max_W, "W")}`);
    const skin = results[0]!.surfaces.find((r) => r.row_id === "s-skin")!;
    expect(t).toContain(`${cell(skin.inside!.T_si_C, "°C")} ${factorCell(skin.inside!.f_Rsi)} / ${factorCell(skin.inside!.f_Rsi_min)}`);
    expect(t).toMatch(/MOULD|CONDENSATION/);
  });

  test("the spread section lists each case's method-sensitive rows, and only those", async () => {
    const p = await pdfPages(report.pdf);
    const start = p.findIndex((x) => x.includes("Spread between methods") && x.includes("7 Spread between methods"));
    expect(start).toBeGreaterThan(0);
    const section = p.slice(start).join(" ");
    const body = section.slice(section.indexOf("7 Spread between methods"), section.indexOf("8 Warnings"));
    expect(body).toContain("V2 sunny flat roof");
    const insensitive = results.flatMap((r) => r.surfaces).filter((r) => r.spread && !r.spread.sensitive).map((r) => r.row_id);
    const never = schedule.surfaces.filter((s) => insensitive.includes(s.id) && !results.some((r) => r.surfaces.find((x) => x.row_id === s.id)?.spread?.sensitive));
    for (const s of never) expect(body).not.toContain(s.label);
  });

  test("inside-surface risks are listed with the warnings", async () => {
    const t = await text;
    const warnings = t.slice(t.indexOf("8 Warnings"));
    // In words, not the engine's code.
    expect(warnings).toMatch(/Inside surface: (mould|condensation) risk/);
    expect(warnings).not.toMatch(/inside_(mould|condensation)_risk/);
    expect(warnings).toContain("V2 single-skin panel");
    expect(warnings).toContain("ISO 13788");
  });
});
