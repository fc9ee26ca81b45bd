/**
 * Wind speed at a height by terrain and law, with the laws' validity warnings: above the gradient
 * height (power law), above 200 m (log law) and, on both laws, below the terrain's z_min.
 */
import type { Warnings } from "./common";
import { warnRange } from "./common";
import { POWER_LAW, LOG_LAW, windSpeedLogLaw, windSpeedPowerLaw, type Terrain } from "../wind/wind-profile";
import { checkRange, type Range } from "../validity";
import { METHOD_BY_ID } from "../registry";

export type WindLaw = "power" | "log";
export const WIND_LAWS: readonly WindLaw[] = ["power", "log"];

export function windAtHeight(
  Vmet: number,
  H: number,
  terrain: Terrain,
  law: WindLaw,
  Hmet: number,
  warnings: Warnings,
): { V_m_s: number; correlation: string } {
  return { V_m_s: windSpeedAt(Vmet, H, terrain, law, Hmet, warnings), correlation: law === "power" ? POWER_ID : LOG_ID };
}

const POWER_ID = "wind-power-law";
const LOG_ID = "wind-log-law-en1991";
// The ranges and titles of the height warnings, one per terrain, made once: the warnings' shared
// wording is cached per range (src/calc/validity.ts).
const LOW = Object.fromEntries(
  (Object.keys(LOG_LAW) as Terrain[]).map((t) => [
    t,
    {
      range: { min: LOG_LAW[t].zmin_m, unit: "m" },
      powerTitle: `${METHOD_BY_ID[POWER_ID].title} (${t}: unreliable below EN 1991-1-4's z_min)`,
      logTitle: `${METHOD_BY_ID[LOG_ID].title} (${t}: c_r is held constant below z_min)`,
    },
  ]),
) as Record<Terrain, { range: Range; powerTitle: string; logTitle: string }>;
const HIGH = Object.fromEntries(
  (Object.keys(POWER_LAW) as Terrain[]).map((t) => [
    t,
    { range: { max: POWER_LAW[t].delta_m, unit: "m" }, title: `${METHOD_BY_ID[POWER_ID].title} (${t}: V is held constant above δ)` },
  ]),
) as Record<Terrain, { range: Range; title: string }>;

/** The wind speed of windAtHeight alone (no result object: the surface iteration's path). */
export function windSpeedAt(Vmet: number, H: number, terrain: Terrain, law: WindLaw, Hmet: number, warnings: Warnings): number {
  if (law === "power") {
    // Near the ground the profile is set by the obstacles around, not by the law: below the log
    // law's z_min of the terrain (EN 1991-1-4, table 4.1) the power law warns as the log law does.
    if (warnings !== null && H < LOG_LAW[terrain].zmin_m) {
      checkRange(warnings, POWER_ID, LOW[terrain].powerTitle, "height_m", H, LOW[terrain].range);
    }
    // The gradient height depends on the terrain, so the range comes from the law's data.
    if (warnings !== null && H > POWER_LAW[terrain].delta_m) {
      checkRange(warnings, POWER_ID, HIGH[terrain].title, "height_m", H, HIGH[terrain].range);
    }
    return windSpeedPowerLaw(Vmet, H, terrain, Hmet);
  }
  if (warnings !== null && H < LOG_LAW[terrain].zmin_m) {
    checkRange(warnings, LOG_ID, LOW[terrain].logTitle, "height_m", H, LOW[terrain].range);
  }
  warnRange(warnings, LOG_ID, "height_m", H);
  return windSpeedLogLaw(Vmet, H, terrain, Hmet);
}
