/** The working of a `duct_run` case: every step of the duct-run evaluation, in order. */
import type { CalcResult } from "../contract";
import { fDarcyPetukhov } from "../convection/internal";
import { ductRunCore, newDuctRunTrace, type DuctRunInput } from "../duct-run";
import { RE_LAMINAR_MAX, RE_TURBULENT_MIN, type DuctInternal } from "../kinds/internal";
import { LineWriter } from "./lines";
import type { Working } from "./types";

export function ductRunWorking(d: DuctRunInput, result: CalcResult): Working {
  const tr = newDuctRunTrace();
  const o = ductRunCore(d, [], tr);
  const round = d.shape === "round";
  const w = new LineWriter("Inputs");
  w.add("Shape", "shape", d.shape);
  if (round) w.add("Inside diameter", "D", d.diameter_m as number, "m");
  else w.add("Inside width", "W", d.width_m as number, "m").add("Inside height", "H", d.height_m as number, "m");
  w.add("Length", "L", d.length_m, "m")
    .add("Air flow", "V̇", d.flow_m3_s, "m³/s")
    .add("Entering air temperature", "T_E", d.T_entering_C, "°C")
    .add("Ambient air temperature", "T_amb", d.T_ambient_C, "°C")
    .add("Ambient relative humidity", "RH", d.RH_ambient_pct, "%")
    .add("Surroundings (radiation)", "T_sur", d.T_surround_C, "°C")
    .add("Insulation thickness", "t", d.insulation_thickness_m, "m")
    .add("Insulation conductivity", "k_ins", d.insulation_k_W_mK, "W/mK")
    .add("Jacket emissivity", "ε", d.jacket_emissivity)
    .add("Location", "location", d.location)
    .add("Wind across the duct", "V_w", d.V_wind_m_s, "m/s")
    .add("Condensation margin", "Δ", d.margin_K, "K")
    .add("Jacket solar absorptance", "α", d.absorptance)
    .add("Solar irradiance on the horizontal", "G", d.solar_W_m2, "W/m²")
    .add("Wall roughness", "ε_r", d.roughness_m, "m")
    .add("Site pressure", "p", d.pressure_Pa, "Pa");

  w.to("Section")
    .add("Flow area", "A", tr.area_m2, "m²")
    .add("Inside perimeter", "P_i", tr.P_i_m, "m")
    .add("Hydraulic diameter", "D_h", tr.internal?.Dh_m ?? null, "m", "4A/P_i");
  if (round) w.add("Outside diameter", "D_o", tr.D_o_m, "m", "D + 2t");
  else w.add("Outside width", "W_o", tr.W_o_m, "m", "W + 2t").add("Outside height", "H_o", tr.H_o_m, "m", "H + 2t");
  w.add("Outside perimeter", "P_o", tr.P_o_m, "m");

  w.to("Inside the duct");
  if (tr.inside_props !== null) w.air(tr.inside_props, "mean air temperature of the run", "T_m");
  const i = tr.internal;
  if (i !== null) {
    w.add("Velocity", "v", i.velocity_m_s, "m/s", "V̇/A").add("Reynolds number", "Re", i.Re, "", "v D_h/ν");
    frictionLines(w, i, round, tr.inside_props?.rho_kg_m3 ?? null, d.roughness_m);
    w.add("Inside film coefficient", "h_i", o.h_i_W_m2K, "W/m²K", "Nu k/D_h")
      .add("Inside film resistance", "R′_i", tr.R_i_mK_W, "m·K/W", "1/(h_i P_i)");
  }
  w.to("Insulation").add(
    "Insulation resistance",
    "R′_ins",
    tr.R_ins_mK_W,
    "m·K/W",
    round ? "ln(D_o/D)/(2π k_ins)" : "t/(k_ins (P_i + P_o)/2)",
    round ? "insulation-cylindrical" : "insulation-mean-perimeter",
  );

  w.to("Outside the duct").tempK("Jacket temperature at the mean air temperature", "T_so", tr.T_so_K);
  if (tr.outside_props !== null) w.air(tr.outside_props, "film temperature (T_so + T_amb)/2");
  w.add(
    "Natural convection",
    "h_N",
    tr.h_natural,
    "W/m²K",
    round ? "horizontal cylinder on D_o" : "sides on H_o, top and bottom as horizontal plates on W_o/2, area-weighted",
    round ? "churchill-chu-horizontal-cylinder" : "churchill-chu-vertical-plate",
  );
  if (d.V_wind_m_s > 0) {
    w.add("Wind across the duct", "h_F", tr.h_forced, "W/m²K", round ? "on D_o" : "on P_o/π", "churchill-bernstein-cylinder")
      .add("Outside convection", "h_o,c", o.h_o_conv_W_m2K, "W/m²K", round ? "(h_F⁴ + h_N⁴)^¼" : "(h_F³ + h_N³)^⅓", round ? "churchill-combined-cylinder" : "churchill-combined-plate");
  } else {
    w.add("Outside convection", "h_o,c", o.h_o_conv_W_m2K, "W/m²K", "still air: natural convection only");
  }
  w.add("Outside radiation", "h_o,r", o.h_o_rad_W_m2K, "W/m²K", "ε σ (T_so² + T_sur²)(T_so + T_sur)", "radiation-linearised");

  const ntu = (o.UA_per_m_W_mK * d.length_m) / (o.mass_flow_kg_s * (tr.inside_props?.cp_J_kgK ?? 1006));
  w.to("The run")
    .add("Overall conductance per metre", "UA′", o.UA_per_m_W_mK, "W/mK", "1/(R′_i + R′_ins + 1/((h_o,c + h_o,r) P_o))")
    .add("Absorbed sun per metre", "S", d.absorptance * d.solar_W_m2 * (round ? tr.D_o_m : tr.W_o_m), "W/m", "α G W, W the outer width (G on the horizontal)")
    .add("Environment temperature", "T_env", o.T_env_C, "°C", "(h_o,c T_amb + h_o,r T_sur + S/P_o)/(h_o,c + h_o,r)")
    .add("Mass flow", "ṁ", o.mass_flow_kg_s, "kg/s", "ρ(T_E) V̇")
    .add("Number of transfer units", "NTU", ntu, "", "UA′ L/(ṁ c_p)")
    .add("Leaving air temperature", "T_L", o.T_leaving_C, "°C", "T_env + (T_E − T_env) e^−NTU", "duct-run-exponential")
    .add("Heat gained by the air", "Q", o.Q_W, "W", "ṁ c_p (T_L − T_E); negative is a loss");

  w.to("Condensation")
    .add("Jacket temperature, entering end", "T_s,E", o.T_surface_entering_C, "°C")
    .add("Jacket temperature, leaving end", "T_s,L", o.T_surface_leaving_C, "°C")
    .add("Ambient dew point", "T_dp", o.T_dp_C, "°C", undefined, "dew-point-hyland-wexler")
    .add("Condensation", "cond", o.condensation, "", "colder end below T_dp + margin")
    .add("Least insulation that avoids it (still air)", "t_min", o.min_insulation_thickness_m, "m", "to 0.1 mm, at most 0.5 m, no sun; null: not within 0.5 m");
  if (result.ok) for (const x of result.warnings) if (x.method !== undefined) w.use(x.method);
  return { kind: "duct_run", result, lines: w.lines, methods: w.methods(), charts: { local_h: null, h_vs_wind: null, current: null } };
}

/**
 * The two friction factors of the inside flow, each named for what it is used for: Gnielinski's
 * Nusselt number is fitted with Petukhov's smooth-tube factor, whatever the wall, while the
 * pressure drop takes Colebrook–White's on the wall's roughness. They differ (a rough wall has
 * the larger), so the working shows both beside the line that uses each.
 */
function frictionLines(w: LineWriter, i: DuctInternal, round: boolean, rho: number | null, roughness_m: number): void {
  const laminarNu = round ? "fully developed laminar, 3.66" : "fully developed laminar (Shah and London, by aspect ratio)";
  if (i.regime === "laminar") {
    w.add("Nusselt number", "Nu", i.Nu, "", laminarNu, i.correlation);
  } else {
    // Across the band 2300…3000 the Nusselt number is blended up to Gnielinski's value at 3000.
    const ReP = i.regime === "turbulent" ? i.Re : RE_TURBULENT_MIN;
    const at = i.regime === "turbulent" ? "" : ` at Re ${RE_TURBULENT_MIN}, the end of the blend`;
    w.add("Friction factor for heat transfer (smooth duct)", "f_P", fDarcyPetukhov(ReP), "", `(0.790 ln Re − 1.64)⁻²${at}; used only in the Nusselt number`, "petukhov-friction");
    if (i.regime === "turbulent") w.add("Nusselt number", "Nu", i.Nu, "", "(f_P/8)(Re − 1000)Pr / [1 + 12.7 (f_P/8)^½ (Pr^⅔ − 1)]", "gnielinski-petukhov");
    else w.add("Nusselt number", "Nu", i.Nu, "", `linear in Re from the laminar value at ${RE_LAMINAR_MAX} to Gnielinski's (with f_P) at ${RE_TURBULENT_MIN}`, "duct-transitional-blend");
  }
  w.add("Relative roughness of the wall", "ε_r/D_h", roughness_m / i.Dh_m, "");
  const fLam = round ? "64/Re" : "(f Re)/Re, f Re by Shah and London for the aspect ratio";
  if (i.regime === "laminar") w.add("Friction factor for the pressure drop", "f", i.f_darcy, "", `${fLam}; laminar flow, roughness does not count`);
  else if (i.regime === "transitional") w.add("Friction factor for the pressure drop", "f", i.f_darcy, "", `linear in Re from ${fLam} at ${RE_LAMINAR_MAX} to Colebrook–White at ${RE_TURBULENT_MIN}`, "colebrook");
  else w.add("Friction factor for the pressure drop", "f", i.f_darcy, "", "1/√f = −2 log10(ε_r/(3.7 D_h) + 2.51/(Re √f)), solved by iteration", "colebrook");
  if (rho !== null) w.add("Pressure drop per metre of straight duct", "Δp/L", (i.f_darcy * rho * i.velocity_m_s ** 2) / (2 * i.Dh_m), "Pa/m", "f ρ v²/(2 D_h)");
}
