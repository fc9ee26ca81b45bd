"use client";

import { BREAKDOWN_RULES, leftOutSentence, type BreakdownLine, type CaseBreakdowns, type ZonePeak } from "@/calc/index";
import { formatQuantity } from "@/units/format";
import { unitLabel, type UnitSystem } from "@/units/units";

/**
 * The totals people ask for beside the zone totals, for the chosen design case: by orientation,
 * by element type and by build-up (src/calc/schedule/breakdowns.ts), with what no line holds
 * counted and the rules that sort rows into lines.
 */
export function CaseBreakdownTables({ b, system }: { b: CaseBreakdowns; system: UnitSystem }) {
  const tables: [string, string, BreakdownLine[], string][] = [
    ["orientation", "Orientation", b.orientation, "Surfaces to outside air: add up to the fabric loss and gain"],
    ["element", "Element", b.element, "Surfaces and distribution ducts: add up to the zones' heat loss and gain"],
    ["buildup", "Build-up", b.buildup, "Surfaces to outside air: add up to the fabric loss and gain"],
  ];
  return (
    <div className="grid gap-3">
      <div className="grid content-start items-start gap-4 lg:grid-cols-3 2xl:grid-cols-1">
        {tables.map(([key, title, lines, note]) => (
          <LinesTable key={key} testId={`breakdown-${key}`} title={title} lines={lines} note={note} system={system} />
        ))}
      </div>
      <p className="text-micro text-muted" data-testid="breakdown-left-out">
        {leftOutSentence(b.left_out)}
        {b.left_out.length > 0 ? ` (${b.left_out.map((l) => l.label).join(", ")})` : ""}
      </p>
      <details className="text-micro text-muted">
        <summary className="cursor-pointer">How rows are sorted and signed</summary>
        <ul className="mt-1 list-disc space-y-1 pl-4">
          {BREAKDOWN_RULES.map((r) => (
            <li key={r}>{r}</li>
          ))}
        </ul>
      </details>
    </div>
  );
}

function LinesTable({ testId, title, lines, note, system }: { testId: string; title: string; lines: BreakdownLine[]; note: string; system: UnitSystem }) {
  const p = (v: number) => formatQuantity("power", v, system, 0);
  const a = (v: number | null) => (v === null ? "—" : formatQuantity("area", v, system, 1));
  const sum = lines.reduce((s, l) => ({ loss: s.loss + l.loss_W, gain: s.gain + l.gain_W }), { loss: 0, gain: 0 });
  return (
    <table className="w-full text-small" aria-label={`Totals by ${title.toLowerCase()}`} data-testid={testId}>
      <caption className="pb-1 text-left text-micro text-muted" title={note}>
        <span className="font-semibold text-ink">By {title.toLowerCase()}</span> · {note}
      </caption>
      <thead className="whitespace-nowrap text-micro text-muted">
        <tr>
          <th className="py-1 text-left font-medium">{title}</th>
          <th className="py-1 pl-2 text-right font-medium">Area {unitLabel("area", system)}</th>
          <th className="py-1 pl-2 text-right font-medium">Loss {unitLabel("power", system)}</th>
          <th className="py-1 pl-2 text-right font-medium">Gain {unitLabel("power", system)}</th>
        </tr>
      </thead>
      <tbody>
        {lines.map((l) => (
          <tr key={l.key} className="border-t border-line" data-line={l.key}>
            <th scope="row" className="py-0.5 pr-2 text-left font-normal" title={`${l.rows} row${l.rows === 1 ? "" : "s"} in these totals`}>
              {l.label}
            </th>
            <td className="py-0.5 text-right text-muted">{a(l.area_m2)}</td>
            <td className="py-0.5 text-right text-frost" data-total="loss">{p(l.loss_W)}</td>
            <td className="py-0.5 text-right text-heat" data-total="gain">{p(l.gain_W)}</td>
          </tr>
        ))}
        <tr className="border-t-2 border-line font-semibold">
          <th scope="row" className="py-0.5 text-left">Total</th>
          <td />
          <td className="py-0.5 text-right text-frost">{p(sum.loss)}</td>
          <td className="py-0.5 text-right text-heat">{p(sum.gain)}</td>
        </tr>
      </tbody>
    </table>
  );
}

/** Each zone's peak heating case (largest heat loss) and peak cooling case (largest heat gain), named. */
export function ZonePeaks({ peaks, system }: { peaks: ZonePeak[]; system: UnitSystem }) {
  const W = unitLabel("power", system);
  const p = (v: number) => formatQuantity("power", v, system, 0);
  return (
    <table className="mt-3 w-full text-small" aria-label="Peak case of each zone" data-testid="zone-peaks">
      <thead className="text-micro text-muted">
        <tr>
          <th className="py-1 text-left font-medium">Zone</th>
          <th className="py-1 text-left font-medium">Peak heating: largest loss</th>
          <th className="py-1 text-left font-medium">Peak cooling: largest gain</th>
        </tr>
      </thead>
      <tbody>
        {peaks.map((z) => (
          <tr key={z.zone_id} className="border-t border-line align-top" data-zone={z.name}>
            <th scope="row" className="py-1 pr-2 text-left font-medium">{z.name}</th>
            <td className="py-1 pr-2" data-peak="heating">
              {z.heating ? (
                <>
                  {z.heating.name} <span className="whitespace-nowrap text-frost">{p(z.heating.W)} {W}</span>
                </>
              ) : (
                <span className="text-muted">no loss in any heating case</span>
              )}
            </td>
            <td className="py-1" data-peak="cooling">
              {z.cooling ? (
                <>
                  {z.cooling.name} <span className="whitespace-nowrap text-heat">{p(z.cooling.W)} {W}</span>
                </>
              ) : (
                <span className="text-muted">no gain in any cooling case</span>
              )}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
