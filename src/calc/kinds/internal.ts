/** Inside a duct: geometry, Reynolds number, Nusselt number and friction factor by regime. */
import {
  blendLinear,
  fDarcyColebrook,
  fReRectangularShahLondon,
  nuDuctTurbulentGnielinski,
  nuRectangularLaminarShahLondon,
  nuRoundDuctLaminar,
} from "../convection/internal";
import type { AirProperties } from "../properties/air";
import { warnRange, type Warnings } from "./common";

export const RE_LAMINAR_MAX = 2300;
export const RE_TURBULENT_MIN = 3000;
export const ROUGHNESS_DEFAULT_M = 0.00009;

export type DuctShape = "round" | "rect";

export interface DuctSection {
  shape: DuctShape;
  /** Round: diameter; rect: width and height (inside), m. */
  diameter_m?: number;
  width_m?: number;
  height_m?: number;
}

export interface DuctGeometry {
  area_m2: number;
  perimeter_m: number;
  Dh_m: number;
  /** Short side / long side (1 for round). */
  aspect: number;
}

export function ductGeometry(s: DuctSection): DuctGeometry {
  if (s.shape === "round") {
    const D = s.diameter_m as number;
    return { area_m2: (Math.PI * D * D) / 4, perimeter_m: Math.PI * D, Dh_m: D, aspect: 1 };
  }
  const w = s.width_m as number;
  const h = s.height_m as number;
  const area = w * h;
  const per = 2 * (w + h);
  return { area_m2: area, perimeter_m: per, Dh_m: (4 * area) / per, aspect: Math.min(w, h) / Math.max(w, h) };
}

export interface DuctInternal {
  velocity_m_s: number;
  Dh_m: number;
  Re: number;
  Pr: number;
  f_darcy: number;
  Nu: number;
  h_W_m2K: number;
  regime: "laminar" | "transitional" | "turbulent";
  correlation: string;
}

/**
 * Fully developed flow inside a duct with bulk properties: laminar below Re 2300 (3.66 or Shah &
 * London), Gnielinski with Petukhov's factor from 3000, linear in Re between; f from 64/Re or
 * Shah & London in laminar flow and Colebrook in turbulent flow, blended likewise.
 */
export function ductInternalCore(
  props: AirProperties,
  shape: DuctShape,
  g: DuctGeometry,
  flow_m3_s: number,
  roughness_m: number,
  warnings: Warnings,
  /** False where only the heat transfer is wanted (the duct-run iterations): f_darcy is then NaN. */
  withFriction = true,
): DuctInternal {
  const V = flow_m3_s / g.area_m2;
  const Re = (V * g.Dh_m) / props.nu_m2_s;
  const Pr = props.Pr;
  const round = shape === "round";
  // Laminar values only below Re 3000, where they are used.
  const nuLam = Re >= RE_TURBULENT_MIN ? NaN : round ? nuRoundDuctLaminar() : nuRectangularLaminarShahLondon(g.aspect);
  const fReLam = Re >= RE_TURBULENT_MIN ? NaN : round ? 64 : fReRectangularShahLondon(g.aspect);
  const lamId = round ? "laminar-round-duct" : "shah-london-rectangular";
  let Nu: number;
  let f: number;
  let regime: DuctInternal["regime"];
  let correlation: string;
  if (Re < RE_LAMINAR_MAX) {
    Nu = nuLam;
    f = fReLam / Re;
    regime = "laminar";
    correlation = lamId;
  } else if (Re < RE_TURBULENT_MIN) {
    const eD = roughness_m / g.Dh_m;
    Nu = blendLinear(Re, RE_LAMINAR_MAX, RE_TURBULENT_MIN, nuLam, nuDuctTurbulentGnielinski(RE_TURBULENT_MIN, Pr));
    f = withFriction
      ? blendLinear(Re, RE_LAMINAR_MAX, RE_TURBULENT_MIN, fReLam / RE_LAMINAR_MAX, fDarcyColebrook(RE_TURBULENT_MIN, eD))
      : NaN;
    regime = "transitional";
    correlation = "duct-transitional-blend";
  } else {
    Nu = nuDuctTurbulentGnielinski(Re, Pr);
    f = withFriction ? fDarcyColebrook(Re, roughness_m / g.Dh_m) : NaN;
    regime = "turbulent";
    correlation = "gnielinski-petukhov";
    warnRange(warnings, correlation, "Re", Re);
    warnRange(warnings, correlation, "Pr", Pr);
  }
  return { velocity_m_s: V, Dh_m: g.Dh_m, Re, Pr, f_darcy: f, Nu, h_W_m2K: (Nu * props.k_W_mK) / g.Dh_m, regime, correlation };
}
