import { Link } from "@/components/shell/link";
import { working } from "@/calc/index";
import { WorkingView } from "@/components/working/working-view";

// An invented row: a west-facing wall panel of a library annexe on a windy winter design day.
const EXAMPLE = {
  id: "example-west-wall",
  kind: "surface",
  area_m2: 20,
  tilt_deg: 90,
  azimuth_deg: 270,
  height_m: 10,
  length_m: 12,
  panel_height_m: 3,
  R_construction_m2K_W: 2.5,
  T_inside_C: 21,
  T_outside_C: -5,
  V_met_m_s: 6,
  wind_from_deg: 285,
  terrain: "suburban",
  emissivity: 0.9,
  absorptance: 0.6,
  method: "boundary_layer",
};

/** A worked example: how the engine derives one row, exactly as a checker sees it. */
export function ExampleView() {
  return (
    <div className="grid gap-6">
      <header className="grid gap-2">
        <p className="text-micro font-semibold uppercase tracking-[0.14em] text-accent">Worked example</p>
        <h1 className="text-headline font-semibold">One wall panel, one design case</h1>
        <p className="max-w-prose text-muted">
          A 20 m² west-facing wall panel, 10 m up, in a 6 m/s winter wind from 285°. Every step below is the engine&apos;s own trace: the
          wind at the panel, the sky, the air properties at the film temperature, the forced and natural parts of the film coefficient and the
          surface balance. <Link href="/methods" className="text-accent underline-offset-2 hover:underline">All methods</Link>.
        </p>
      </header>
      <WorkingView working={working(EXAMPLE)} title="West wall panel — windy winter design day" />
    </div>
  );
}
