import type { Working } from "@/calc/index";

function show(v: unknown): string {
  if (typeof v === "number") {
    if (v === 0) return "0";
    const a = Math.abs(v);
    return a >= 1e6 || a < 1e-3 ? v.toExponential(4) : String(Number(v.toPrecision(5)));
  }
  if (v === null) return "—";
  return String(v);
}

/** The lines of a working, grouped by section in calculation order, each method linked to /methods. */
export function WorkingLines({ working }: { working: Working }) {
  const sections: { name: string; lines: Working["lines"] }[] = [];
  for (const l of working.lines) {
    const last = sections[sections.length - 1];
    if (last?.name === l.section) last.lines.push(l);
    else sections.push({ name: l.section, lines: [l] });
  }
  return (
    <div className="grid gap-4">
      {sections.map((s) => (
        <section key={s.name} aria-label={s.name}>
          <h3 className="mb-1 text-micro font-semibold uppercase tracking-[0.12em] text-muted">{s.name}</h3>
          <table className="w-full text-small">
            <tbody>
              {s.lines.map((l, i) => (
                <tr key={`${l.symbol}-${i}`} className="border-b border-line/60 align-top">
                  <td className="py-1 pr-3 text-muted">{l.label}</td>
                  <td className="py-1 pr-3 font-mono text-micro">{l.symbol}</td>
                  <td className="py-1 pr-3 text-right font-mono tabular-nums">
                    {show(l.value)} <span className="text-muted">{l.unit}</span>
                  </td>
                  <td className="py-1 text-micro text-muted">
                    {l.note}
                    {l.method !== undefined && (
                      <>
                        {l.note ? " · " : ""}
                        <a className="text-accent underline-offset-2 hover:underline" href={`/methods#${l.method}`}>
                          {l.method}
                        </a>
                      </>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      ))}
    </div>
  );
}
