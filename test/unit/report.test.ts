// The calculation report as a reader gets it: text extracted from the PDF with pdfjs-dist must
// carry the cover, every zone total and every row label, with the engine's own numbers.
import { describe, expect, test } from "vitest";
import { scheduleResults } from "../../src/calc/index";
import { buildReport, buildReportAsync, type ReportProgress } from "../../src/report/build-report";
import { METHODS } from "../../src/calc/registry";
import { cell } from "../../src/report/format";
import type { ReportMeta } from "../../src/report/types";
import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";
import { pdfPages } from "../support/pdf-text";
import { SAMPLE_CASES, sampleSchedule } from "../support/sample-schedule";

const meta: ReportMeta = {
  projectName: "Larchfield Community Library extension", projectReference: "TS-2417", siteDescription: "Larchfield; suburban; 85 m",
  firmName: "Tarnbrook & Sill Building Services", author: "Mina Okafor", checker: "Declan Rusk", date: "2026-12-02",
  status: "draft", revision: null, unitSystem: "SI", watermark: true,
};

const pages = pdfPages;

// Building several reports takes seconds on a busy two-core machine: more than the default 5 s.
describe("calculation report", { timeout: 60_000 }, () => {
  const schedule = sampleSchedule(24, 4);
  const draft = buildReport({ meta, schedule, designCases: SAMPLE_CASES });

  test("the cover names the project, firm, people, status and date", async () => {
    const [cover] = await pages(draft.pdf);
    for (const s of ["CALCULATION REPORT", meta.projectName, "TS-2417", meta.firmName, "Mina Okafor", "Declan Rusk", "Draft", "2026-12-02", "licensed engineer"]) {
      expect(cover).toContain(s);
    }
  });

  test("every zone total and every row label is in it, with the engine's numbers", async () => {
    const text = (await pages(draft.pdf)).join(" ");
    for (const dc of SAMPLE_CASES) {
      const r = scheduleResults(schedule, dc);
      expect(text).toContain(dc.name);
      for (const z of r.zones) {
        expect(text).toContain(cell(z.loss_W, "W"));
        expect(text).toContain(cell(z.gain_W, "W"));
      }
    }
    for (const row of [...schedule.surfaces, ...schedule.ductRuns]) expect(text).toContain(row.label);
    expect(text).toContain("°C"); // Latin-1 survives the text passes the report leaves out
  });

  test("method statement, conventions, warnings and workings appendix are there, page-numbered", async () => {
    const p = await pages(draft.pdf);
    const text = p.join(" ");
    for (const s of ["Method statement", "Churchill", "Assumptions and conventions", "Warnings", "Appendix A", "Workings"]) expect(text).toContain(s);
    expect(p[p.length - 1]).toContain(`page ${p.length} of ${p.length}`);
    expect(draft.pages).toBe(p.length);
  });

  test("a draft carries the watermark on every page; an issued revision of a paid firm does not", async () => {
    const p = await pages(draft.pdf);
    expect(p.every((t) => t.includes("NOT FOR ISSUE"))).toBe(true);
    const issued = buildReport({ meta: { ...meta, status: "issued", revision: "A", watermark: false }, schedule, designCases: SAMPLE_CASES });
    const q = await pages(issued.pdf);
    expect(q.some((t) => t.includes("NOT FOR ISSUE"))).toBe(false);
    expect(q[0]).toContain("Issued");
  });

  test("the page count grows with the rows", () => {
    const bigger = buildReport({ meta, schedule: sampleSchedule(96, 12), designCases: SAMPLE_CASES });
    expect(bigger.pages).toBeGreaterThan(draft.pages);
  });

  test("built in steps, it reports progress that only grows from 0 to 1, and makes the same report", async () => {
    const seen: ReportProgress[] = [];
    const stepped = await buildReportAsync({ meta, schedule, designCases: SAMPLE_CASES }, (p) => void seen.push(p));
    expect(stepped.pages).toBe(draft.pages);
    expect(stepped.warnings).toBe(draft.warnings);
    expect((await pages(stepped.pdf)).slice(1)).toEqual((await pages(draft.pdf)).slice(1));
    // 28 rows × 3 cases = 84 workings: a step every 25 while working through them and writing the appendix.
    expect(seen.length).toBeGreaterThan(8);
    for (let i = 1; i < seen.length; i++) expect(seen[i]!.fraction).toBeGreaterThanOrEqual(seen[i - 1]!.fraction);
    expect(seen[0]!.fraction).toBeLessThan(0.2);
    expect(seen.at(-1)).toEqual({ fraction: 1, stage: "Done" });
    expect(new Set(seen.map((p) => p.stage))).toEqual(new Set(["Working through every row", "Writing the sections and row tables", "Writing the appendix of workings", "Numbering the pages", "Done"]));
  });

  test("symbols print as themselves in the embedded font, never spelt out", async () => {
    const text = (await pages(draft.pdf)).join(" ");
    // From the method statement and the workings: εσ in h_r, 2π in the insulation of round ducts,
    // T⁴ of the sky, the minus sign of winter temperatures, × of engineering notation.
    for (const s of ["εσ", "2π", "⁴", "−4.0", "°C", "ρ", "μ", "×10", "m²", "m³/s", "W/m²K", "αG"]) expect(text).toContain(s);
    for (const s of ["epssigma", "2pik", "sqrt", "alphaG", "T_r^4", "e+1", "e-5"]) expect(text).not.toContain(s);
    // The font is embedded (a subset), not one of the standard fonts.
    expect(Buffer.from(draft.pdf).toString("latin1")).toMatch(/\/FontFile2/);
  });

  test("no identifier outside Appendix B; methods cited by reference and named in words", async () => {
    const p = await pages(draft.pdf);
    const b = p.findIndex((t) => t.includes("Appendix B Method identifiers"));
    expect(b).toBeGreaterThan(0);
    const body = p.slice(0, b).join(" ");
    for (const id of [...METHODS.map((m) => m.id), "out_of_range", "boundary_layer", "invalid_input"]) expect(body, id).not.toContain(id);
    expect(body).toContain("Outside the published range");
    expect(body).toMatch(/\[M\d+\]/);
    expect(p.slice(b).join(" ")).toContain("churchill-combined-plate");
  });

  test("units sit in the column headings, numbers alone in the cells", async () => {
    const text = (await pages(draft.pdf)).join(" ");
    for (const h of ["Area (m²)", "Heat loss, + out (W)", "Heat to the air, + warms (W)", "U (W/m²K)", "Heat loss (W)", "Outdoor (°C)"]) expect(text).toContain(h);
    const r = scheduleResults(schedule, SAMPLE_CASES[0]!);
    const z = r.zones.find((x) => x.loss_W > 1000)!;
    expect(cell(z.loss_W, "W")).toMatch(/^\d{1,3}(,\d{3})+$/); // thousands separators as on screen
    expect(text).not.toContain(`${cell(z.loss_W, "W")} W`);
  });

  test("the cover names who prepared and who checked; a draft after every row is accepted says so", async () => {
    const [cover] = await pages(draft.pdf);
    expect(cover).toMatch(/Prepared by Mina Okafor/);
    expect(cover).toMatch(/Checked by Declan Rusk/);
    expect(cover).not.toContain("Every row accepted");
    const accepted = buildReport({ meta: { ...meta, allAccepted: true }, schedule, designCases: SAMPLE_CASES });
    expect((await pages(accepted.pdf))[0]).toContain("Every row accepted; not yet issued as a revision");
    const unchecked = buildReport({ meta: { ...meta, checker: null }, schedule, designCases: SAMPLE_CASES });
    expect((await pages(unchecked.pdf))[0]).toContain("Checked by Not checked");
  });

  test("a schedule summary of one line per row, 40 rows to a landscape page, comes before the appendix", async () => {
    const big = buildReport({ meta, schedule: sampleSchedule(96, 12), designCases: SAMPLE_CASES });
    const p = await pages(big.pdf);
    const summary = p.map((t, i) => [t, i] as const).filter(([t]) => t.includes("Schedule summary"));
    expect(summary.map(([t]) => t.match(/Schedule summary: [a-z ]+(\(\d of \d\))?/)![0].trim())).toEqual([
      "Schedule summary: external surfaces (1 of 3)", "Schedule summary: external surfaces (2 of 3)", "Schedule summary: external surfaces (3 of 3)", "Schedule summary: duct runs",
    ]);
    const appendix = p.findIndex((t) => t.includes("Appendix A Workings"));
    expect(summary.every(([, i]) => i < appendix)).toBe(true);
    const doc = await getDocument({ data: big.pdf.slice(), isEvalSupported: false }).promise;
    const [, , w, h] = (await doc.getPage(summary[0]![1] + 1)).view;
    expect(w).toBeGreaterThan(h!); // landscape
    const [, , w2, h2] = (await doc.getPage(appendix + 1)).view;
    expect(w2).toBeLessThan(h2!); // the appendix is portrait again
  });
});
