"use client";

import { Link } from "@/components/shell/link";
import { useState } from "react";
import type { TSchedule } from "@/schemas/schedule";
import { ImportPanel } from "@/components/grid/import-panel";
import { Notices } from "@/components/schedule/notices";
import { useProject, useSchedule } from "@/components/schedule/schedule-context";
import { formatCount } from "@/units/format";

/**
 * Whether the schedule page shows the setting-up steps instead of the grid: no design case yet
 * (nothing can be computed), or no rows and nothing for a row to name (a zone, a build-up).
 */
export function needsSetup(s: Pick<TSchedule, "design_cases" | "zones" | "buildups" | "surfaces" | "duct_runs">): boolean {
  return s.design_cases.length === 0 || (s.surfaces.length + s.duct_runs.length === 0 && (s.zones.length === 0 || s.buildups.length === 0));
}

const secondary = "rounded-chip border border-line bg-surface px-3 py-1.5 text-small font-medium hover:bg-sunken";
const primary = "rounded-chip bg-accent px-3 py-1.5 text-small font-semibold text-accent-ink hover:opacity-90";

/** The schedule page of a project not yet set up: what to add first, in order, with links, and the import at once. */
export function ProjectSetup() {
  const s = useSchedule();
  const { canEdit, projectId } = useProject();
  const [importing, setImporting] = useState(false);
  const base = `/projects/${projectId}`;
  const rows = s.surfaces.length + s.duct_runs.length;
  const steps = [
    {
      href: `${base}/zones`,
      title: "Zones",
      count: s.zones.length,
      nouns: ["zone", "zones"],
      what: "Each row belongs to a zone; a zone's heating and cooling set points are the inside temperatures, and the totals are summed per zone.",
    },
    {
      href: `${base}/buildups`,
      title: "Build-ups",
      count: s.buildups.length,
      nouns: ["build-up", "build-ups"],
      what: "Each surface names a build-up: its layers (or a thermal resistance), absorptance and emissivity.",
    },
    {
      href: `${base}/design-cases`,
      title: "A design case",
      count: s.design_cases.length,
      nouns: ["design case", "design cases"],
      what: "Outdoor air, wind and sun for heating or cooling; the grid computes every row for the case you choose.",
    },
  ];
  return (
    <section aria-label="Set up the project" className="grid gap-4 rounded-panel border border-line bg-surface p-5 shadow-panel">
      <header>
        <h2 className="text-lead font-semibold">Set up the project</h2>
        <p className="max-w-prose text-small text-muted">
          {rows > 0
            ? `The schedule holds ${formatCount(s.surfaces.length)} surfaces and ${formatCount(s.duct_runs.length)} duct runs; they are computed once the project has a design case.`
            : "The schedule's rows name a zone and a build-up, and are computed for a design case: add these first, then the rows (in the grid or from a file)."}{" "}
          The site (altitude, terrain, wind law, default method) is under{" "}
          <Link href={`${base}/settings`} className="text-accent hover:underline">
            Site and units
          </Link>
          .
        </p>
      </header>
      <ol className="grid gap-3 md:grid-cols-3">
        {steps.map((step, i) => (
          <li key={step.href} className="grid content-start gap-2 rounded-chip border border-line bg-canvas p-3">
            <div className="flex items-baseline justify-between gap-2">
              <h3 className="text-body font-semibold">
                <span className="mr-1.5 text-muted tabular">{i + 1}.</span>
                {step.title}
              </h3>
              <span className={`text-micro font-medium ${step.count ? "text-ok" : "text-muted"}`}>{step.count ? `${step.count} ${step.nouns[step.count === 1 ? 0 : 1]}` : "none yet"}</span>
            </div>
            <p className="text-small text-muted">{step.what}</p>
            <p>
              <Link href={step.href} className="text-small font-medium text-accent hover:underline">
                {step.count ? `Review ${step.nouns[1]}` : `Add ${step.nouns[0] === "design case" ? "a design case" : step.nouns[1]}`} →
              </Link>
            </p>
          </li>
        ))}
      </ol>
      {canEdit ? (
        <div className="grid gap-3 border-t border-line pt-4">
          <div className="flex flex-wrap items-center gap-3">
            <button type="button" aria-expanded={importing} className={primary} onClick={() => setImporting((v) => !v)}>
              Import a schedule…
            </button>
            <a className={secondary} href={`/api/projects/${projectId}/export?format=xlsx&template=1`} download>
              Template workbook (XLSX)
            </a>
            <p className="text-small text-muted">Rows are matched to zones and build-ups by name: those must exist first.</p>
          </div>
          <Notices />
          {importing ? <ImportPanel sheet="surfaces" onClose={() => setImporting(false)} /> : null}
        </div>
      ) : (
        <p className="text-small text-muted">A consultant of the firm sets the project up.</p>
      )}
    </section>
  );
}
