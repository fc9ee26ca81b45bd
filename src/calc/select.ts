/**
 * Method selection: which correlation applies to a plate for the given flow, tilt and sign of
 * ΔT. These functions return numbers and record the branch taken in a caller-owned object, so
 * the engine's iterations can call them without allocating; the kinds build their result objects
 * on top of them (src/calc/kinds/external.ts).
 */
import { G } from "./constants";
import { nuCombinedChurchill } from "./convection/combined";
import { nuFlatPlateLaminarAverage, nuFlatPlateMixedAverage } from "./convection/forced-external";
import {
  nuHorizontalPlateStable,
  nuHorizontalPlateUnstableLaminar,
  nuHorizontalPlateUnstableTurbulent,
  nuVerticalPlateChurchillChu,
} from "./convection/natural";
import type { AirProperties } from "./properties/air";

const DEG = Math.PI / 180;

/** Average flat-plate Nusselt number: laminar up to Re_crit, mixed above it (turbulent if Re_crit = 0). */
export function nuPlateForced(Re: number, Pr: number, ReCrit: number): number {
  return Re <= ReCrit ? nuFlatPlateLaminarAverage(Re, Pr) : nuFlatPlateMixedAverage(Re, Pr, ReCrit);
}

/** Registry id and regime word of nuPlateForced's branch. */
export function plateForcedBranch(Re: number, ReCrit: number): { id: string; regime: "laminar" | "mixed" | "turbulent" } {
  if (Re <= ReCrit) return LAMINAR;
  return ReCrit === 0 ? TURBULENT : MIXED;
}
const LAMINAR = { id: "flat-plate-laminar", regime: "laminar" } as const;
const MIXED = { id: "flat-plate-mixed", regime: "mixed" } as const;
const TURBULENT = { id: "flat-plate-turbulent", regime: "turbulent" } as const;

/** The natural-convection branch a plate took. */
export interface NaturalBranch {
  /** Registry id of the correlation used. */
  id: string;
  /** Ra of that branch: with g·cos θ or g·sin θ where the plate is inclined. */
  RaEff: number;
  turbulent: boolean;
  /** Nusselt number of the branch used. */
  nu: number;
  /**
   * Near the stable side's 60° switch (θ within SWITCH_BAND_DEG of it): the Nusselt number the
   * other form gives and the angle from vertical; NaN elsewhere. The contract fixes the switch,
   * so the engine keeps it and warns (see warnNaturalBranch).
   */
  altNu: number;
  thetaDeg: number;
}

export function newNaturalBranch(): NaturalBranch {
  return { id: "", RaEff: 0, turbulent: false, nu: 0, altNu: NaN, thetaDeg: 0 };
}

/** Angle from vertical of the stable side's switch between the inclined and horizontal forms. */
export const STABLE_SWITCH_DEG = 60;
/** Within this many degrees of the switch, a result warns and names the other form's value. */
export const SWITCH_BAND_DEG = 5;

/**
 * Natural convection from a plate at any tilt (0 = facing up, 90 = vertical, 180 = facing down):
 * Churchill & Chu when vertical; on the stable side (hot facing down, cold facing up) Churchill &
 * Chu with g·cos θ up to 60° from vertical and 0.52 Ra^⅕ (full g) beyond; on the unstable side
 * the larger of Churchill & Chu with g·cos θ and the horizontal forms with g·sin θ (Raithby &
 * Hollands). Ra is on the plate's characteristic length with the full g.
 */
export function nuPlateNatural(Ra: number, Pr: number, tiltDeg: number, hot: boolean, b: NaturalBranch): number {
  const thetaDeg = Math.abs(tiltDeg - 90);
  b.altNu = NaN;
  b.thetaDeg = thetaDeg;
  if (thetaDeg === 0) {
    b.id = "churchill-chu-vertical-plate";
    b.RaEff = Ra;
    b.turbulent = Ra > 1e9;
    b.nu = nuVerticalPlateChurchillChu(Ra, Pr);
    return b.nu;
  }
  const stable = hot !== tiltDeg < 90;
  const RaV = Ra * Math.cos(thetaDeg * DEG);
  if (stable) {
    // The switch at 60° is a step (a cold plate facing up: h 2.45 → 0.55 W/m²K between tilt 30°
    // and 29.9°); near it the other form is computed too, for the warning.
    const near = Math.abs(thetaDeg - STABLE_SWITCH_DEG) <= SWITCH_BAND_DEG;
    if (thetaDeg > STABLE_SWITCH_DEG) {
      b.id = "horizontal-plate-stable";
      b.RaEff = Ra;
      b.turbulent = false;
      b.nu = nuHorizontalPlateStable(Ra);
      if (near) b.altNu = nuVerticalPlateChurchillChu(RaV, Pr);
      return b.nu;
    }
    b.id = "churchill-chu-inclined-plate";
    b.RaEff = RaV;
    b.turbulent = RaV > 1e9;
    b.nu = nuVerticalPlateChurchillChu(RaV, Pr);
    if (near) b.altNu = nuHorizontalPlateStable(Ra);
    return b.nu;
  }
  const nuV = nuVerticalPlateChurchillChu(RaV, Pr);
  b.id = "churchill-chu-inclined-plate";
  b.RaEff = RaV;
  b.turbulent = RaV > 1e9;
  b.nu = nuV;
  const RaH = Ra * Math.sin(thetaDeg * DEG);
  const turbH = RaH > 1e7;
  const nuH = turbH ? nuHorizontalPlateUnstableTurbulent(RaH) : nuHorizontalPlateUnstableLaminar(RaH);
  if (nuH <= nuV) return nuV;
  b.id = turbH ? "horizontal-plate-unstable-turbulent" : "horizontal-plate-unstable-laminar";
  b.RaEff = RaH;
  b.turbulent = turbH;
  b.nu = nuH;
  return nuH;
}

/** Grashof number on length L with the full g (film properties). */
export function grashof(props: AirProperties, dT: number, L: number): number {
  const nu = props.nu_m2_s;
  return (G * props.beta_1_K * Math.abs(dT) * L * L * L) / (nu * nu);
}

/** Every intermediate value of a combined plate coefficient, refilled by plateCombinedInto. */
export interface PlateCombinedState {
  h: number;
  Nu: number;
  /** Forced part on L. */
  NuF: number;
  Re: number;
  /** Natural part on H, and rescaled to L. */
  NuN_H: number;
  NuN: number;
  hN: number;
  Gr_H: number;
  Ra_H: number;
  Pr: number;
  Ri: number | null;
  natural: NaturalBranch;
}

export function newPlateCombinedState(): PlateCombinedState {
  return { h: 0, Nu: 0, NuF: 0, Re: 0, NuN_H: 0, NuN: 0, hN: 0, Gr_H: 0, Ra_H: 0, Pr: 0, Ri: null, natural: newNaturalBranch() };
}

/**
 * The numeric inputs of plateCombinedAt, set field by field by its caller: an object argument
 * passes as it is, where number arguments to a call the optimiser does not inline are boxed into
 * fresh heap numbers on every call (the surface iteration calls it several times per case).
 */
export interface PlateCombinedInputs {
  /** Surface and air temperatures, K. */
  Ts: number;
  Ta: number;
  /** Velocity along the plate, m/s; forced length L and natural-convection height H, m. */
  V: number;
  L: number;
  tiltDeg: number;
  H: number;
  ReCrit: number;
}

/** A fresh PlateCombinedInputs (doubles from the start, so its fields hold doubles in place). */
export function newPlateCombinedInputs(): PlateCombinedInputs {
  return { Ts: 0.5, Ta: 0.5, V: 0.5, L: 0.5, tiltDeg: 0.5, H: 0.5, ReCrit: 0.5 };
}

const INPUTS = newPlateCombinedInputs();

/**
 * Combined convection on a plate (Churchill 1977, n = 3): forced on length L along the flow with
 * Re_crit 5×10^5, natural on height H at the tilt, Nu_N rescaled to L, Ri = Gr_L/Re_L² (null when
 * Re_L² is 0 or the ratio overflows). Returns h_c and fills `s`.
 */
export function plateCombinedInto(
  props: AirProperties,
  Ts: number,
  Ta: number,
  V: number,
  L: number,
  tiltDeg: number,
  H: number,
  ReCrit: number,
  s: PlateCombinedState,
): number {
  const a = INPUTS;
  a.Ts = Ts;
  a.Ta = Ta;
  a.V = V;
  a.L = L;
  a.tiltDeg = tiltDeg;
  a.H = H;
  a.ReCrit = ReCrit;
  plateCombinedAt(props, a, s);
  return s.h;
}

/** plateCombinedInto with its numbers in `a`; h_c is left in `s.h`. */
export function plateCombinedAt(props: AirProperties, a: PlateCombinedInputs, s: PlateCombinedState): void {
  const Ts = a.Ts;
  const Ta = a.Ta;
  const V = a.V;
  const L = a.L;
  const H = a.H;
  const Pr = props.Pr;
  const k = props.k_W_mK;
  const Re = (V * L) / props.nu_m2_s;
  const NuF = nuPlateForced(Re, Pr, a.ReCrit);
  const Gr = grashof(props, Ts - Ta, H);
  const Ra = Gr * Pr;
  const NuN_H = nuPlateNatural(Ra, Pr, a.tiltDeg, Ts >= Ta, s.natural);
  const NuN = (NuN_H * L) / H;
  const Nu = nuCombinedChurchill(NuF, NuN, 3);
  const Re2 = Re * Re;
  let Ri: number | null = null;
  if (Re2 > 0) {
    const r = L / H;
    Ri = (Gr * r * r * r) / Re2;
    // A speed so small that Ri overflows is still air for this purpose.
    if (!Number.isFinite(Ri)) Ri = null;
  }
  s.Nu = Nu;
  s.NuF = NuF;
  s.Re = Re;
  s.NuN_H = NuN_H;
  s.NuN = NuN;
  s.hN = (NuN_H * k) / H;
  s.Gr_H = Gr;
  s.Ra_H = Ra;
  s.Pr = Pr;
  s.Ri = Ri;
  s.h = (Nu * k) / L;
}
