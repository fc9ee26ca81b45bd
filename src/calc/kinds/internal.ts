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

/** Laminar Nusselt number of the section: 3.66 round, Shah & London by aspect ratio otherwise. */
function nuLaminar(g: DuctGeometry, round: boolean): number {
  return round ? nuRoundDuctLaminar() : nuRectangularLaminarShahLondon(g.aspect);
}

/**
 * Nusselt number inside a duct by regime (bulk properties): laminar below Re 2300, Gnielinski
 * with Petukhov's factor from 3000, linear in Re between.
 */
export function nuDuct(Re: number, Pr: number, g: DuctGeometry, round: boolean): number {
  if (Re < RE_LAMINAR_MAX) return nuLaminar(g, round);
  if (Re < RE_TURBULENT_MIN) {
    return blendLinear(Re, RE_LAMINAR_MAX, RE_TURBULENT_MIN, nuLaminar(g, round), nuDuctTurbulentGnielinski(RE_TURBULENT_MIN, Pr));
  }
  return nuDuctTurbulentGnielinski(Re, Pr);
}

/**
 * Darcy friction factor by regime: 64/Re or Shah & London's fRe/Re in laminar flow, Colebrook in
 * turbulent flow, linear in Re between the laminar value at 2300 and Colebrook's at 3000.
 */
export function fDarcyDuct(Re: number, g: DuctGeometry, round: boolean, roughness_m: number): number {
  const fReLam = round ? 64 : fReRectangularShahLondon(g.aspect);
  if (Re < RE_LAMINAR_MAX) return fReLam / Re;
  const eD = roughness_m / g.Dh_m;
  if (Re < RE_TURBULENT_MIN) {
    return blendLinear(Re, RE_LAMINAR_MAX, RE_TURBULENT_MIN, fReLam / RE_LAMINAR_MAX, fDarcyColebrook(RE_TURBULENT_MIN, eD));
  }
  return fDarcyColebrook(Re, eD);
}

/** Regime word and registry id of the inside flow. */
export function ductRegime(Re: number, round: boolean): { regime: DuctInternal["regime"]; id: string } {
  if (Re < RE_LAMINAR_MAX) return { regime: "laminar", id: round ? "laminar-round-duct" : "shah-london-rectangular" };
  if (Re < RE_TURBULENT_MIN) return { regime: "transitional", id: "duct-transitional-blend" };
  return { regime: "turbulent", id: "gnielinski-petukhov" };
}

/** Fully developed flow inside a duct with bulk properties: every output of `duct_internal`. */
export function ductInternalCore(
  props: AirProperties,
  shape: DuctShape,
  g: DuctGeometry,
  flow_m3_s: number,
  roughness_m: number,
  warnings: Warnings,
): DuctInternal {
  const V = flow_m3_s / g.area_m2;
  const Re = (V * g.Dh_m) / props.nu_m2_s;
  const Pr = props.Pr;
  const round = shape === "round";
  const Nu = nuDuct(Re, Pr, g, round);
  const { regime, id } = ductRegime(Re, round);
  if (regime === "turbulent") {
    warnRange(warnings, id, "Re", Re);
    warnRange(warnings, id, "Pr", Pr);
  }
  return {
    velocity_m_s: V,
    Dh_m: g.Dh_m,
    Re,
    Pr,
    f_darcy: fDarcyDuct(Re, g, round, roughness_m),
    Nu,
    h_W_m2K: (Nu * props.k_W_mK) / g.Dh_m,
    regime,
    correlation: id,
  };
}
