/**
 * The calculation report: a PDF (jsPDF + jspdf-autotable) of a draft or an issued revision, built
 * from the schedule with the engine's own results and workings. Runs in Node (the report job)
 * and in the browser alike.
 */
import { jsPDF } from "jspdf";
import { ductRunRowWorking, scheduleResults, surfaceRowWorking, type MethodUsed, type Working, type DesignCase } from "@/calc/index";
import { finishPages, Writer } from "./layout";
import { conventions, cover, designCases, methodIdentifiers, methodRefs, methodStatement, zoneTotals } from "./sections";
import { spreadSection } from "./checks";
import { breakdownSection } from "./breakdowns";
import { scheduleSummary } from "./summary";
import { ductTables, surfaceTables, warningsList, workingsAppendix } from "./rows";
import { useReportFont } from "./report-font";
import type { ReportInput } from "./types";

export interface BuiltReport {
  pdf: Uint8Array;
  pages: number;
  warnings: number;
}

/**
 * A jsPDF document without the Arabic-shaping and bidirectional-text passes, which run on every
 * text() call and cost a third of a large report's time: report text is left-to-right Latin, Greek
 * and mathematical symbols (pdfText), so they have nothing to do. jsPDF subscribes a document to the plugin events when it is created,
 * so the list is narrowed only around the constructor and other documents keep every pass.
 */
function latinDocument(): jsPDF {
  const api = (jsPDF as unknown as { API: { events: [string, (...a: unknown[]) => unknown][] } }).API;
  const all = api.events;
  const shaping = (e: [string, (...a: unknown[]) => unknown]) =>
    // jsPDF 4.2 registers one preProcessText handler, its Arabic parser (pinned in package.json).
    e[0] === "preProcessText" ||
    (e[0] === "postProcessText" && /isInputVisual/.test(String(e[1])));
  api.events = all.filter((e) => !shaping(e));
  try {
    const doc = new jsPDF({ unit: "mm", format: "a4", compress: true });
    useReportFont(doc);
    return doc;
  } finally {
    api.events = all;
  }
}

/** How far a build has got: a fraction of the whole and the part being written. */
export interface ReportProgress {
  fraction: number;
  stage: string;
}

// Shares of a large report's build time, measured on a 1,000-row, 3-case report (npm run
// bench:report): workings 14 %, sections and row tables 36 %, appendix 25 %, pages and output 25 %.
const SHARE = { workings: 0.14, tables: 0.36, appendix: 0.25 };

/**
 * The report built step by step: yields its progress every few dozen rows and returns the PDF.
 * buildReport runs it straight through; buildReportAsync lets other work run between steps.
 */
export function* reportSteps(input: ReportInput, every = 25): Generator<ReportProgress, BuiltReport> {
  const s = input.schedule;
  const results = input.designCases.map((dc) => scheduleResults(s, dc));
  // Workings of every row in every case, and the union of the methods they apply.
  const zones = new Map(s.zones.map((z) => [z.id, z]));
  const buildups = new Map(s.buildups.map((b) => [b.id, b]));
  const items: { label: string; dc: DesignCase; working: Working }[] = [];
  const methods = new Map<string, MethodUsed>();
  const total = Math.max(1, input.designCases.length * (s.surfaces.length + s.ductRuns.length));
  let done = 0;
  const computing = () => ({ fraction: (SHARE.workings * done) / total, stage: "Working through every row" });
  for (const [k, dc] of input.designCases.entries()) {
    for (const [i, row] of s.surfaces.entries()) {
      const zone = zones.get(row.zone_id);
      const b = buildups.get(row.buildup_id);
      // The spread and inside check come with the results above: not computed twice.
      if (zone !== undefined && b !== undefined) items.push({ label: row.label, dc, working: surfaceRowWorking(s.site, dc, zone, b, row, results[k]!.surfaces[i]) });
      if (++done % every === 0) yield computing();
    }
    for (const row of s.ductRuns) {
      const zone = zones.get(row.zone_id);
      if (zone !== undefined) items.push({ label: row.label, dc, working: ductRunRowWorking(s.site, dc, zone, row) });
      if (++done % every === 0) yield computing();
    }
  }
  for (const it of items) for (const m of it.working.methods) methods.set(m.id, m);

  yield { fraction: SHARE.workings, stage: "Writing the sections and row tables" };
  const doc = latinDocument();
  doc.setProperties({ title: `${input.meta.projectName} — calculation report`, creator: "Filmsheet" });
  const w = new Writer(doc);
  cover(w, input);
  w.newPage();
  designCases(w, input);
  methodStatement(w, [...methods.values()]);
  conventions(w);
  zoneTotals(w, input, results);
  breakdownSection(w, input, results);
  const tables = Math.max(1, 2 * results.length);
  let table = 0;
  const tabling = () => ({ fraction: SHARE.workings + (SHARE.tables * ++table) / tables, stage: "Writing the sections and row tables" });
  for (const _ of surfaceTables(w, input, results)) yield tabling();
  for (const _ of ductTables(w, input, results)) yield tabling();
  spreadSection(w, input, results, "7");
  const warnings = warningsList(w, input, results);
  scheduleSummary(w, input, results);
  const appendixStart = SHARE.workings + SHARE.tables;
  yield { fraction: appendixStart, stage: "Writing the appendix of workings" };
  for (const written of workingsAppendix(w, input, items, every, methodRefs([...methods.values()]))) {
    yield { fraction: appendixStart + (SHARE.appendix * written) / Math.max(1, items.length), stage: "Writing the appendix of workings" };
  }
  methodIdentifiers(w, [...methods.values()]);
  yield { fraction: appendixStart + SHARE.appendix, stage: "Numbering the pages" };
  const pages = finishPages(doc, input.meta);
  return { pdf: new Uint8Array(doc.output("arraybuffer")), pages, warnings };
}

/** The whole report in one go. */
export function buildReport(input: ReportInput): BuiltReport {
  const steps = reportSteps(input, Number.MAX_SAFE_INTEGER);
  for (;;) {
    const step = steps.next();
    if (step.done) return step.value;
  }
}

/**
 * The report built in steps, handing the event loop back between them (a server keeps answering
 * requests while a large report is written) and telling `onProgress` how far it has got.
 */
export async function buildReportAsync(input: ReportInput, onProgress?: (p: ReportProgress) => void | Promise<void>): Promise<BuiltReport> {
  const steps = reportSteps(input);
  for (;;) {
    const step = steps.next();
    if (step.done) {
      await onProgress?.({ fraction: 1, stage: "Done" });
      return step.value;
    }
    await onProgress?.(step.value);
    await new Promise<void>((resolve) => setImmediate(resolve));
  }
}
