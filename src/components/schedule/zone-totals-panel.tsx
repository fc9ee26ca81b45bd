"use client";

import dynamic from "next/dynamic";
import { useDeferredValue, useEffect, useMemo, useRef, useState } from "react";
import { useAfterPaint } from "./use-after-paint";
import { useNearViewport } from "./use-near-viewport";
import { caseBreakdowns, exclusionsSentence, scheduleBreakdowns, type ScheduleResults } from "@/calc/index";
import type { TDesignCase, TSchedule } from "@/schemas/schedule";
import { engineDesignCase, engineSchedule, resultsFor } from "@/schedule/engine-schedule";
import { formatQuantity } from "@/units/format";
import { toDisplay, unitLabel } from "@/units/units";
import { EngineeringCaution } from "@/components/engineering-caution";
import { panelCaseRows } from "./breakdown-rows";
import { useProject } from "./schedule-context";
import { CaseBreakdownTables, ZonePeaks } from "./zone-breakdowns";

// The chart's library (≈ 0.45 MB of script with its store) is fetched, run and drawn only when the
// chart comes into view (below the grid on a laptop, it starts off screen): loading the
// page does not compile it, and an edit does not redraw a chart nobody sees (≈ 0.2 s of a slow
// laptop's main thread at the first draw).
const ChartSpace = () => <div aria-hidden className="h-[284px]" />;
const ZoneTotalsChart = dynamic(() => import("@/components/charts/zone-totals-chart").then((m) => m.ZoneTotalsChart), { ssr: false, loading: ChartSpace });

/**
 * Zone totals beside the grid: heat loss and gain of each zone in the chosen design case, in W
 * and W/m² of floor area, split into fabric and distribution (ducts crossing unconditioned or
 * outdoor space), with the ducts inside the zone they serve shown for reference only; a bar chart
 * of them, each zone's governing figure in every case, and what every total leaves out; beneath,
 * the case's totals by orientation, element type and build-up, and each zone's peak cases.
 */
export function ZoneTotalsPanel({ schedule, results, resultsOf }: { schedule: TSchedule; results: ScheduleResults; resultsOf?: (dc: TDesignCase) => ScheduleResults | undefined }) {
  const { system } = useProject();
  const W = unitLabel("power", system);
  const Wm2 = unitLabel("heat_flux", system);
  const p = (v: number) => formatQuantity("power", v, system, 0);
  const f = (v: number | null) => (v === null ? "—" : formatQuantity("heat_flux", v, system, 1));
  // The other cases are computed only while their table is open, and after the grid has
  // repainted (deferred), so neither the first paint nor typing waits for them.
  const [open, setOpen] = useState(false);
  const later = useDeferredValue(schedule);
  const all = useMemo(() => {
    if (!open) return null;
    // resultsOf: the page's results of each case (kept current, computed in its worker) when it has
    // them; they belong to the newest schedule, so the breakdowns read that one too.
    const from = resultsOf ? schedule : later;
    const perCase = from.design_cases.map((dc) => ({ dc, results: resultsOf?.(dc) ?? resultsFor(from, dc) }));
    const b = scheduleBreakdowns(engineSchedule(from), from.design_cases.map(engineDesignCase), perCase.map((c) => panelCaseRows(c.results)));
    return { byCase: perCase.map(({ dc, results }) => ({ dc, zones: results.zones })), peaks: b.peaks };
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [later, open, resultsOf]);
  const byCase = all?.byCase ?? [];
  const current = schedule.design_cases.find((d) => d.id === results.design_case_id);
  // The breakdowns read every row (≈ 10 ms on 5,000), and the chart redraws through its own
  // store: both follow an edit after the frame that shows the row and its zone's totals has been
  // painted (useAfterPaint), so typing waits only for those. On the page's first render they are
  // not drawn at all (null at first), so loading the page — the grid's first rows — does not wait
  // for them.
  const shown = useMemo(() => ({ schedule, results }), [schedule, results]);
  const settled = useAfterPaint(shown);
  const breakdowns = useMemo(() => {
    const dc = settled?.schedule.design_cases.find((d) => d.id === settled.results.design_case_id);
    return settled && dc ? caseBreakdowns(engineSchedule(settled.schedule), engineDesignCase(dc), panelCaseRows(settled.results)) : null;
  }, [settled]);
  // The chart follows with the breakdowns (deferred): the table above is what an edit waits for.
  const bars = useMemo(
    () => settled?.results.zones.map((z) => ({ zone: z.name, loss: toDisplay("power", z.loss_W, system), gain: toDisplay("power", z.gain_W, system) })) ?? null,
    [settled, system],
  );
  // The chart is drawn when it comes on screen, and keeps the figures it last showed while
  // it is away (its own memo stops the redraw).
  const chartSlot = useRef<HTMLDivElement>(null);
  const chartNear = useNearViewport(chartSlot);
  const [chartBars, setChartBars] = useState<typeof bars>(null);
  useEffect(() => {
    if (chartNear && bars) setChartBars(bars);
  }, [chartNear, bars]);
  const total = results.zones.reduce((a, z) => ({ loss: a.loss + z.loss_W, gain: a.gain + z.gain_W }), { loss: 0, gain: 0 });

  return (
    <section aria-label="Zone totals" className="grid content-start gap-4 rounded-panel border border-line bg-surface p-4 shadow-panel">
      <header>
        <h2 className="text-lead font-semibold">Zone totals</h2>
        <p className="text-small text-muted">{current?.name}</p>
      </header>
      <div className="grid content-start gap-4 lg:grid-cols-2 lg:gap-8 2xl:grid-cols-1 2xl:gap-4">
        <div className="grid content-start gap-2">
          <table className="w-full text-small" aria-label="Zone totals for the design case">
            <thead className="text-micro text-muted">
              <tr>
                <th className="py-1 text-left font-medium">Zone</th>
                <th className="py-1 text-right font-medium">Loss {W}</th>
                <th className="py-1 text-right font-medium">{Wm2}</th>
                <th className="py-1 text-right font-medium">Gain {W}</th>
                <th className="py-1 text-right font-medium">{Wm2}</th>
              </tr>
            </thead>
            {results.zones.map((z) => (
              <tbody key={z.zone_id} className="border-t border-line">
                <tr data-zone={z.name}>
                  <th scope="row" className="pt-1 pr-2 text-left font-medium">
                    {z.name}
                  </th>
                  <td className="pt-1 text-right text-frost" data-total="loss">{p(z.loss_W)}</td>
                  <td className="pt-1 text-right text-muted">{f(z.loss_W_m2)}</td>
                  <td className="pt-1 text-right text-heat" data-total="gain">{p(z.gain_W)}</td>
                  <td className="pt-1 text-right text-muted">{f(z.gain_W_m2)}</td>
                </tr>
                <tr className="text-micro text-muted" data-line="fabric" data-zone-line={z.name}>
                  <th scope="row" className="pl-3 text-left font-normal">fabric</th>
                  <td className="text-right">{p(z.surfaces_loss_W)}</td>
                  <td />
                  <td className="text-right">{p(z.surfaces_gain_W)}</td>
                  <td />
                </tr>
                <tr className="text-micro text-muted" data-line="distribution" data-zone-line={z.name}>
                  <th scope="row" className="pl-3 text-left font-normal" title="Duct runs crossing unconditioned or outdoor space">
                    distribution
                  </th>
                  <td className="text-right" data-total="distribution-loss">{p(z.ducts_loss_W)}</td>
                  <td />
                  <td className="text-right" data-total="distribution-gain">{p(z.ducts_gain_W)}</td>
                  <td />
                </tr>
                {z.ducts_in_zone_W !== 0 ? (
                  <tr className="text-micro italic text-muted" data-line="in-zone">
                    <td colSpan={5} className="pb-1 pl-3">
                      Ducts inside the zone they serve: {p(z.ducts_in_zone_W)} {W} {z.ducts_in_zone_W >= 0 ? "to" : "from"} the zone, for reference, not in totals
                    </td>
                  </tr>
                ) : null}
              </tbody>
            ))}
            <tbody>
              <tr className="border-t-2 border-line font-semibold">
                <th scope="row" className="py-1 text-left">All zones</th>
                <td className="py-1 text-right text-frost">{p(total.loss)}</td>
                <td />
                <td className="py-1 text-right text-heat">{p(total.gain)}</td>
                <td />
              </tr>
            </tbody>
          </table>
          <p className="text-micro text-muted" data-testid="totals-exclusions">
            Fabric: surfaces to outside air. Distribution: duct runs crossing unconditioned or outdoor space. {exclusionsSentence()}
          </p>
        </div>
        <div ref={chartSlot} className="min-w-0">
          {chartBars ? <ZoneTotalsChart data={chartBars} unit={W} /> : <ChartSpace />}
        </div>
      </div>
      {breakdowns ? (
        <details open className="text-small" data-testid="breakdowns">
          <summary className="cursor-pointer font-medium">By orientation, element and build-up</summary>
          <div className="mt-2">
            <CaseBreakdownTables b={breakdowns} system={system} />
          </div>
        </details>
      ) : null}
      <details className="text-small" onToggle={(e) => setOpen(e.currentTarget.open)} data-testid="every-case">
        <summary className="cursor-pointer font-medium">Every design case and each zone&apos;s peak case</summary>
        <table className="mt-2 w-full" aria-label="Zone totals in every design case">
          <thead className="text-micro text-muted">
            <tr>
              <th className="py-1 text-left font-medium">Zone</th>
              {byCase.map(({ dc }) => (
                <th key={dc.id} className="py-1 text-right font-medium" title={dc.name}>
                  {dc.kind === "heating" ? "Loss" : "Gain"} · {dc.name.split(",")[0]}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {schedule.zones.map((zone) => (
              <tr key={zone.id} className="border-t border-line">
                <th scope="row" className="py-1 pr-2 text-left font-medium">{zone.name}</th>
                {byCase.map(({ dc, zones }) => {
                  const z = zones.find((x) => x.zone_id === zone.id);
                  return (
                    <td key={dc.id} className={`py-1 text-right ${dc.kind === "heating" ? "text-frost" : "text-heat"}`}>
                      {z ? p(dc.kind === "heating" ? z.loss_W : z.gain_W) : "—"}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
        {all ? <ZonePeaks peaks={all.peaks} system={system} /> : null}
      </details>
      <EngineeringCaution className="border-t border-line pt-3 text-micro" />
    </section>
  );
}
