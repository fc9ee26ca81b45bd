import { Link } from "@/components/shell/link";
import { FilmSketch } from "./film-sketch";

const STEPS = [
  { n: "1", title: "Schedule", text: "Enter every external surface and duct run by zone, or import them from a spreadsheet." },
  { n: "2", title: "Check", text: "A second engineer reads each row's working and accepts or queries it." },
  { n: "3", title: "Issue", text: "When every row is accepted, issue a lettered revision and its calculation report." },
];

const OUTPUTS = [
  "Outside film coefficient: wind-driven, buoyant or both",
  "Long-wave radiation to sky and ground, absorbed solar",
  "Outside surface temperature, U-value, heat flow",
  "Duct leaving-air temperature and condensation risk",
  "Heat loss and heat gain totalled per zone",
];

/** The landing page: what Filmsheet is for and where to go next. */
export function HomeView() {
  return (
    <div className="grid gap-10">
      <section className="grid items-center gap-8 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <div>
          <p className="text-micro font-semibold uppercase tracking-[0.14em] text-accent">Exterior surfaces · duct runs · zone totals</p>
          <h1 className="mt-2 text-display font-semibold">Filmsheet</h1>
          <p className="mt-4 max-w-prose text-lead text-muted">
            The outside-surface schedule for building-services engineers. Film coefficients, surface temperatures, U-values and heat flows for every wall, roof and
            duct run, worked row by row, checked by a second engineer and issued as frozen revisions.
          </p>
          <div className="mt-6 flex flex-wrap gap-3">
            <Link href="/projects" className="rounded-chip bg-accent px-4 py-2 text-small font-semibold text-accent-ink hover:opacity-90">
              Open projects
            </Link>
            <Link href="/methods" className="rounded-chip border border-line bg-surface px-4 py-2 text-small font-semibold hover:bg-sunken">
              Read the methods
            </Link>
          </div>
        </div>
        <FilmSketch />
      </section>

      <section aria-labelledby="how" className="grid gap-4">
        <h2 id="how" className="text-title font-semibold">
          How a schedule moves
        </h2>
        <ol className="grid gap-4 md:grid-cols-3">
          {STEPS.map((s) => (
            <li key={s.n} className="rounded-panel border border-line bg-surface p-5 shadow-panel">
              <span className="inline-flex size-7 items-center justify-center rounded-full bg-accent-soft text-small font-semibold text-accent">{s.n}</span>
              <h3 className="mt-3 text-lead font-semibold">{s.title}</h3>
              <p className="mt-1 text-small text-muted">{s.text}</p>
            </li>
          ))}
        </ol>
      </section>

      <section aria-labelledby="rows" className="rounded-panel border border-line bg-sunken p-5">
        <h2 id="rows" className="text-title font-semibold">
          What every row gets, for every design case
        </h2>
        <ul className="mt-3 grid gap-x-8 gap-y-2 text-small sm:grid-cols-2">
          {OUTPUTS.map((o) => (
            <li key={o} className="flex gap-2">
              <span className="mt-2 size-1.5 shrink-0 rounded-full bg-accent" aria-hidden="true" />
              {o}
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}
