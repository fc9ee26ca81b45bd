/**
 * What every zone total leaves out, printed with each total on screen, in exports and in the
 * report: Filmsheet totals the fabric's steady-state exchange with the outdoors and the heat of
 * duct runs crossing spaces they do not serve, nothing else.
 */
export interface Exclusion {
  key: string;
  text: string;
}

export const TOTAL_EXCLUSIONS: readonly Exclusion[] = [
  { key: "ventilation", text: "ventilation and infiltration" },
  { key: "bridges", text: "thermal bridges (linear and point)" },
  { key: "ground", text: "ground floors and other surfaces over ground (ISO 13370)" },
  { key: "glazing_solar", text: "solar gain through glazing" },
  { key: "mass", text: "thermal mass (every total is steady state)" },
  { key: "internal", text: "internal gains from people, lighting and equipment" },
];

/** "Excludes: a; b; …" in one line. */
export function exclusionsSentence(): string {
  return `Totals exclude ${TOTAL_EXCLUSIONS.map((e) => e.text).join("; ")}.`;
}
