/**
 * The firm being worked in. People in several firms choose here (the choice is a cookie that
 * the server checks against their memberships); the project part arrives with project pages.
 */
export function ContextSwitcher({ firm, firms, switchFirm }: { firm?: { id: string; name: string }; firms: { id: string; name: string }[]; switchFirm: (form: FormData) => Promise<void> }) {
  if (!firm) {
    return (
      <span className="hidden text-small text-muted sm:inline" aria-label="Firm">
        Not signed in
      </span>
    );
  }
  if (firms.length < 2) {
    return (
      <span className="hidden min-w-0 truncate text-small font-medium sm:inline" aria-label="Firm">
        {firm.name}
      </span>
    );
  }
  return (
    <form action={switchFirm} className="hidden min-w-0 items-center gap-1 text-small sm:flex" aria-label="Firm">
      <select name="firmId" defaultValue={firm.id} className="max-w-56 truncate rounded-chip border border-line bg-surface px-2 py-1" aria-label="Current firm">
        {firms.map((f) => (
          <option key={f.id} value={f.id}>{f.name}</option>
        ))}
      </select>
      <button type="submit" className="rounded-chip px-2 py-1 text-muted hover:bg-sunken hover:text-ink">
        Switch
      </button>
    </form>
  );
}
