import type { ReactNode } from "react";

/** A titled surface for one task on a page (a form, a table). */
export function Panel({ title, lead, children, actions }: { title: string; lead?: ReactNode; children: ReactNode; actions?: ReactNode }) {
  return (
    <section className="rounded-panel border border-line bg-surface shadow-panel" aria-label={title}>
      <header className="flex flex-wrap items-start justify-between gap-3 border-b border-line px-5 py-3">
        <div>
          <h2 className="text-lead font-semibold">{title}</h2>
          {lead ? <p className="text-small text-muted">{lead}</p> : null}
        </div>
        {actions}
      </header>
      <div className="px-5 py-4">{children}</div>
    </section>
  );
}

/** The heading of a signed-in page. */
export function PageHeader({ title, lead, children }: { title: string; lead?: ReactNode; children?: ReactNode }) {
  return (
    <header className="flex flex-wrap items-end justify-between gap-4">
      <div>
        <h1 className="text-headline font-semibold">{title}</h1>
        {lead ? <p className="mt-1 max-w-prose text-muted">{lead}</p> : null}
      </div>
      {children}
    </header>
  );
}
