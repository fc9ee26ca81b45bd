/**
 * The breakdowns (src/calc/schedule/breakdowns.ts) as rows of a spreadsheet: by orientation, by
 * element type and by build-up with every design case's heat loss and heat gain side by side,
 * each zone's peak cases, what no line holds in each case, and the rules. Numbers stay numbers
 * (a spreadsheet can sum them) in the project's units, named in the headings.
 */
import { BREAKDOWN_RULES, exclusionsSentence, leftOutSentence, type BreakdownLine, type Breakdowns, type CaseBreakdowns } from "@/calc/index";
import { toDisplay, unitLabel, type UnitSystem } from "@/units/units";

export type BreakdownCell = string | number | null;

export const BREAKDOWNS_SHEET = "Breakdowns";

/**
 * `shownCase` is the case the rest of the workbook shows: the rows and area of each line are
 * those in its totals (a row with an error in one case only would change them).
 */
export function breakdownsTable(b: Breakdowns, shownCase: string, system: UnitSystem): BreakdownCell[][] {
  const W = (v: number) => Number(toDisplay("power", v, system).toPrecision(6));
  const A = (v: number | null) => (v === null ? null : Number(toDisplay("area", v, system).toPrecision(6)));
  const p = unitLabel("power", system);
  const shown = b.cases.find((c) => c.design_case_id === shownCase) ?? b.cases[0];
  if (shown === undefined) return [["No design case: no breakdowns."]];
  const out: BreakdownCell[][] = [];
  const block = (title: string, what: string, pickLines: (c: CaseBreakdowns) => BreakdownLine[]) => {
    out.push([`By ${title} — ${what}`]);
    out.push([
      title[0]!.toUpperCase() + title.slice(1), `Rows in the totals — ${shown.name}`, `Area (${unitLabel("area", system)}) — ${shown.name}`,
      ...b.cases.flatMap((c) => [`Heat loss (${p}) — ${c.name}`, `Heat gain (${p}) — ${c.name}`]),
    ]);
    const keys = pickLines(shown);
    for (const [i, l] of keys.entries()) {
      // Every case lists the same lines in the same order (breakdowns.ts), so the i-th line matches.
      out.push([l.label, l.rows, A(l.area_m2), ...b.cases.flatMap((c) => [W(pickLines(c)[i]!.loss_W), W(pickLines(c)[i]!.gain_W)])]);
    }
    out.push([`Total`, null, null, ...b.cases.flatMap((c) => [W(sum(pickLines(c), "loss_W")), W(sum(pickLines(c), "gain_W"))])]);
    out.push([]);
  };
  block("orientation", "surfaces to outside air; adds up to the fabric loss and gain", (c) => c.orientation);
  block("element type", "surfaces and distribution ducts; adds up to the zones' heat loss and gain", (c) => c.element);
  block("build-up", "surfaces to outside air; adds up to the fabric loss and gain", (c) => c.buildup);

  out.push(["Peak case of each zone"]);
  out.push(["Zone", "Peak heating case (largest heat loss)", `Heat loss (${p})`, "Peak cooling case (largest heat gain)", `Heat gain (${p})`]);
  for (const z of b.peaks) {
    out.push([z.name, z.heating?.name ?? "no loss in any heating case", z.heating ? W(z.heating.W) : null, z.cooling?.name ?? "no gain in any cooling case", z.cooling ? W(z.cooling.W) : null]);
  }
  out.push([]);
  out.push(["Not in these totals"]);
  for (const c of b.cases) out.push([c.name, leftOutSentence(c.left_out), c.left_out.map((l) => `${l.label}: ${l.message}`).join("; ") || null]);
  out.push([]);
  for (const r of BREAKDOWN_RULES) out.push([r]);
  out.push([exclusionsSentence()]);
  return out;
}

function sum(lines: BreakdownLine[], key: "loss_W" | "gain_W"): number {
  return lines.reduce((a, l) => a + l[key], 0);
}
