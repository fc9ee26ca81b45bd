/** Helpers to write working lines and collect the methods they apply. */
import { T0 } from "../constants";
import { methodStatementMethod } from "../method-statement";
import { METHOD_BY_ID } from "../registry";
import type { AirProperties } from "../properties/air";
import type { MethodUsed, WorkingLine } from "./types";

export class LineWriter {
  readonly lines: WorkingLine[] = [];
  private readonly ids: string[] = [];

  constructor(private section = "Inputs") {}

  /** Starts a new group of lines. */
  to(section: string): this {
    this.section = section;
    return this;
  }

  add(label: string, symbol: string, value: WorkingLine["value"], unit = "", note?: string, method?: string): this {
    const line: WorkingLine = { section: this.section, label, symbol, value, unit };
    if (note !== undefined) line.note = note;
    if (method !== undefined) {
      line.method = method;
      this.use(method);
    }
    this.lines.push(line);
    return this;
  }

  /** A temperature given in kelvin, shown in °C. */
  tempK(label: string, symbol: string, T_K: number, note?: string, method?: string): this {
    return this.add(label, symbol, T_K - T0, "°C", note, method);
  }

  /** The air properties of one evaluation, with the temperature they were taken at. */
  air(props: AirProperties, where: string, symbol = "T_f"): this {
    const m = "air-lemmon-jacobsen";
    this.tempK(`Air temperature of the properties (${where})`, symbol, props.T_K, undefined, m);
    this.add("Pressure", "p", props.p_Pa, "Pa");
    this.add("Density", "ρ", props.rho_kg_m3, "kg/m³", "p/(R T), R = 287.05 J/kgK");
    this.add("Dynamic viscosity", "μ", props.mu_Pa_s, "Pa·s");
    this.add("Kinematic viscosity", "ν", props.nu_m2_s, "m²/s", "μ/ρ");
    this.add("Thermal conductivity", "k", props.k_W_mK, "W/mK");
    this.add("Specific heat", "c_p", props.cp_J_kgK, "J/kgK");
    this.add("Prandtl number", "Pr", props.Pr, "", "c_p μ/k");
    this.add("Expansion coefficient", "β", props.beta_1_K, "1/K", "1/T");
    return this;
  }

  use(id: string): void {
    if (METHOD_BY_ID[id] !== undefined && !this.ids.includes(id)) this.ids.push(id);
  }

  methods(): MethodUsed[] {
    return this.ids.map(methodStatementMethod);
  }
}
