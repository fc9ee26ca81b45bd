/**
 * The conventions of the engine in words, for the method page, docs/methods.md and reports.
 * They restate shared/design/calc-contract.md; the engine's code is the authority.
 */
export interface Convention {
  topic: string;
  text: string;
}

export const CONVENTIONS: readonly Convention[] = [
  { topic: "Units", text: "SI throughout, with the unit in every field name. Temperatures are °C on the wire and kelvin inside the engine. Pressure defaults to 101 325 Pa; site pressure from altitude follows the standard atmosphere." },
  { topic: "Tilt", text: "tilt_deg is the angle between the surface and the horizontal ground, measured on the side the surface faces: 0 is horizontal facing up (a flat roof), 90 vertical (a wall), 180 horizontal facing down (a soffit). θ = |tilt − 90| is the angle from vertical." },
  { topic: "Azimuth and wind direction", text: "azimuth_deg is the direction of the outward normal, clockwise from north. wind_from_deg is the direction the wind comes from. A surface is windward when the wind comes from within 90° of its normal (90° included); horizontal surfaces count as windward. Leeward surfaces see leeward_factor (0.25 by default) times the local wind." },
  { topic: "Sign of heat flow", text: "For surfaces, q_W_m2 and Q_W are positive for heat lost from inside to outside and negative for a gain. For duct runs, Q_W is the heat gained by the air: negative when the air cools on its way." },
  { topic: "Evaluation temperature", text: "Air properties are taken at the film temperature (T_surface + T_air)/2 unless a method says otherwise: Whitaker's sphere at the free-stream air temperature with μ_s at the surface; duct flow at the bulk air temperature; duct runs at the mean air temperature of the run." },
  { topic: "Characteristic lengths", text: "Forced flow over a plate: the length along the wind. Natural convection: the height of a vertical or inclined plate, area/perimeter of a horizontal one. Cylinders and spheres: the diameter. Ducts: the hydraulic diameter 4A/P." },
  { topic: "Natural convection at any tilt", text: "Vertical: Churchill & Chu. Stable side (hot facing down, cold facing up): Churchill & Chu with g·cos θ up to 60° from vertical, 0.52 Ra^⅕ beyond. Unstable side (hot facing up, cold facing down): the larger of Churchill & Chu with g·cos θ and the horizontal forms with g·sin θ (Raithby & Hollands). Ra and Gr are reported with the full g." },
  { topic: "Combined convection", text: "Nu^n = Nu_F^n + Nu_N^n (n = 3 for plates, 4 for cylinders), both on the forced length; the regime is named from Ri = Gr/Re²: forced up to 0.1, natural above 10, combined between." },
  { topic: "Outside surface balance", text: "(T_inside − T_s)/(R_si + R_construction) + absorptance·solar = h_c (T_s − T_outside) + h_r (T_s − T_r), solved for T_s to 0.001 K. T_r⁴ = F_sky T_sky⁴ + (1 − F_sky) T_outside⁴ with F_sky = (1 + cos tilt)/2 and T_sky by Swinbank. U = 1/(R_si + R_construction + 1/h_o); sol-air temperature T_solair = (h_c T_outside + h_r T_r + absorptance·solar)/h_o." },
  { topic: "Inside surface resistance", text: "In a schedule, each surface takes R_si from ISO 6946 by the direction of heat flow in the design case: 0.10 m²K/W upwards, 0.13 horizontal (within ±30° of the horizontal plane), 0.17 downwards; heat flows outward when the inside is the warmer side. A single calculation takes R_si as given (0.13 when omitted)." },
  { topic: "Duct runs", text: "UA per metre from the inside film, the insulation (cylindrical on round ducts, mean perimeter on rectangular) and the outside convection and radiation at the mean air temperature. Leaving temperature by the exponential law; surface temperatures at both ends; condensation when the colder end is below the ambient dew point plus margin; the minimum insulation is the least thickness, to 0.1 mm and at most 0.2 m, that avoids it in still air. In a schedule, a run crosses the space at its surround temperature (in cooling cases its cooling surround when one is given), or the outdoor air when there is none. A run out of doors in the outdoor air radiates to a surround of half sky (Swinbank's clear-sky temperature) and half ground at the outdoor air temperature; sunshine on ducts is not modelled." },
  { topic: "Validity", text: "Outside a correlation's published range the engine still answers and adds an out_of_range warning naming the quantity, its value and the range. Lower Prandtl limits of 0.7 and 0.71 get 1.5 % slack, since ordinary air sits at 0.70–0.72 (common practice). Regime words at a boundary take the lower side." },
];
