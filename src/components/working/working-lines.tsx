import type { Working } from "@/calc/index";
import { METHOD_BY_ID } from "@/calc/registry";
import { plainText, plainWord } from "@/report/plain-words";
import { formatNumber } from "@/units/notation";

/** A working's value as people read it: numbers by their quantity's rule, identifiers as words. */
export function shownValue(v: unknown, unit: string): string {
  if (typeof v === "number") return formatNumber(v, unit);
  if (v === null || v === undefined) return "—";
  if (typeof v === "boolean") return v ? "yes" : "no";
  return plainWord(String(v));
}

/** A method cited on a line: its short title, linked to the method statement; the id in the tooltip. */
function MethodLink({ id }: { id: string }) {
  const title = METHOD_BY_ID[id]?.title ?? plainWord(id);
  return (
    <a className="text-accent underline-offset-2 hover:underline" href={`/methods#${id}`} title={`Method ${id}`}>
      {title}
    </a>
  );
}

/**
 * The lines of a working, grouped by section in calculation order, each method linked to /methods.
 * Every section's table has the same fixed columns, so values line up in one column down the page.
 */
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
          <table className="w-full table-fixed text-small">
            <colgroup>
              <col className="w-[32%]" />
              <col className="w-[9%]" />
              <col className="w-[13%]" />
              <col className="w-[8%]" />
              <col />
            </colgroup>
            <tbody>
              {s.lines.map((l, i) => (
                <tr key={`${l.symbol}-${i}`} className="border-b border-line/60 align-top">
                  <td className="py-1 pr-3 text-muted">{l.label}</td>
                  <td className="py-1 pr-3 font-mono text-micro">{l.symbol}</td>
                  <td className="py-1 pr-1 text-right font-mono tabular-nums" data-value>
                    {shownValue(l.value, l.unit)}
                  </td>
                  <td className="py-1 pr-3 text-muted">{l.unit}</td>
                  <td className="py-1 text-micro text-muted">
                    {l.note ? plainText(l.note) : ""}
                    {l.method !== undefined && (
                      <>
                        {l.note ? " · " : ""}
                        <MethodLink id={l.method} />
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
