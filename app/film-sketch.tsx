// A drawing of wind over a façade panel: the boundary layer thickens as √x while the local film
// coefficient falls as 1/√x — the idea every row of a schedule starts from.
const X0 = 40;
const X1 = 340;
const PLATE_Y = 150;
const samples = Array.from({ length: 41 }, (_, i) => i / 40);

const path = (f: (s: number) => number) =>
  samples.map((s, i) => `${i === 0 ? "M" : "L"}${(X0 + s * (X1 - X0)).toFixed(1)},${f(s).toFixed(1)}`).join(" ");

const layer = path((s) => PLATE_Y - 62 * Math.sqrt(s));
const localH = path((s) => PLATE_Y - Math.min(118, 16 / Math.sqrt(s + 0.004)));

export function FilmSketch() {
  return (
    <figure className="rounded-panel border border-line bg-surface p-4 shadow-panel">
      <svg viewBox="0 0 360 180" className="w-full" role="img" aria-labelledby="film-sketch-title">
        <title id="film-sketch-title">Wind over a panel: the boundary layer grows along the panel while the local film coefficient falls</title>
        {[50, 80, 110, 140].map((y) => (
          <path key={y} d={`M6 ${y - 20}h22m-6 -4 6 4 -6 4`} fill="none" stroke="var(--fs-frost)" strokeWidth="1.5" strokeLinecap="round" opacity="0.8" />
        ))}
        <path d={`${layer} L${X1},${PLATE_Y} L${X0},${PLATE_Y} Z`} fill="var(--fs-accent-soft)" />
        <path d={layer} fill="none" stroke="var(--fs-accent)" strokeWidth="2" />
        <path d={localH} fill="none" stroke="var(--fs-heat)" strokeWidth="2" strokeDasharray="5 4" />
        <rect x={X0} y={PLATE_Y} width={X1 - X0} height="10" rx="2" fill="var(--fs-ink)" opacity="0.85" />
        <text x="335" y="121" fontSize="11" textAnchor="end" fill="var(--fs-accent)">boundary layer ∝ √x</text>
        <text x="70" y="44" fontSize="11" fill="var(--fs-heat)">local h ∝ 1/√x</text>
        <text x={X1} y="176" fontSize="10" textAnchor="end" fill="var(--fs-muted)">x along the panel →</text>
      </svg>
      <figcaption className="mt-2 text-micro text-muted">Wind over a panel. Every row of a schedule starts here, then adds buoyancy, sky radiation and sun.</figcaption>
    </figure>
  );
}
