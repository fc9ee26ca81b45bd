"use client";

import { Link } from "@/components/shell/link";
import { usePathname } from "next/navigation";
import { ProjectTitle } from "./project-title";
import { labelOf, METHOD_OPTIONS, TERRAIN_OPTIONS } from "@/schemas/schedule-fields";
import { DraftReportButton } from "@/components/reports/report-build";
import { useProject, useSchedule } from "@/components/schedule/schedule-context";
import { formatQuantity } from "@/units/format";
import { unitLabel } from "@/units/units";

const TABS = [
  { href: "", label: "Schedule" },
  { href: "/design-cases", label: "Design cases" },
  { href: "/zones", label: "Zones" },
  { href: "/buildups", label: "Build-ups" },
  { href: "/settings", label: "Site and units" },
  { href: "/check", label: "Check" },
  { href: "/revisions", label: "Revisions" },
  { href: "/history", label: "History" },
];

/** The project's name and site in one line, and its sections. */
export function ProjectHeader({ canReport }: { canReport: boolean }) {
  const s = useSchedule();
  const { system, canEdit } = useProject();
  const path = usePathname();
  const base = `/projects/${s.project.id}`;
  const p = s.project;
  return (
    <header className="grid gap-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <ProjectTitle reference={p.reference} name={p.name}>
          Site {formatQuantity("length", p.altitude_m, system, 0)} {unitLabel("length", system)} above sea level · {labelOf(TERRAIN_OPTIONS, p.terrain).toLowerCase()} · {p.wind_law} law · default method {labelOf(METHOD_OPTIONS, p.default_method)}
          {canEdit ? "" : " · read only"}
        </ProjectTitle>
        {canReport && <DraftReportButton projectId={p.id} />}
      </div>
      <nav aria-label="Project" className="flex gap-1 overflow-x-auto border-b border-line">
        {TABS.map((t) => {
          const href = `${base}${t.href}`;
          // A row's working page (…/surfaces/<id>, …/duct-runs/<id>) is part of the check.
          const inCheck = t.href === "/check" && /\/(surfaces|duct-runs)\//.test(path);
          const current = t.href === "" ? path === base : inCheck || path.startsWith(href);
          return (
            <Link key={t.href} href={href} aria-current={current ? "page" : undefined} className="-mb-px border-b-2 border-transparent px-3 py-2 text-small font-medium text-muted hover:text-ink aria-[current=page]:border-accent aria-[current=page]:text-ink">
              {t.label}
            </Link>
          );
        })}
      </nav>
    </header>
  );
}
