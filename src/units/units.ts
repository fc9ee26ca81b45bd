/**
 * SI ↔ IP conversion at the edges of Filmsheet (input, display, import and export). The database
 * and the engine hold SI only; a project's unit system decides what a person types and reads.
 *
 * Every factor is derived from the exact definitions (international foot and inch, 1959; the
 * International Table British thermal unit, 1 Btu_IT = 1055.05585262 J; 1 °F interval = 5/9 K),
 * not typed in rounded, so that a value converted there and back returns unchanged. The tests
 * check them against the published factors of NIST SP 811 (2008), appendix B.
 */
export const UNIT_SYSTEMS = ["SI", "IP"] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

const FT_M = 0.3048;
const IN_M = 0.0254;
const MILE_M = 1609.344;
const BTU_J = 1055.05585262;
const BTU_PER_H_W = BTU_J / 3600;
const F_PER_K = 9 / 5;

/** display = si × scale + offset, in one unit system. */
interface Scale {
  unit: string;
  scale: number;
  offset?: number;
}

/** Every quantity a schedule shows, with its unit in each system. */
export const QUANTITIES = {
  temperature: { SI: { unit: "°C", scale: 1 }, IP: { unit: "°F", scale: F_PER_K, offset: 32 } },
  temperature_difference: { SI: { unit: "K", scale: 1 }, IP: { unit: "°F", scale: F_PER_K } },
  length: { SI: { unit: "m", scale: 1 }, IP: { unit: "ft", scale: 1 / FT_M } },
  // Duct sections and insulation: stored in metres, read in millimetres or inches.
  thickness: { SI: { unit: "mm", scale: 1000 }, IP: { unit: "in", scale: 1 / IN_M } },
  area: { SI: { unit: "m²", scale: 1 }, IP: { unit: "ft²", scale: 1 / (FT_M * FT_M) } },
  flow: { SI: { unit: "m³/s", scale: 1 }, IP: { unit: "cfm", scale: 60 / (FT_M * FT_M * FT_M) } },
  speed: { SI: { unit: "m/s", scale: 1 }, IP: { unit: "mph", scale: 3600 / MILE_M } },
  power: { SI: { unit: "W", scale: 1 }, IP: { unit: "Btu/h", scale: 1 / BTU_PER_H_W } },
  heat_flux: { SI: { unit: "W/m²", scale: 1 }, IP: { unit: "Btu/(h·ft²)", scale: (FT_M * FT_M) / BTU_PER_H_W } },
  film: { SI: { unit: "W/(m²·K)", scale: 1 }, IP: { unit: "Btu/(h·ft²·°F)", scale: (FT_M * FT_M) / (BTU_PER_H_W * F_PER_K) } },
  resistance: { SI: { unit: "m²·K/W", scale: 1 }, IP: { unit: "h·ft²·°F/Btu", scale: (BTU_PER_H_W * F_PER_K) / (FT_M * FT_M) } },
  // Insulation conductivity in the form IP catalogues quote it (per inch of thickness).
  conductivity: { SI: { unit: "W/(m·K)", scale: 1 }, IP: { unit: "Btu·in/(h·ft²·°F)", scale: (FT_M * FT_M) / (BTU_PER_H_W * IN_M * F_PER_K) } },
  linear_transmittance: { SI: { unit: "W/(m·K)", scale: 1 }, IP: { unit: "Btu/(h·ft·°F)", scale: FT_M / (BTU_PER_H_W * F_PER_K) } },
  angle: { SI: { unit: "°", scale: 1 }, IP: { unit: "°", scale: 1 } },
  percent: { SI: { unit: "%", scale: 1 }, IP: { unit: "%", scale: 1 } },
  fraction: { SI: { unit: "", scale: 1 }, IP: { unit: "", scale: 1 } },
} as const satisfies Record<string, Record<UnitSystem, Scale>>;

export type Quantity = keyof typeof QUANTITIES;

function scaleOf(q: Quantity, system: UnitSystem): Scale {
  return QUANTITIES[q][system];
}

/** An SI value as a person reads it in `system`. */
export function toDisplay(q: Quantity, si: number, system: UnitSystem): number {
  const s = scaleOf(q, system);
  return si * s.scale + (s.offset ?? 0);
}

/** A value typed in `system` back to SI. */
export function fromDisplay(q: Quantity, shown: number, system: UnitSystem): number {
  const s = scaleOf(q, system);
  return (shown - (s.offset ?? 0)) / s.scale;
}

/** The unit's symbol in `system` ("" for plain fractions). */
export function unitLabel(q: Quantity, system: UnitSystem): string {
  return scaleOf(q, system).unit;
}

/** The bound of a rule as shown in `system`, trimmed of float noise (e.g. 150 °C → 302 °F). */
export function displayBound(q: Quantity, si: number, system: UnitSystem): string {
  const v = toDisplay(q, si, system);
  return String(Number(v.toPrecision(6)));
}
