import type { ReactNode } from "react";

/** A page heading with a panel explaining what will appear here. */
export function EmptyState({ title, lead, children }: { title: string; lead: string; children?: ReactNode }) {
  return (
    <div className="grid gap-6">
      <header>
        <h1 className="text-headline font-semibold">{title}</h1>
        <p className="mt-1 max-w-prose text-muted">{lead}</p>
      </header>
      <div className="rounded-panel border border-dashed border-line bg-surface p-8 text-small text-muted">{children}</div>
    </div>
  );
}
