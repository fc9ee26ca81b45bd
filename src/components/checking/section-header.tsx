import type { ReactNode } from "react";

/** The heading of a section of a project: an h2 under the project's own h1 (its name). */
export function SectionHeader({ title, lead, children }: { title: string; lead?: ReactNode; children?: ReactNode }) {
  return (
    <header className="flex flex-wrap items-end justify-between gap-4">
      <div>
        <h2 className="text-title font-semibold">{title}</h2>
        {lead ? <p className="mt-1 max-w-prose text-small text-muted">{lead}</p> : null}
      </div>
      {children}
    </header>
  );
}
