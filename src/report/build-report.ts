/**
 * The calculation report: a PDF (jsPDF + jspdf-autotable) of a draft or an issued revision, built
 * from the schedule with the engine's own results and workings. Runs in Node (the report job)
 * and in the browser alike.
 */
import { jsPDF } from "jspdf";
import { ductRunCase, scheduleResults, surfaceCase, working, type MethodUsed, type Working, type DesignCase } from "@/calc/index";
import { finishPages, Writer } from "./layout";
import { conventions, cover, designCases, methodStatement, zoneTotals } from "./sections";
import { ductTables, surfaceTables, warningsList, workingsAppendix } from "./rows";
import type { ReportInput } from "./types";

export interface BuiltReport {
  pdf: Uint8Array;
  pages: number;
  warnings: number;
}

/**
 * A jsPDF document without the Arabic-shaping and bidirectional-text passes, which run on every
 * text() call and cost a third of a large report's time: all report text is Latin-1 (pdfText), so
 * they have nothing to do. jsPDF subscribes a document to the plugin events when it is created,
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
    return new jsPDF({ unit: "mm", format: "a4", compress: true });
  } finally {
    api.events = all;
  }
}

export function buildReport(input: ReportInput, onProgress?: (done: number, total: number) => void): BuiltReport {
  const s = input.schedule;
  const results = input.designCases.map((dc) => scheduleResults(s, dc));
  // Workings of every row in every case, and the union of the methods they apply.
  const zones = new Map(s.zones.map((z) => [z.id, z]));
  const buildups = new Map(s.buildups.map((b) => [b.id, b]));
  const items: { label: string; dc: DesignCase; working: Working }[] = [];
  const methods = new Map<string, MethodUsed>();
  const total = input.designCases.length * (s.surfaces.length + s.ductRuns.length);
  for (const dc of input.designCases) {
    for (const row of s.surfaces) {
      const zone = zones.get(row.zone_id);
      const b = buildups.get(row.buildup_id);
      if (zone !== undefined && b !== undefined) items.push({ label: row.label, dc, working: working(surfaceCase(s.site, dc, zone, b, row)) });
      onProgress?.(items.length, total);
    }
    for (const row of s.ductRuns) {
      const zone = zones.get(row.zone_id);
      if (zone !== undefined) items.push({ label: row.label, dc, working: working(ductRunCase(s.site, dc, zone, row)) });
      onProgress?.(items.length, total);
    }
  }
  for (const it of items) for (const m of it.working.methods) methods.set(m.id, m);

  const doc = latinDocument();
  doc.setProperties({ title: `${input.meta.projectName} — calculation report`, creator: "Filmsheet" });
  const w = new Writer(doc);
  cover(w, input);
  w.newPage();
  designCases(w, input);
  methodStatement(w, [...methods.values()]);
  conventions(w);
  zoneTotals(w, input, results);
  surfaceTables(w, input, results);
  ductTables(w, input, results);
  const warnings = warningsList(w, input, results);
  workingsAppendix(w, input, items);
  const pages = finishPages(doc, input.meta);
  return { pdf: new Uint8Array(doc.output("arraybuffer")), pages, warnings };
}
