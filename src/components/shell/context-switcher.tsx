/**
 * Firm and project switcher. A placeholder until sign-in and projects exist: it shows where the
 * choice will live, disabled, so the header layout is settled now.
 */
export function ContextSwitcher() {
  return (
    <div className="hidden min-w-0 items-center gap-1 text-small sm:flex" aria-label="Firm and project">
      <button type="button" disabled title="Available after sign-in" className="flex min-w-0 items-center gap-1.5 rounded-chip px-2 py-1 text-muted disabled:cursor-not-allowed">
        <span className="truncate">No firm selected</span>
        <Chevron />
      </button>
      <span className="text-line" aria-hidden="true">
        /
      </span>
      <button type="button" disabled title="Available after sign-in" className="flex min-w-0 items-center gap-1.5 rounded-chip px-2 py-1 text-muted disabled:cursor-not-allowed">
        <span className="truncate">No project</span>
        <Chevron />
      </button>
    </div>
  );
}

function Chevron() {
  return (
    <svg viewBox="0 0 12 12" className="size-3 shrink-0" fill="none" stroke="currentColor" strokeWidth="1.5" aria-hidden="true">
      <path d="M3 4.5 6 7.5 9 4.5" />
    </svg>
  );
}
