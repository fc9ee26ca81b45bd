/**
 * External convection kinds: plates (forced, natural, combined), cylinders and spheres.
 * The *Core functions take kelvin and numbers, so that `surface` and `duct_run` can call them in
 * their iterations without re-reading input; warnings are collected only when a list is passed.
 */
import { G } from "../constants";
import { nuCombinedChurchill, regimeFromRichardson } from "../convection/combined";
import {
  nuCylinderCrossflowChurchillBernstein,
  nuFlatPlateLaminarAverage,
  nuFlatPlateLaminarLocal,
  nuFlatPlateMixedAverage,
  nuFlatPlateTurbulentLocal,
  nuSphereForcedWhitaker,
} from "../convection/forced-external";
import {
  nuHorizontalCylinderChurchillChu,
  nuHorizontalPlateStable,
  nuHorizontalPlateUnstableLaminar,
  nuHorizontalPlateUnstableTurbulent,
  nuSphereNaturalChurchill,
  nuVerticalPlateChurchillChu,
} from "../convection/natural";
import type { AirProperties } from "../properties/air";
import { air, warnRange, type Warnings } from "./common";

export const RE_CRIT_DEFAULT = 5e5;
const DEG = Math.PI / 180;

export interface PlateForced {
  h_W_m2K: number;
  Nu: number;
  Re: number;
  Pr: number;
  regime: "laminar" | "mixed" | "turbulent";
  correlation: string;
  h_x_W_m2K?: number;
  Nu_x?: number;
  Re_x?: number;
  correlation_x?: string;
}

/** Flat plate in parallel flow, average over 0…L and optionally local at x (film properties). */
export function plateForcedCore(
  props: AirProperties,
  V: number,
  L: number,
  ReCrit: number,
  x: number | undefined,
  warnings: Warnings,
): PlateForced {
  const Re = (V * L) / props.nu_m2_s;
  const Pr = props.Pr;
  let Nu: number;
  let regime: PlateForced["regime"];
  let correlation: string;
  if (Re <= ReCrit) {
    Nu = nuFlatPlateLaminarAverage(Re, Pr);
    regime = "laminar";
    correlation = "flat-plate-laminar";
  } else {
    Nu = nuFlatPlateMixedAverage(Re, Pr, ReCrit);
    regime = ReCrit === 0 ? "turbulent" : "mixed";
    correlation = ReCrit === 0 ? "flat-plate-turbulent" : "flat-plate-mixed";
  }
  const out: PlateForced = { h_W_m2K: (Nu * props.k_W_mK) / L, Nu, Re, Pr, regime, correlation };
  warnPlateForced(out, warnings);
  if (x !== undefined) {
    const Rex = (V * x) / props.nu_m2_s;
    let Nux: number;
    if (Rex <= ReCrit) {
      Nux = nuFlatPlateLaminarLocal(Rex, Pr);
      out.correlation_x = "flat-plate-local-laminar";
      warnRange(warnings, out.correlation_x, "Pr", Pr);
    } else {
      Nux = nuFlatPlateTurbulentLocal(Rex, Pr);
      out.correlation_x = "flat-plate-local-turbulent";
      warnRange(warnings, out.correlation_x, "Re_x", Rex);
      warnRange(warnings, out.correlation_x, "Pr", Pr);
    }
    out.h_x_W_m2K = (Nux * props.k_W_mK) / x;
    out.Nu_x = Nux;
    out.Re_x = Rex;
  }
  return out;
}

export interface PlateNatural {
  h_W_m2K: number;
  Nu: number;
  Ra: number;
  Gr: number;
  Pr: number;
  regime: "laminar" | "turbulent";
  correlation: string;
  /** Ra of the branch used: with g·cos θ or g·sin θ where the plate is inclined. */
  Ra_effective: number;
}

/** Range warnings of the average flat-plate correlation used. */
export function warnPlateForced(f: PlateForced, warnings: Warnings): void {
  if (warnings === null) return;
  if (f.regime !== "laminar") warnRange(warnings, f.correlation, "Re", f.Re);
  warnRange(warnings, f.correlation, "Pr", f.Pr);
}

/** Range warnings of the natural-convection branch used (on its effective Rayleigh number). */
export function warnPlateNatural(n: PlateNatural, warnings: Warnings): void {
  if (warnings !== null) warnRange(warnings, n.correlation, "Ra", n.Ra_effective);
}

/** Range warnings of both parts of a combined coefficient. */
export function warnPlateCombined(c: PlateCombined, warnings: Warnings): void {
  warnPlateForced(c.forced, warnings);
  warnPlateNatural(c.natural, warnings);
}

/**
 * Natural convection from a plate at any tilt (0 = facing up, 90 = vertical, 180 = facing down),
 * by the contract's selection: Churchill & Chu with g·cos θ on the vertical and near-vertical
 * stable side, 0.52 Ra^⅕ beyond 60° on the stable side, and on the unstable side the larger of
 * Churchill & Chu (g·cos θ) and the horizontal forms (g·sin θ), after Raithby & Hollands.
 */
export function plateNaturalCore(
  props: AirProperties,
  Ts: number,
  Ta: number,
  tiltDeg: number,
  L: number,
  warnings: Warnings,
): PlateNatural {
  const Pr = props.Pr;
  const nu = props.nu_m2_s;
  const Gr = (G * props.beta_1_K * Math.abs(Ts - Ta) * L * L * L) / (nu * nu);
  const Ra = Gr * Pr;
  const thetaDeg = Math.abs(tiltDeg - 90);
  let Nu: number;
  let RaEff = Ra; // the Rayleigh number of the branch used (g·cos θ or g·sin θ)
  let turbulent: boolean;
  let id: string;
  const stable = Ts >= Ta !== tiltDeg < 90; // hot facing down or cold facing up
  if (thetaDeg === 0) {
    id = "churchill-chu-vertical-plate";
    Nu = nuVerticalPlateChurchillChu(Ra, Pr);
    turbulent = Ra > 1e9;
  } else if (stable && thetaDeg > 60) {
    id = "horizontal-plate-stable";
    Nu = nuHorizontalPlateStable(Ra);
    turbulent = false;
  } else {
    RaEff = Ra * Math.cos(thetaDeg * DEG);
    id = "churchill-chu-inclined-plate";
    Nu = nuVerticalPlateChurchillChu(RaEff, Pr);
    turbulent = RaEff > 1e9;
    if (!stable) {
      // Unstable side: the larger of the inclined (g·cos θ) and horizontal (g·sin θ) forms.
      const RaH = Ra * Math.sin(thetaDeg * DEG);
      const turbH = RaH > 1e7;
      const nuH = turbH ? nuHorizontalPlateUnstableTurbulent(RaH) : nuHorizontalPlateUnstableLaminar(RaH);
      if (nuH > Nu) {
        id = turbH ? "horizontal-plate-unstable-turbulent" : "horizontal-plate-unstable-laminar";
        Nu = nuH;
        RaEff = RaH;
        turbulent = turbH;
      }
    }
  }
  const out: PlateNatural = {
    h_W_m2K: (Nu * props.k_W_mK) / L,
    Nu,
    Ra,
    Gr,
    Pr,
    regime: turbulent ? "turbulent" : "laminar",
    correlation: id,
    Ra_effective: RaEff,
  };
  warnPlateNatural(out, warnings);
  return out;
}

export interface PlateCombined {
  h_W_m2K: number;
  Nu: number;
  Nu_forced: number;
  Nu_natural: number;
  Ri: number | null;
  regime: "forced" | "natural" | "combined";
  correlation: string;
  forced: PlateForced;
  natural: PlateNatural;
}

/**
 * Combined convection on a plate (Churchill 1977, n = 3): forced on length L along the flow,
 * natural on height H at the given tilt, Nu_N rescaled to L, Ri = Gr_L/Re_L².
 */
export function plateCombinedCore(
  props: AirProperties,
  Ts: number,
  Ta: number,
  V: number,
  L: number,
  tiltDeg: number,
  H: number,
  warnings: Warnings,
): PlateCombined {
  const forced = plateForcedCore(props, V, L, RE_CRIT_DEFAULT, undefined, warnings);
  const natural = plateNaturalCore(props, Ts, Ta, tiltDeg, H, warnings);
  const NuN = (natural.Nu * L) / H;
  const Nu = nuCombinedChurchill(forced.Nu, NuN, 3);
  let Ri: number | null = null;
  const Re2 = forced.Re * forced.Re;
  if (Re2 > 0) {
    const r = L / H;
    Ri = (natural.Gr * r * r * r) / Re2;
    // A speed so small that Ri overflows is still air for this purpose.
    if (!Number.isFinite(Ri)) Ri = null;
  }
  return {
    h_W_m2K: (Nu * props.k_W_mK) / L,
    Nu,
    Nu_forced: forced.Nu,
    Nu_natural: NuN,
    Ri,
    regime: regimeFromRichardson(Ri),
    correlation: "churchill-combined-plate",
    forced,
    natural,
  };
}

/** Cylinder in cross-flow (Churchill & Bernstein), film properties. */
export function cylinderCrossflowCore(props: AirProperties, V: number, D: number, warnings: Warnings) {
  const Re = (V * D) / props.nu_m2_s;
  const Pr = props.Pr;
  warnRange(warnings, "churchill-bernstein-cylinder", "RePr", Re * Pr);
  const Nu = nuCylinderCrossflowChurchillBernstein(Re, Pr);
  return { h_W_m2K: (Nu * props.k_W_mK) / D, Nu, Re, Pr, correlation: "churchill-bernstein-cylinder" };
}

/** Rayleigh number on length L with full g, from film properties. */
export function rayleigh(props: AirProperties, dT: number, L: number): number {
  const nu = props.nu_m2_s;
  return ((G * props.beta_1_K * Math.abs(dT) * L * L * L) / (nu * nu)) * props.Pr;
}

/** Horizontal cylinder, natural convection (Churchill & Chu), film properties. */
export function cylinderNaturalCore(props: AirProperties, dT: number, D: number, warnings: Warnings) {
  const Ra = rayleigh(props, dT, D);
  warnRange(warnings, "churchill-chu-horizontal-cylinder", "Ra", Ra);
  const Nu = nuHorizontalCylinderChurchillChu(Ra, props.Pr);
  return { h_W_m2K: (Nu * props.k_W_mK) / D, Nu, Ra, Pr: props.Pr, correlation: "churchill-chu-horizontal-cylinder" };
}

/** Sphere in a stream (Whitaker): properties at the air temperature, μ_s at the surface. */
export function sphereForcedCore(
  Ts: number,
  Ta: number,
  V: number,
  D: number,
  p: number,
  warnings: Warnings,
) {
  const pa = air(Ta, p, warnings, "T_air_C");
  const ps = air(Ts, p, warnings, "T_surface_C");
  const Re = (V * D) / pa.nu_m2_s;
  const muRatio = pa.mu_Pa_s / ps.mu_Pa_s;
  warnRange(warnings, "whitaker-sphere", "Re", Re);
  warnRange(warnings, "whitaker-sphere", "Pr", pa.Pr);
  warnRange(warnings, "whitaker-sphere", "mu_ratio", muRatio);
  const Nu = nuSphereForcedWhitaker(Re, pa.Pr, muRatio);
  return { h_W_m2K: (Nu * pa.k_W_mK) / D, Nu, Re, Pr: pa.Pr, mu_ratio: muRatio, correlation: "whitaker-sphere" };
}

/** Sphere, natural convection (Churchill), film properties. */
export function sphereNaturalCore(props: AirProperties, dT: number, D: number, warnings: Warnings) {
  const Ra = rayleigh(props, dT, D);
  warnRange(warnings, "churchill-sphere-natural", "Ra", Ra);
  warnRange(warnings, "churchill-sphere-natural", "Pr", props.Pr);
  const Nu = nuSphereNaturalChurchill(Ra, props.Pr);
  return { h_W_m2K: (Nu * props.k_W_mK) / D, Nu, Ra, Pr: props.Pr, correlation: "churchill-sphere-natural" };
}
