import type { ReactNode } from "react";

/** The narrow card every sign-in page sits in. */
export function AuthCard({ title, lead, children, footer }: { title: string; lead?: ReactNode; children: ReactNode; footer?: ReactNode }) {
  return (
    <div className="mx-auto grid w-full max-w-md gap-5 py-4">
      <header>
        <h1 className="text-headline font-semibold">{title}</h1>
        {lead ? <p className="mt-1 text-muted">{lead}</p> : null}
      </header>
      <div className="grid gap-5 rounded-panel border border-line bg-surface p-6 shadow-panel">{children}</div>
      {footer ? <div className="text-small text-muted">{footer}</div> : null}
    </div>
  );
}
