import type { Working } from "@/calc/index";
import { EngineeringCaution } from "@/components/engineering-caution";
import { methodTitle, plainText, plainWord } from "@/report/plain-words";
import { SurfaceRowChecks } from "./row-checks";
import { LocalHChart, WindChart } from "./working-charts";
import { WorkingLines } from "./working-lines";

/**
 * A row's working as the engine computed it (src/calc/working): the lines in calculation order,
 * the methods applied with their sources and ranges, the warnings, and the charts. It renders the
 * engine's trace and never recomputes.
 */
export function WorkingView({ working, title }: { working: Working; title: string }) {
  const r = working.result;
  return (
    <article className="grid gap-6" aria-label={`Working of ${title}`}>
      <header>
        <h2 className="text-title font-semibold">{title}</h2>
        <p className="text-small text-muted">
          {r.ok ? (
            <>
              Method{" "}
              <a href={`/methods#${r.correlation}`} className="text-accent" title={`Method ${r.correlation}`}>
                {methodTitle(r.correlation)}
              </a>
              {typeof r.regime === "string" ? ` · regime: ${plainWord(r.regime)}` : ""}
            </>
          ) : r.error.code === "not_computed" ? (
            <span className="font-semibold">Not computed: {r.error.message}</span>
          ) : (
            <span className="text-danger">
              {r.error.field}: {r.error.message}
            </span>
          )}
        </p>
      </header>
      {r.ok && r.warnings.length > 0 && (
        <ul className="grid gap-1 rounded-panel border border-caution/40 bg-caution/10 p-3 text-small" aria-label="Warnings">
          {r.warnings.map((w, i) => (
            <li key={i}>
              <span className="font-semibold text-caution" title={w.code}>
                {plainWord(w.code)}:
              </span>{" "}
              {plainText(w.message)}
            </li>
          ))}
        </ul>
      )}
      {working.charts.h_vs_wind !== null && (
        <div className="grid gap-4 lg:grid-cols-2">
          <LocalHChart charts={working.charts} />
          <WindChart charts={working.charts} />
        </div>
      )}
      <SurfaceRowChecks working={working} />
      <WorkingLines working={working} />
      {working.methods.length > 0 && (
        <section aria-label="Methods applied">
          <h3 className="mb-2 text-micro font-semibold uppercase tracking-[0.12em] text-muted">Methods applied</h3>
          <dl className="grid gap-2 text-small">
            {working.methods.map((m) => (
              <div key={m.id} className="rounded-chip border border-line bg-surface p-2">
                <dt className="font-semibold" title={`Method ${m.id}`}>
                  {m.title}
                </dt>
                <dd className="font-mono text-micro">{m.equation}</dd>
                <dd className="text-micro text-muted">
                  Valid: {plainText(m.validity)}. Properties at: {m.evaluation}.
                </dd>
                <dd className="text-micro text-muted">{m.source}</dd>
              </div>
            ))}
          </dl>
        </section>
      )}
      <EngineeringCaution />
    </article>
  );
}
