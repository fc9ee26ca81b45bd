/**
 * Wind speed at a height by terrain and law, with the laws' validity warnings: above the gradient
 * height (power law), above 200 m (log law) and, on both laws, below the terrain's z_min.
 */
import type { Warnings } from "./common";
import { warnRange } from "./common";
import { POWER_LAW, LOG_LAW, windSpeedLogLaw, windSpeedPowerLaw, type Terrain } from "../wind/wind-profile";
import { checkRange } from "../validity";
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
  if (law === "power") {
    const id = "wind-power-law";
    // Near the ground the profile is set by the obstacles around, not by the law: below the log
    // law's z_min of the terrain (EN 1991-1-4, table 4.1) the power law warns as the log law does.
    if (warnings !== null && H < LOG_LAW[terrain].zmin_m) {
      const title = `${METHOD_BY_ID[id].title} (${terrain}: unreliable below EN 1991-1-4's z_min)`;
      checkRange(warnings, id, title, "height_m", H, { min: LOG_LAW[terrain].zmin_m, unit: "m" });
    }
    // The gradient height depends on the terrain, so the range comes from the law's data.
    if (warnings !== null && H > POWER_LAW[terrain].delta_m) {
      const title = `${METHOD_BY_ID[id].title} (${terrain}: V is held constant above δ)`;
      checkRange(warnings, id, title, "height_m", H, { max: POWER_LAW[terrain].delta_m, unit: "m" });
    }
    return { V_m_s: windSpeedPowerLaw(Vmet, H, terrain, Hmet), correlation: id };
  }
  const id = "wind-log-law-en1991";
  if (warnings !== null && H < LOG_LAW[terrain].zmin_m) {
    const title = `${METHOD_BY_ID[id].title} (${terrain}: c_r is held constant below z_min)`;
    checkRange(warnings, id, title, "height_m", H, { min: LOG_LAW[terrain].zmin_m, unit: "m" });
  }
  warnRange(warnings, id, "height_m", H);
  return { V_m_s: windSpeedLogLaw(Vmet, H, terrain, Hmet), correlation: id };
}
