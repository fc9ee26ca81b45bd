// The report's totals by orientation, element type and build-up and each zone's peak case, read
// back from the PDF's text: the lines, the peak cases named (the colder heating case and the hotter,
// sunnier cooling case: physics, not the code), the totals equal to the zone totals, the row left out.
import { describe, expect, test } from "vitest";
import { scheduleResults, type DesignCase } from "../../src/calc/index";
import { buildReport } from "../../src/report/build-report";
import { cell } from "../../src/report/format";
import type { ReportMeta } from "../../src/report/types";
import { pdfPages } from "../support/pdf-text";
import { SAMPLE_CASES, sampleSchedule } from "../support/sample-schedule";

const meta: ReportMeta = {
  projectName: "Larchfield Community Library extension", projectReference: "TS-2417", siteDescription: "Larchfield; suburban; 85 m",
  firmName: "Tarnbrook & Sill Building Services", author: "Mina Okafor", checker: null, date: "2026-12-04", status: "draft", revision: null, unitSystem: "SI", watermark: true,
};

const cold = SAMPLE_CASES[0]!;
const sunny = SAMPLE_CASES[1]!;
const cases: DesignCase[] = [
  { ...cold, id: "dc-mild", name: "Mild wet winter day", T_outdoor_C: 8, cloud_cover: 1 },
  cold,
  { ...sunny, id: "dc-dull", name: "Dull warm summer day", T_outdoor_C: 25, solar_W_m2: {}, cloud_cover: 1 },
  sunny,
];

describe("report: totals by orientation, element and build-up, and the peak cases", { timeout: 60_000 }, () => {
  const schedule = sampleSchedule(21, 4);
  schedule.surfaces.push({ ...schedule.surfaces[0]!, id: "s-slab", label: "S-099 Ground slab", tilt_deg: 180, exposed_to: "ground" });
  const report = buildReport({ meta, schedule, designCases: cases });

  test("section 4.1 lists the lines with every case, and their totals are the zone totals", async () => {
    const pages = await pdfPages(report.pdf);
    const start = pages.findIndex((p) => p.includes("4.1 Totals by orientation, element type and build-up"));
    expect(start).toBeGreaterThan(0);
    const text = pages.slice(start, start + 3).join(" ");
    for (const s of ["By orientation", "By element type", "By build-up", "Facing up (roofs)", "Walls", "Roofs", "Ducts (distribution)", "Brick cavity wall", "Warm flat roof", "Spandrel panel", "Loss (W)", "Gain (W)"]) {
      expect(text, s).toContain(s);
    }
    for (const dc of cases) expect(text).toContain(`${dc.name} (${dc.kind})`);
    // The element lines' total of each case is every zone's heat loss and gain, from the zone totals.
    for (const dc of cases) {
      const r = scheduleResults(schedule, dc);
      expect(text).toContain(cell(r.zones.reduce((a, z) => a + z.loss_W, 0), "W"));
      expect(text).toContain(cell(r.zones.reduce((a, z) => a + z.gain_W, 0), "W"));
    }
    expect(text).toContain("Every case: Not in these totals: 1 row not computed (over ground). S-099 Ground slab.");
    expect(text).not.toMatch(/not_computed|in_zone|loss_W/);
  });

  test("section 4.2 names each zone's peak heating and cooling case", async () => {
    const text = (await pdfPages(report.pdf)).join(" ");
    const at = text.indexOf("4.2 Peak case of each zone");
    expect(at).toBeGreaterThan(0);
    const table = text.slice(at, text.indexOf("5 External surfaces", at));
    for (const z of schedule.zones) {
      expect(table).toMatch(new RegExp(`${z.name} ${cold.name} [\\d,]+ ${sunny.name} [\\d,]+`));
    }
    expect(table).not.toContain("Mild wet winter day");
    expect(table).not.toContain("Dull warm summer day");
  });
});
