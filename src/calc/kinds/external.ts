/**
 * External convection kinds: plates (forced, natural, combined), cylinders and spheres.
 * The *Core functions take kelvin and numbers, so that `surface` and `duct_run` can call them in
 * their iterations without re-reading input; warnings are collected only when a list is passed.
 */
import { regimeFromRichardson } from "../convection/combined";
import {
  nuCylinderCrossflowChurchillBernstein,
  nuFlatPlateLaminarLocal,
  nuFlatPlateTurbulentLocal,
  nuSphereForcedWhitaker,
} from "../convection/forced-external";
import { nuHorizontalCylinderChurchillChu, nuSphereNaturalChurchill } from "../convection/natural";
import {
  grashof,
  newNaturalBranch,
  newPlateCombinedState,
  STABLE_SWITCH_DEG,
  SWITCH_BAND_DEG,
  nuPlateForced,
  nuPlateNatural,
  plateCombinedInto,
  plateForcedBranch,
  type NaturalBranch,
  type PlateCombinedState,
} from "../select";
import type { AirProperties } from "../properties/air";
import { air, warnRange, type Warnings } from "./common";
import { addWarning } from "../validity";

export const RE_CRIT_DEFAULT = 5e5;

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
  const Nu = nuPlateForced(Re, Pr, ReCrit);
  const branch = plateForcedBranch(Re, ReCrit);
  const out: PlateForced = { h_W_m2K: (Nu * props.k_W_mK) / L, Nu, Re, Pr, regime: branch.regime, correlation: branch.id };
  warnPlateForced(out, warnings);
  if (x !== undefined) {
    const Rex = (V * x) / props.nu_m2_s;
    let Nux: number;
    if (Rex <= ReCrit) {
      Nux = nuFlatPlateLaminarLocal(Rex, Pr);
      out.correlation_x = "flat-plate-local-laminar";
      warnRange(warnings, out.correlation_x, "Re_x", Rex);
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
  warnRange(warnings, f.correlation, "Re", f.Re);
  warnRange(warnings, f.correlation, "Pr", f.Pr);
}

/**
 * Range warnings of the natural-convection branch used (on its effective Rayleigh number) and,
 * within SWITCH_BAND_DEG of the stable side's 60° switch, a `near_method_switch` warning that
 * names the other form's Nusselt number: the contract keeps the step, the checker sees its size.
 */
export function warnNaturalBranch(b: NaturalBranch, warnings: Warnings): void {
  if (warnings === null) return;
  warnRange(warnings, b.id, "Ra", b.RaEff);
  if (b.altNu === b.altNu) {
    const other = b.id === "horizontal-plate-stable" ? "Churchill & Chu with g·cos θ" : "the horizontal stable form 0.52 Ra^⅕";
    const change = Math.round((b.altNu / b.nu - 1) * 100);
    addWarning(
      warnings,
      "near_method_switch",
      `the plate is ${Math.round(b.thetaDeg * 10) / 10}° from vertical, within ${SWITCH_BAND_DEG}° of the ${STABLE_SWITCH_DEG}° switch of the stable side; ` +
        `${other} would give Nu ${Math.round(b.altNu * 100) / 100} instead of ${Math.round(b.nu * 100) / 100} (${change > 0 ? "+" : ""}${change} %)`,
    );
  }
}

/** Natural convection from a plate at any tilt (see nuPlateNatural for the selection). */
export function plateNaturalCore(
  props: AirProperties,
  Ts: number,
  Ta: number,
  tiltDeg: number,
  L: number,
  warnings: Warnings,
): PlateNatural {
  const Gr = grashof(props, Ts - Ta, L);
  const Ra = Gr * props.Pr;
  const b = newNaturalBranch();
  const Nu = nuPlateNatural(Ra, props.Pr, tiltDeg, Ts >= Ta, b);
  warnNaturalBranch(b, warnings);
  return {
    h_W_m2K: (Nu * props.k_W_mK) / L,
    Nu,
    Ra,
    Gr,
    Pr: props.Pr,
    regime: b.turbulent ? "turbulent" : "laminar",
    correlation: b.id,
    Ra_effective: b.RaEff,
  };
}

export interface PlateCombined {
  h_W_m2K: number;
  Nu: number;
  Nu_forced: number;
  Nu_natural: number;
  Ri: number | null;
  regime: "forced" | "natural" | "combined";
  correlation: string;
}

/** Range warnings of both parts of a combined coefficient, from its state. */
export function warnPlateCombined(st: PlateCombinedState, ReCrit: number, warnings: Warnings): void {
  if (warnings === null) return;
  const b = plateForcedBranch(st.Re, ReCrit);
  // The forced part's ranges matter only where it contributes: not in still air (Ri null) and
  // not where buoyancy rules (Ri > 10), or every still day would warn of a low Reynolds number.
  if (st.Ri !== null && st.Ri <= 10) {
    warnRange(warnings, b.id, "Re", st.Re);
    warnRange(warnings, b.id, "Pr", st.Pr);
  }
  warnNaturalBranch(st.natural, warnings);
}

/** The combined coefficient's outputs from its state. */
export function plateCombinedResult(st: PlateCombinedState): PlateCombined {
  return {
    h_W_m2K: st.h,
    Nu: st.Nu,
    Nu_forced: st.NuF,
    Nu_natural: st.NuN,
    Ri: st.Ri,
    regime: regimeFromRichardson(st.Ri),
    correlation: "churchill-combined-plate",
  };
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
  const st = newPlateCombinedState();
  plateCombinedInto(props, Ts, Ta, V, L, tiltDeg, H, RE_CRIT_DEFAULT, st);
  warnPlateCombined(st, RE_CRIT_DEFAULT, warnings);
  return plateCombinedResult(st);
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
  return grashof(props, dT, L) * props.Pr;
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
