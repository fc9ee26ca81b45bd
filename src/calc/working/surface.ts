/** The working of a `surface` case: every step of surfaceCore, in order. */
import type { CalcWarning } from "../contract";
import { T0 } from "../constants";
import { hcIso6946, hcMcAdams } from "../convection/empirical";
import { plateForcedBranch } from "../select";
import { newSurfaceTrace, surfaceCore, SURFACE_DEFAULTS, type SurfaceInput } from "../surface";
import { hAgainstWind, localHProfile } from "./charts";
import { LineWriter } from "./lines";
import type { Working } from "./types";

export function surfaceWorking(s: SurfaceInput, id: string | null): Working {
  const tr = newSurfaceTrace();
  const r = surfaceCore(s, [] as CalcWarning[], id, tr);
  const d = SURFACE_DEFAULTS;
  const w = new LineWriter("Inputs");
  const dflt = (v: unknown) => (v === undefined ? "default" : undefined);
  w.add("Area", "A", s.area_m2, "m²")
    .add("Tilt from horizontal", "tilt", s.tilt_deg, "°", "0 faces up, 90 vertical, 180 faces down")
    .add("Azimuth of the outward normal", "az", s.azimuth_deg, "°", "clockwise from north")
    .add("Centroid height", "z", s.height_m, "m")
    .add("Length along the wind", "L", s.length_m, "m")
    .add("Panel height (natural convection)", "H", s.panel_height_m, "m")
    .add("Construction resistance", "R_c", s.R_construction_m2K_W, "m²K/W")
    .add("Inside surface resistance", "R_si", s.R_si_m2K_W ?? d.R_si_m2K_W, "m²K/W", dflt(s.R_si_m2K_W))
    .add("Inside temperature", "T_in", s.T_inside_C, "°C")
    .add("Outdoor temperature", "T_out", s.T_outside_C, "°C")
    .add("Met-mast wind speed", "V_met", s.V_met_m_s, "m/s")
    .add("Wind from", "dir", s.wind_from_deg, "°")
    .add("Terrain", "terrain", s.terrain)
    .add("Emissivity", "ε", s.emissivity)
    .add("Solar absorptance", "α", s.absorptance)
    .add("Solar irradiance on the surface", "G", s.solar_W_m2 ?? d.solar_W_m2, "W/m²", dflt(s.solar_W_m2))
    .add("Exterior convection method", "method", s.method)
    .add("Critical Reynolds number (boundary layer)", "Re_crit", tr.Re_crit, "", s.Re_crit === undefined ? "default: turbulent from the leading edge" : undefined)
    .add("Cloud cover", "c", tr.cloud_cover, "", s.cloud_cover === undefined ? "default: clear sky" : "0 clear … 1 overcast")
    .add("Site pressure", "p", tr.pressure_Pa, "Pa", dflt(s.pressure_Pa));

  const lawId = tr.law === "log" ? "wind-log-law-en1991" : "wind-power-law";
  w.to("Wind at the surface")
    .add("Met-mast height (open terrain)", "H_met", tr.met_height_m, "m", dflt(s.met_height_m))
    .add("Wind at the centroid height", "V_local", r.V_local_m_s, "m/s", tr.law === "log" ? "V_met c_r(z)/c_r,open(H_met)" : "V_met (δ_met/H_met)^a_met (z/δ)^a", lawId)
    .add("Exposure to the wind", "w", r.exposure, "", "max(clamp((100° − Δ)/20°), clamp((20° − t)/10°)); Δ wind to normal, t tilt from horizontal")
    .add("Faces the wind", "windward", r.windward, "", "exposure ≥ 0.5")
    .add("Leeward factor", "f_lee", tr.leeward_factor, "", "share of the wind a sheltered face sees")
    .add("Wind over the surface", "V", r.V_surface_m_s, "m/s", "V_local (f_lee + (1 − f_lee) w)");

  w.to("Sky and surroundings")
    .tempK("Sky temperature", "T_sky", tr.T_sky_K, tr.cloud_cover === 0 ? "clear: 0.0552 T_out^1.5 (K)" : "T_sky⁴ = (1 − c) (0.0552 T_out^1.5)⁴ + c T_out⁴", "sky-swinbank")
    .add("Sky view factor", "F_sky", tr.F_sky, "", "(1 + cos tilt)/2")
    .tempK("Radiant temperature of sky and ground", "T_r", tr.T_radiant_K, "T_r⁴ = F_sky T_sky⁴ + (1 − F_sky) T_out⁴");

  w.to("Surface balance")
    .add("Resistance inside the outer face", "R_in", tr.R_in_m2K_W, "m²K/W", "R_si + R_c")
    .add("Absorbed solar", "αG", tr.absorbed_solar_W_m2, "W/m²")
    .add("Iterations (Newton, to 0.001 K)", "n", tr.iterations)
    .tempK("Surface temperature at the last evaluation", "T_s,eval", tr.T_eval_K);

  w.to("Air properties").air(tr.props, "film temperature (T_s + T_out)/2");

  w.to("Convection");
  let localH = null;
  let wind = null;
  let current = null;
  const c = tr.combined;
  if (c !== null) {
    const f = plateForcedBranch(c.Re, tr.Re_crit);
    const reCritText = tr.Re_crit === 0 ? "turbulent from the leading edge" : `Re_crit ${tr.Re_crit.toExponential(1).replace("e+", "×10^")}`;
    const k = tr.props.k_W_mK;
    w.add("Reynolds number on L", "Re_L", c.Re, "", "V L/ν")
      .add("Forced-convection Nusselt number", "Nu_F", c.NuF, "", `${f.regime}, ${reCritText}`, f.id)
      .add("Grashof number on H", "Gr_H", c.Gr_H, "", "g β |T_s − T_out| H³/ν²")
      .add("Rayleigh number on H", "Ra_H", c.Ra_H, "", "Gr Pr")
      .add("Rayleigh number of the branch used", "Ra_eff", c.natural.RaEff, "", "with g·cos θ or g·sin θ when inclined")
      .add("Natural-convection Nusselt number on H", "Nu_N,H", c.NuN_H, "", c.natural.turbulent ? "turbulent" : "laminar", c.natural.id)
      .add("Natural-convection Nusselt number on L", "Nu_N", c.NuN, "", "Nu_N,H L/H")
      .add("Richardson number", "Ri", c.Ri, "", "Gr_L/Re_L²; forced ≤ 0.1 < combined ≤ 10 < natural")
      .add("Combined Nusselt number", "Nu", c.Nu, "", "(Nu_F³ + Nu_N³)^⅓", "churchill-combined-plate")
      .add("Forced part of h", "h_F", (c.NuF * k) / s.length_m, "W/m²K", "Nu_F k/L")
      .add("Natural part of h", "h_N", c.hN, "W/m²K", "Nu_N,H k/H");
    localH = localHProfile(tr.props, r.V_surface_m_s, s.length_m, tr.Re_crit);
    wind = hAgainstWind(tr.props, tr.T_eval_K, s.T_outside_C + T0, s.length_m, s.tilt_deg, s.panel_height_m, tr.Re_crit);
    current = { V_m_s: r.V_surface_m_s, h_W_m2K: r.h_c_W_m2K };
  } else {
    const formula = s.method === "iso6946" ? "4 + 4V" : "2.8 + 3.0V (convective part; V ≤ 7 m/s)";
    w.add("Exterior convection coefficient formula", "h_c(V)", formula, "", undefined, r.correlation);
    const fn = s.method === "iso6946" ? hcIso6946 : hcMcAdams;
    wind = [];
    for (let V = 0; V <= 15 + 1e-9; V += 0.5) wind.push({ V_m_s: V, h_forced_W_m2K: fn(V), h_natural_W_m2K: 0, h_combined_W_m2K: fn(V) });
    current = { V_m_s: r.V_surface_m_s, h_W_m2K: r.h_c_W_m2K };
  }
  w.add("Convective coefficient", "h_c", r.h_c_W_m2K, "W/m²K", `regime: ${r.regime}`, r.correlation)
    .add("Radiative coefficient", "h_r", r.h_r_W_m2K, "W/m²K", "ε σ (T_s² + T_r²)(T_s + T_r)", "radiation-linearised");

  w.to("Results")
    .add("Outside coefficient", "h_o", r.h_o_W_m2K, "W/m²K", "h_c + h_r")
    .add("Outside surface temperature", "T_s", r.T_surface_C, "°C", "balance with h_c, h_r above")
    .add("Sol-air temperature", "T_sa", r.T_solair_C, "°C", "(h_c T_out + h_r T_r + αG)/h_o")
    .add("U-value", "U", r.U_W_m2K, "W/m²K", "1/(R_si + R_c + 1/h_o)")
    .add("Heat flow density", "q", r.q_W_m2, "W/m²", "(T_in − T_s)/(R_si + R_c); positive is a loss")
    .add("Heat flow", "Q", r.Q_W, "W", "q A")
    .add("Part that reconciles with U·ΔT", "q_air", r.q_air_W_m2, "W/m²", "U (T_in − T_out)")
    .add("Part from sky and sun", "q_sky,sun", r.q_sky_solar_W_m2, "W/m²", "q − q_air: the cold sky adds, the sun takes away");
  for (const x of r.warnings) if (x.method !== undefined) w.use(x.method);
  w.use("air-lemmon-jacobsen");
  return { kind: "surface", result: r, lines: w.lines, methods: w.methods(), charts: { local_h: localH, h_vs_wind: wind, current } };
}
