"use client";

import { useProject } from "./schedule-context";

/** What the last writes said: refusals (with every row and field named) and confirmations. */
export function Notices() {
  const { notices, dismiss } = useProject();
  if (notices.length === 0) return null;
  return (
    <div className="grid gap-2">
      {notices.map((n) => (
        <div
          key={n.id}
          role={n.tone === "error" ? "alert" : "status"}
          className={`flex items-start justify-between gap-3 rounded-chip border px-3 py-2 text-small ${n.tone === "error" ? "border-danger/40 bg-danger/10 text-danger" : "border-ok/40 bg-ok/10 text-ok"}`}
        >
          <div>
            <p className="font-medium">{n.message}</p>
            {n.lines?.length ? (
              <ul className="mt-1 list-disc pl-5 text-ink">
                {n.lines.slice(0, 12).map((l, i) => (
                  <li key={i}>{l}</li>
                ))}
                {n.lines.length > 12 ? <li>… and {n.lines.length - 12} more</li> : null}
              </ul>
            ) : null}
          </div>
          <button type="button" onClick={() => dismiss(n.id)} className="shrink-0 rounded-chip px-1.5 text-muted hover:bg-sunken" aria-label="Dismiss">
            ✕
          </button>
        </div>
      ))}
    </div>
  );
}
