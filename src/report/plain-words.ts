/**
 * Plain words for the identifiers the engine speaks in (registry ids, exterior methods, regimes,
 * warning codes), for people: the working on screen and the report print these, and keep the
 * identifier only in a tooltip or the method statement's appendix column.
 */
import { METHOD_BY_ID } from "@/calc/registry";
import { scientific } from "@/units/notation";

const WORDS: Record<string, string> = {
  boundary_layer: "boundary layer over the surface",
  iso6946: "ISO 6946 simplified",
  mcadams: "McAdams wind coefficient",
  forced: "forced (wind)",
  natural: "natural (buoyancy)",
  combined: "forced and natural together",
  empirical: "empirical wind formula",
  laminar: "laminar",
  turbulent: "turbulent",
  transitional: "transitional",
  out_of_range: "Outside the published range",
  invalid_input: "Input refused",
  not_converged: "Balance not converged",
  inside_mould_risk: "Inside surface: mould risk",
  inside_condensation_risk: "Inside surface: condensation risk",
  round: "round",
  rectangular: "rectangular",
  heating: "heating",
  cooling: "cooling",
};

/** The method's title from the registry ("Duct, turbulent flow (Gnielinski …)"); unknown ids as words. */
export function methodTitle(id: string): string {
  return METHOD_BY_ID[id]?.title ?? spaced(id);
}

function spaced(id: string): string {
  return id.replace(/[_-]+/g, " ");
}

/** One identifier as words: a registry id becomes its title, a known word its phrase. */
export function plainWord(id: string): string {
  return WORDS[id] ?? (METHOD_BY_ID[id] !== undefined ? METHOD_BY_ID[id]!.title : /^[a-z0-9]+([_-][a-z0-9]+)+$/.test(id) ? spaced(id) : id);
}

const IDENTIFIER = new RegExp(
  `\\b(${[...Object.keys(WORDS).filter((k) => /[_-]|\d/.test(k) || k === "mcadams"), ...Object.keys(METHOD_BY_ID)].sort((a, b) => b.length - a.length).join("|")})\\b`,
  "g",
);

/** Prose with any identifier in it (conventions, notes, warning messages) put into words, and
 * computer exponents (1.000e8, 5e5) in engineering notation (1×10⁸, 5×10⁵). */
export function plainText(text: string): string {
  return text
    .replace(IDENTIFIER, (id) => plainWord(id))
    .replace(/\b(\d+(?:\.\d+)?)e([+-]?\d+)\b/g, (_, m: string, e: string) => scientific(Number(`${m}e${e}`), Math.max(1, m.replace(/\.?0+$/, "").replace(".", "").length)));
}
