/**
 * The one table of methods: every correlation the engine uses, with the function it dispatches
 * to, its validity ranges as data, the temperature its properties are taken at and its source.
 * The /methods page and docs/methods.md are written from this table.
 */
import * as combined from "./convection/combined";
import * as ductHeat from "./convection/duct-heat";
import * as empirical from "./convection/empirical";
import * as forced from "./convection/forced-external";
import * as internal from "./convection/internal";
import * as natural from "./convection/natural";
import * as air from "./properties/air";
import * as atmosphere from "./properties/atmosphere";
import * as psychro from "./psychrometrics/dew-point";
import * as radiation from "./radiation/radiation";
import * as wind from "./wind/wind-profile";
import type { Ranges } from "./validity";

// eslint-disable-next-line @typescript-eslint/no-explicit-any
type AnyFn = (...args: any[]) => unknown;

export type MethodFamily =
  | "properties"
  | "forced"
  | "natural"
  | "combined"
  | "internal"
  | "exterior"
  | "wind"
  | "radiation"
  | "psychrometrics"
  | "duct";

export interface MethodEntry {
  id: string;
  title: string;
  family: MethodFamily;
  /** The equation in plain text. */
  equation: string;
  /** The function this id dispatches to, and its exported name in `module`. */
  fn: AnyFn;
  module: string;
  fnName: string;
  /** Validity ranges by quantity, as data. */
  ranges: Ranges;
  /** Where the properties are evaluated. */
  evaluation: string;
  /** Full citation. */
  source: string;
}

/** The engine's modules by name, so that a test can check every entry against its module. */
export const MODULES: Readonly<Record<string, Readonly<Record<string, unknown>>>> = {
  "properties/air": air,
  "properties/atmosphere": atmosphere,
  "convection/forced-external": forced,
  "convection/natural": natural,
  "convection/combined": combined,
  "convection/internal": internal,
  "convection/empirical": empirical,
  "convection/duct-heat": ductHeat,
  "wind/wind-profile": wind,
  "radiation/radiation": radiation,
  "psychrometrics/dew-point": psychro,
};

const PR_AIR_SLACK = 0.015;
const FILM = "film temperature (T_surface + T_air)/2";
const BULK = "bulk (mean) air temperature";

export const METHODS: readonly MethodEntry[] = [
  {
    id: "air-lemmon-jacobsen",
    title: "Dry-air properties (ideal gas; Lemmon & Jacobsen transport properties)",
    family: "properties",
    equation: "ρ = p/(R T), R = 287.05 J/kgK; μ, k = dilute-gas + residual terms; cp from table; β = 1/T",
    fn: air.airProperties,
    module: "properties/air",
    fnName: "airProperties",
    ranges: { T_C: { min: -50, max: 150, unit: "°C" } },
    evaluation: "as requested",
    source:
      "E. W. Lemmon, R. T. Jacobsen, Viscosity and thermal conductivity equations for nitrogen, oxygen, argon, and air, Int. J. Thermophys. 25 (2004) 21–69; cp: Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer, Table A.4",
  },
  {
    id: "standard-atmosphere",
    title: "Site pressure from altitude (standard atmosphere)",
    family: "properties",
    equation: "p = 101325 (1 − 2.25577×10⁻⁵ z)^5.25588",
    fn: atmosphere.pressureAtAltitude,
    module: "properties/atmosphere",
    fnName: "pressureAtAltitude",
    ranges: { altitude_m: { min: -500, max: 11000, unit: "m" } },
    evaluation: "n/a",
    source: "ISO 2533:1975 Standard Atmosphere; ASHRAE Handbook—Fundamentals (2017), ch. 1, eq. 3",
  },
  {
    id: "flat-plate-laminar",
    title: "Flat plate, laminar, average",
    family: "forced",
    equation: "Nu_L = 0.664 Re_L^½ Pr^⅓",
    fn: forced.nuFlatPlateLaminarAverage,
    module: "convection/forced-external",
    fnName: "nuFlatPlateLaminarAverage",
    ranges: { Pr: { min: 0.6 }, Re: { min: 1e3 } },
    evaluation: FILM,
    source: "E. Pohlhausen, Z. angew. Math. Mech. 1 (1921) 115–121; Incropera et al., Fundamentals of Heat and Mass Transfer, eq. 7.30",
  },
  {
    id: "flat-plate-mixed",
    title: "Flat plate, mixed boundary layer (laminar then turbulent), average",
    family: "forced",
    equation: "Nu_L = (0.037 Re_L^0.8 − A) Pr^⅓, A = 0.037 Re_c^0.8 − 0.664 Re_c^½ (871 for Re_c = 5×10⁵)",
    fn: forced.nuFlatPlateMixedAverage,
    module: "convection/forced-external",
    fnName: "nuFlatPlateMixedAverage",
    ranges: { Pr: { min: 0.6, max: 60 }, Re: { min: 1e3, max: 1e8 } },
    evaluation: FILM,
    source: "Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer (6th ed.), eqs. 7.38–7.41",
  },
  {
    id: "flat-plate-turbulent",
    title: "Flat plate, turbulent from the leading edge (Re_crit = 0), average",
    family: "forced",
    equation: "Nu_L = 0.037 Re_L^0.8 Pr^⅓",
    fn: forced.nuFlatPlateMixedAverage,
    module: "convection/forced-external",
    fnName: "nuFlatPlateMixedAverage",
    ranges: { Pr: { min: 0.6, max: 60 }, Re: { min: 1e3, max: 1e8 } },
    evaluation: FILM,
    source: "Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer (6th ed.), eq. 7.38",
  },
  {
    id: "flat-plate-local-laminar",
    title: "Flat plate, laminar, local",
    family: "forced",
    equation: "Nu_x = 0.332 Re_x^½ Pr^⅓",
    fn: forced.nuFlatPlateLaminarLocal,
    module: "convection/forced-external",
    fnName: "nuFlatPlateLaminarLocal",
    ranges: { Pr: { min: 0.6 }, Re_x: { min: 1e3 } },
    evaluation: FILM,
    source: "Incropera et al., Fundamentals of Heat and Mass Transfer, eq. 7.23 (Pohlhausen 1921)",
  },
  {
    id: "flat-plate-local-turbulent",
    title: "Flat plate, turbulent, local",
    family: "forced",
    equation: "Nu_x = 0.0296 Re_x^0.8 Pr^⅓",
    fn: forced.nuFlatPlateTurbulentLocal,
    module: "convection/forced-external",
    fnName: "nuFlatPlateTurbulentLocal",
    ranges: { Pr: { min: 0.6, max: 60 }, Re_x: { min: 1e3, max: 1e8 } },
    evaluation: FILM,
    source: "Incropera et al., Fundamentals of Heat and Mass Transfer, eq. 7.36 (Colburn analogy with Schlichting's skin friction)",
  },
  {
    id: "churchill-chu-vertical-plate",
    title: "Vertical plate, natural convection (Churchill & Chu)",
    family: "natural",
    equation: "Nu_L = {0.825 + 0.387 Ra^⅙ / [1 + (0.492/Pr)^(9/16)]^(8/27)}²",
    fn: natural.nuVerticalPlateChurchillChu,
    module: "convection/natural",
    fnName: "nuVerticalPlateChurchillChu",
    ranges: { Ra: { min: 0.1, max: 1e12 } },
    evaluation: FILM,
    source:
      "S. W. Churchill, H. H. S. Chu, Correlating equations for laminar and turbulent free convection from a vertical plate, Int. J. Heat Mass Transfer 18 (1975) 1323–1329",
  },
  {
    id: "churchill-chu-inclined-plate",
    title: "Inclined plate, natural convection (Churchill & Chu with g·cos θ)",
    family: "natural",
    equation: "vertical form with Ra·cos θ, θ = |tilt − 90°| from vertical",
    fn: natural.nuVerticalPlateChurchillChu,
    module: "convection/natural",
    fnName: "nuVerticalPlateChurchillChu",
    ranges: { Ra: { min: 0.1, max: 1e12 } },
    evaluation: FILM,
    source:
      "Churchill & Chu (1975), Int. J. Heat Mass Transfer 18, 1323–1329, with g·cos θ after G. D. Raithby, K. G. T. Hollands, in Handbook of Heat Transfer (3rd ed., 1998), ch. 4",
  },
  {
    id: "horizontal-plate-unstable-laminar",
    title: "Horizontal plate, hot facing up or cold facing down, laminar",
    family: "natural",
    equation: "Nu_L = 0.54 Ra^¼, L = area/perimeter",
    fn: natural.nuHorizontalPlateUnstableLaminar,
    module: "convection/natural",
    fnName: "nuHorizontalPlateUnstableLaminar",
    ranges: { Ra: { min: 1e4, max: 1e7 } },
    evaluation: FILM,
    source: "J. R. Lloyd, W. R. Moran, Natural convection adjacent to horizontal surface of various planforms, J. Heat Transfer 96 (1974) 443–447",
  },
  {
    id: "horizontal-plate-unstable-turbulent",
    title: "Horizontal plate, hot facing up or cold facing down, turbulent",
    family: "natural",
    equation: "Nu_L = 0.15 Ra^⅓, L = area/perimeter",
    fn: natural.nuHorizontalPlateUnstableTurbulent,
    module: "convection/natural",
    fnName: "nuHorizontalPlateUnstableTurbulent",
    ranges: { Ra: { min: 1e7, max: 1e11 } },
    evaluation: FILM,
    source: "J. R. Lloyd, W. R. Moran, J. Heat Transfer 96 (1974) 443–447",
  },
  {
    id: "horizontal-plate-stable",
    title: "Horizontal plate, hot facing down or cold facing up",
    family: "natural",
    equation: "Nu_L = 0.52 Ra^⅕, L = area/perimeter",
    fn: natural.nuHorizontalPlateStable,
    module: "convection/natural",
    fnName: "nuHorizontalPlateStable",
    ranges: { Ra: { min: 1e4, max: 1e9 } },
    evaluation: FILM,
    source: "G. D. Raithby, K. G. T. Hollands, Natural convection, in Handbook of Heat Transfer (3rd ed., McGraw-Hill 1998), ch. 4; Incropera et al. (7th ed.), eq. 9.32",
  },
  {
    id: "churchill-chu-horizontal-cylinder",
    title: "Horizontal cylinder, natural convection (Churchill & Chu)",
    family: "natural",
    equation: "Nu_D = {0.60 + 0.387 Ra^⅙ / [1 + (0.559/Pr)^(9/16)]^(8/27)}²",
    fn: natural.nuHorizontalCylinderChurchillChu,
    module: "convection/natural",
    fnName: "nuHorizontalCylinderChurchillChu",
    ranges: { Ra: { min: 1e-5, max: 1e12 } },
    evaluation: FILM,
    source:
      "S. W. Churchill, H. H. S. Chu, Correlating equations for laminar and turbulent free convection from a horizontal cylinder, Int. J. Heat Mass Transfer 18 (1975) 1049–1053",
  },
  {
    id: "churchill-sphere-natural",
    title: "Sphere, natural convection (Churchill)",
    family: "natural",
    equation: "Nu_D = 2 + 0.589 Ra^¼ / [1 + (0.469/Pr)^(9/16)]^(4/9)",
    fn: natural.nuSphereNaturalChurchill,
    module: "convection/natural",
    fnName: "nuSphereNaturalChurchill",
    ranges: { Ra: { max: 1e11 }, Pr: { min: 0.7, minSlack: PR_AIR_SLACK } },
    evaluation: FILM,
    source: "S. W. Churchill, Free convection around immersed bodies, in Heat Exchanger Design Handbook, §2.5.7, Hemisphere (1983)",
  },
  {
    id: "churchill-bernstein-cylinder",
    title: "Cylinder in cross-flow (Churchill & Bernstein)",
    family: "forced",
    equation: "Nu_D = 0.3 + 0.62 Re^½ Pr^⅓ / [1 + (0.4/Pr)^⅔]^¼ · [1 + (Re/282000)^⅝]^⅘",
    fn: forced.nuCylinderCrossflowChurchillBernstein,
    module: "convection/forced-external",
    fnName: "nuCylinderCrossflowChurchillBernstein",
    ranges: { RePr: { min: 0.2 } },
    evaluation: FILM,
    source:
      "S. W. Churchill, M. Bernstein, A correlating equation for forced convection from gases and liquids to a circular cylinder in crossflow, J. Heat Transfer 99 (1977) 300–306",
  },
  {
    id: "whitaker-sphere",
    title: "Sphere in a stream (Whitaker)",
    family: "forced",
    equation: "Nu_D = 2 + (0.4 Re^½ + 0.06 Re^⅔) Pr^0.4 (μ/μ_s)^¼",
    fn: forced.nuSphereForcedWhitaker,
    module: "convection/forced-external",
    fnName: "nuSphereForcedWhitaker",
    ranges: {
      Re: { min: 3.5, max: 7.6e4 },
      Pr: { min: 0.71, max: 380, minSlack: PR_AIR_SLACK },
      mu_ratio: { min: 1, max: 3.2 },
    },
    evaluation: "free-stream air temperature; μ_s at the surface temperature",
    source: "S. Whitaker, Forced convection heat transfer correlations for flow in pipes, past flat plates, single cylinders, single spheres, and for flow in packed beds and tube bundles, AIChE J. 18 (1972) 361–371",
  },
  {
    id: "churchill-combined-plate",
    title: "Combined forced and natural convection, plates (Churchill, n = 3)",
    family: "combined",
    equation: "Nu³ = Nu_F³ + Nu_N³ on the forced length; Ri = Gr/Re²",
    fn: combined.nuCombinedChurchill,
    module: "convection/combined",
    fnName: "nuCombinedChurchill",
    ranges: {},
    evaluation: FILM,
    source: "S. W. Churchill, A comprehensive correlating equation for laminar, assisting, forced and free convection, AIChE J. 23 (1977) 10–16",
  },
  {
    id: "churchill-combined-cylinder",
    title: "Combined forced and natural convection, cylinders (Churchill, n = 4)",
    family: "combined",
    equation: "Nu⁴ = Nu_F⁴ + Nu_N⁴ on the diameter",
    fn: combined.nuCombinedChurchill,
    module: "convection/combined",
    fnName: "nuCombinedChurchill",
    ranges: {},
    evaluation: FILM,
    source: "S. W. Churchill, AIChE J. 23 (1977) 10–16",
  },
  {
    id: "laminar-round-duct",
    title: "Round duct, fully developed laminar flow",
    family: "internal",
    equation: "Nu = 3.66 (constant wall temperature); f = 64/Re",
    fn: internal.nuRoundDuctLaminar,
    module: "convection/internal",
    fnName: "nuRoundDuctLaminar",
    ranges: { Re: { max: 2300 } },
    evaluation: BULK,
    source: "W. M. Kays, M. E. Crawford, Convective Heat and Mass Transfer; Incropera et al., eq. 8.55",
  },
  {
    id: "shah-london-rectangular",
    title: "Rectangular duct, fully developed laminar flow (Shah & London)",
    family: "internal",
    equation: "Nu_T = 7.541(1 − 2.610α + 4.970α² − 5.119α³ + 2.702α⁴ − 0.548α⁵), α = short/long side",
    fn: internal.nuRectangularLaminarShahLondon,
    module: "convection/internal",
    fnName: "nuRectangularLaminarShahLondon",
    ranges: { Re: { max: 2300 } },
    evaluation: BULK,
    source: "R. K. Shah, A. L. London, Laminar Flow Forced Convection in Ducts, Academic Press (1978)",
  },
  {
    id: "shah-london-rectangular-friction",
    title: "Rectangular duct, laminar friction (Shah & London)",
    family: "internal",
    equation: "f·Re = 96(1 − 1.3553α + 1.9467α² − 1.7012α³ + 0.9564α⁴ − 0.2537α⁵)",
    fn: internal.fReRectangularShahLondon,
    module: "convection/internal",
    fnName: "fReRectangularShahLondon",
    ranges: { Re: { max: 2300 } },
    evaluation: BULK,
    source: "R. K. Shah, A. L. London, Laminar Flow Forced Convection in Ducts, Academic Press (1978)",
  },
  {
    id: "gnielinski-petukhov",
    title: "Duct, turbulent flow (Gnielinski with Petukhov's friction factor)",
    family: "internal",
    equation: "Nu = (f/8)(Re − 1000)Pr / [1 + 12.7 (f/8)^½ (Pr^⅔ − 1)], f = (0.790 ln Re − 1.64)⁻²",
    fn: internal.nuDuctTurbulentGnielinski,
    module: "convection/internal",
    fnName: "nuDuctTurbulentGnielinski",
    ranges: { Re: { min: 3000, max: 5e6 }, Pr: { min: 0.5, max: 2000 } },
    evaluation: BULK,
    source: "V. Gnielinski, New equations for heat and mass transfer in turbulent pipe and channel flow, Int. Chem. Eng. 16 (1976) 359–368; B. S. Petukhov, Adv. Heat Transfer 6 (1970) 503–564",
  },
  {
    id: "petukhov-friction",
    title: "Smooth-duct friction factor (Petukhov)",
    family: "internal",
    equation: "f = (0.790 ln Re − 1.64)⁻²",
    fn: internal.fDarcyPetukhov,
    module: "convection/internal",
    fnName: "fDarcyPetukhov",
    ranges: { Re: { min: 3000, max: 5e6 } },
    evaluation: BULK,
    source: "B. S. Petukhov, Heat transfer and friction in turbulent pipe flow with variable physical properties, Adv. Heat Transfer 6 (1970) 503–564",
  },
  {
    id: "colebrook",
    title: "Friction factor of rough ducts (Colebrook–White)",
    family: "internal",
    equation: "1/√f = −2 log10(ε/(3.7 D_h) + 2.51/(Re √f))",
    fn: internal.fDarcyColebrook,
    module: "convection/internal",
    fnName: "fDarcyColebrook",
    ranges: { Re: { min: 3000 } },
    evaluation: BULK,
    source: "C. F. Colebrook, Turbulent flow in pipes, with particular reference to the transition region between the smooth and rough pipe laws, J. Inst. Civ. Eng. 11 (1939) 133–156",
  },
  {
    id: "duct-transitional-blend",
    title: "Duct, transitional flow (linear blend 2300…3000)",
    family: "internal",
    equation: "Nu, f linear in Re between the laminar value at 2300 and the turbulent value at 3000",
    fn: internal.blendLinear,
    module: "convection/internal",
    fnName: "blendLinear",
    ranges: {},
    evaluation: BULK,
    source: "common practice; cf. V. Gnielinski, On heat transfer in tubes, Int. J. Heat Mass Transfer 63 (2013) 134–140",
  },
  {
    id: "wind-power-law",
    title: "Wind at height, power law by terrain",
    family: "wind",
    equation: "V = V_met (δ_met/H_met)^a_met (H/δ)^a; (a, δ): water 0.10/210 m, open 0.14/270 m, suburban 0.22/370 m, city 0.33/460 m",
    fn: wind.windSpeedPowerLaw,
    module: "wind/wind-profile",
    fnName: "windSpeedPowerLaw",
    ranges: {},
    evaluation: "n/a",
    source: "ASHRAE Handbook—Fundamentals (2017), ch. 24, Airflow around buildings, eq. 4 and table 1",
  },
  {
    id: "wind-log-law-en1991",
    title: "Wind at height, logarithmic law (EN 1991-1-4)",
    family: "wind",
    equation: "V = V_met c_r(z)/c_r,open(H_met), c_r = k_r ln(max(z, z_min)/z0), k_r = 0.19 (z0/0.05)^0.07",
    fn: wind.windSpeedLogLaw,
    module: "wind/wind-profile",
    fnName: "windSpeedLogLaw",
    ranges: { height_m: { max: 200, unit: "m" } },
    evaluation: "n/a",
    source: "EN 1991-1-4:2005, Eurocode 1: Actions on structures — Part 1-4: Wind actions, §4.3.2 and table 4.1",
  },
  {
    id: "radiation-linearised",
    title: "Long-wave radiation, linearised coefficient",
    family: "radiation",
    equation: "h_r = εσ(T_s² + T_r²)(T_s + T_r), kelvin",
    fn: radiation.hRadiation,
    module: "radiation/radiation",
    fnName: "hRadiation",
    ranges: {},
    evaluation: "surface and radiant temperatures",
    source: "ISO 6946:2017, annex C; Incropera et al., Fundamentals of Heat and Mass Transfer, eq. 1.9",
  },
  {
    id: "sky-swinbank",
    title: "Clear-sky temperature (Swinbank)",
    family: "radiation",
    equation: "T_sky = 0.0552 T_air^1.5 (K); F_sky = (1 + cos tilt)/2; T_r⁴ = F_sky T_sky⁴ + (1 − F_sky) T_air⁴",
    fn: radiation.skyTemperatureSwinbank,
    module: "radiation/radiation",
    fnName: "skyTemperatureSwinbank",
    ranges: {},
    evaluation: "outdoor air temperature",
    source: "W. C. Swinbank, Long-wave radiation from clear skies, Q. J. R. Meteorol. Soc. 89 (1963) 339–348; view factor: Duffie & Beckman, Solar Engineering of Thermal Processes, §3.16",
  },
  {
    id: "iso6946-simplified",
    title: "Exterior convection, ISO 6946 simplified",
    family: "exterior",
    equation: "h_c = 4 + 4v",
    fn: empirical.hcIso6946,
    module: "convection/empirical",
    fnName: "hcIso6946",
    ranges: {},
    evaluation: "n/a",
    source: "ISO 6946:2017, Building components and building elements — Thermal resistance and thermal transmittance — Calculation methods, annex C",
  },
  {
    id: "mcadams-wind",
    title: "Exterior convection, McAdams wind coefficient (convective part, Watmuff et al.)",
    family: "exterior",
    equation: "h_c = 2.8 + 3.0v (radiation and free convection removed from McAdams's 5.7 + 3.8v)",
    fn: empirical.hcMcAdams,
    module: "convection/empirical",
    fnName: "hcMcAdams",
    ranges: { V_surface_m_s: { max: 7, unit: "m/s" } },
    evaluation: "n/a",
    source: "J. H. Watmuff, W. W. S. Charters, D. Proctor, Solar and wind induced external coefficients for solar collectors, COMPLES No. 2 (1977) 56; W. H. McAdams, Heat Transmission (3rd ed.), McGraw-Hill (1954); Duffie & Beckman, Solar Engineering of Thermal Processes, §3.15",
  },
  {
    id: "dew-point-hyland-wexler",
    title: "Dew point (Hyland & Wexler saturation pressure, ASHRAE formulas)",
    family: "psychrometrics",
    equation: "p_v = RH·p_ws(T); T_dp solves p_ws(T_dp) = p_v; p_ws over ice at and below 0.01 °C, over water above",
    fn: psychro.dewPointHylandWexler,
    module: "psychrometrics/dew-point",
    fnName: "dewPointHylandWexler",
    ranges: { T_C: { min: -100, max: 200, unit: "°C" } },
    evaluation: "dry-bulb temperature",
    source: "R. W. Hyland, A. Wexler, ASHRAE Trans. 89(2A) (1983) 500–519; ASHRAE Handbook—Fundamentals (2017), ch. 1; as in psychrolib (D. Meyer, D. Thevenard, J. Open Source Softw. 4(33) 1137, 2019)",
  },
  {
    id: "duct-run-exponential",
    title: "Duct run, leaving-air temperature (exponential law)",
    family: "duct",
    equation: "T_L = T_env + (T_E − T_env) exp(−UA′ L/(ṁ c_p)), T_env = (h_conv T_ambient + h_rad T_surround)/(h_conv + h_rad)",
    fn: ductHeat.leavingAirTemperature,
    module: "convection/duct-heat",
    fnName: "leavingAirTemperature",
    ranges: {},
    evaluation: "inside film and outside coefficients at the mean air temperature of the run; ṁ from the density at the entering temperature",
    source: "ASHRAE Handbook—Fundamentals (2017), ch. 21, duct heat gain or loss; Incropera et al., Fundamentals of Heat and Mass Transfer, eq. 8.46a",
  },
  {
    id: "insulation-cylindrical",
    title: "Insulation on round ducts (cylindrical layer)",
    family: "duct",
    equation: "R′ = ln(D_o/D_i)/(2πk)",
    fn: ductHeat.insulationResistanceRound,
    module: "convection/duct-heat",
    fnName: "insulationResistanceRound",
    ranges: {},
    evaluation: "n/a",
    source: "Incropera et al., Fundamentals of Heat and Mass Transfer, eq. 3.33",
  },
  {
    id: "insulation-mean-perimeter",
    title: "Insulation on rectangular ducts (mean perimeter)",
    family: "duct",
    equation: "R′ = t/(k (P_i + P_o)/2)",
    fn: ductHeat.insulationResistanceRect,
    module: "convection/duct-heat",
    fnName: "insulationResistanceRect",
    ranges: {},
    evaluation: "n/a",
    source: "common practice (mean-area approximation for a layer on flat sides)",
  },
];

export const METHOD_BY_ID: Readonly<Record<string, MethodEntry>> = Object.fromEntries(
  METHODS.map((m) => [m.id, m]),
);

/** The entry of a registered id; throws listing the valid ids otherwise. */
export function methodOrThrow(id: string): MethodEntry {
  const m = METHOD_BY_ID[id];
  if (m === undefined) throw new Error(`unknown method "${id}"; registered: ${METHODS.map((x) => x.id).join(", ")}`);
  return m;
}

/** Calls the function a registered id names. */
export function dispatch(id: string, ...args: unknown[]): unknown {
  return methodOrThrow(id).fn(...args);
}
