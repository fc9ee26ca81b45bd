/** The report's units for an IP project: SI units as the engine and workings print them → IP. */
import { toDisplay, unitLabel, type Quantity, type UnitSystem } from "@/units/units";
import type { UnitFormatter } from "./format";

// The engine's SI unit strings (working lines and tables) and the quantity each stands for.
const BY_UNIT: Record<string, Quantity> = {
  "°C": "temperature",
  K: "temperature_difference",
  m: "length",
  "m²": "area",
  "m³/s": "flow",
  "m/s": "speed",
  W: "power",
  "W/m²": "heat_flux",
  "W/m²K": "film",
  "m²K/W": "resistance",
  "W/mK": "linear_transmittance",
};

/** A UnitFormatter for the project's unit system; SI passes through. Unknown units stay SI. */
export function reportUnits(system: UnitSystem): UnitFormatter | undefined {
  if (system === "SI") return undefined;
  return (value, unit) => {
    const q = BY_UNIT[unit];
    return q === undefined ? { value, unit } : { value: toDisplay(q, value, system), unit: unitLabel(q, system) };
  };
}
