/** A stored time as people read it in a history or a thread: "2 Dec 2026, 14:05 UTC". */
export function when(iso: string | null): string {
  if (iso === null) return "—";
  const d = new Date(iso);
  return `${d.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" })}, ${d.toLocaleTimeString("en-GB", { hour: "2-digit", minute: "2-digit", timeZone: "UTC" })} UTC`;
}
