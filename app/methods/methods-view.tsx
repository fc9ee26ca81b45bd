import { EngineeringCaution } from "@/components/engineering-caution";
import { CONVENTIONS } from "@/calc/conventions";
import { FAMILY_TITLES, methodsByFamily, validityText } from "@/calc/method-statement";

/** The public method statement: every correlation of the engine, from its registry. */
export function MethodsView() {
  const families = methodsByFamily();
  return (
    <div className="grid gap-8">
      <header className="grid gap-2">
        <p className="text-micro font-semibold uppercase tracking-[0.14em] text-accent">Method statement</p>
        <h1 className="text-headline font-semibold">Methods</h1>
        <p className="max-w-prose text-muted">
          Every correlation Filmsheet uses, with its equation, the temperature at which air properties are taken, the range in which it was published and its
          source. Outside that range a result still comes back, marked with an out-of-range warning.
        </p>
        <p className="max-w-prose text-small">
          <a href="/methods/example" className="font-semibold text-accent underline-offset-2 hover:underline">
            See a worked example
          </a>{" "}
          — one wall panel derived step by step.
        </p>
        <EngineeringCaution className="max-w-prose" />
      </header>

      <nav aria-label="Method families" className="flex flex-wrap gap-2">
        {families.map(([family]) => (
          <a key={family} href={`#${family}`} className="rounded-chip border border-line bg-surface px-3 py-1 text-small hover:bg-sunken">
            {FAMILY_TITLES[family]}
          </a>
        ))}
        <a href="#conventions" className="rounded-chip border border-line bg-surface px-3 py-1 text-small hover:bg-sunken">
          Conventions
        </a>
      </nav>

      {families.map(([family, list]) => (
        <section key={family} id={family} aria-labelledby={`${family}-h`} className="grid gap-3">
          <h2 id={`${family}-h`} className="text-title font-semibold">
            {FAMILY_TITLES[family]}
          </h2>
          <div className="grid gap-3 lg:grid-cols-2">
            {list.map((m) => (
              <article key={m.id} id={m.id} className="rounded-panel border border-line bg-surface p-4 shadow-panel">
                <h3 className="text-body font-semibold">{m.title}</h3>
                <p className="mt-0.5 font-mono text-micro text-muted">{m.id}</p>
                <p className="mt-3 rounded-chip bg-sunken px-3 py-2 font-mono text-small">{m.equation}</p>
                <dl className="mt-3 grid grid-cols-[7.5rem_1fr] gap-x-3 gap-y-1 text-small">
                  <dt className="text-muted">Validity</dt>
                  <dd>{validityText(m)}</dd>
                  <dt className="text-muted">Properties at</dt>
                  <dd>{m.evaluation}</dd>
                  <dt className="text-muted">Source</dt>
                  <dd>{m.source}</dd>
                </dl>
              </article>
            ))}
          </div>
        </section>
      ))}

      <section id="conventions" aria-labelledby="conventions-h" className="grid gap-3 rounded-panel border border-line bg-sunken p-5">
        <h2 id="conventions-h" className="text-title font-semibold">
          Conventions
        </h2>
        <dl className="grid gap-3 text-small md:grid-cols-[12rem_1fr]">
          {CONVENTIONS.map((c) => (
            <div key={c.topic} className="contents">
              <dt className="font-semibold">{c.topic}</dt>
              <dd className="text-muted">{c.text}</dd>
            </div>
          ))}
        </dl>
      </section>
    </div>
  );
}
