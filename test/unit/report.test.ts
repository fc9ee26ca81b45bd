// The calculation report as a reader gets it: text extracted from the PDF with pdfjs-dist must
// carry the cover, every zone total and every row label, with the engine's own numbers.
import { describe, expect, test } from "vitest";
import { scheduleResults } from "../../src/calc/index";
import { buildReport, buildReportAsync, type ReportProgress } from "../../src/report/build-report";
import { num } from "../../src/report/format";
import type { ReportMeta } from "../../src/report/types";
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
        expect(text).toContain(`${num(z.loss_W)} W`);
        expect(text).toContain(`${num(z.gain_W)} W`);
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
});
