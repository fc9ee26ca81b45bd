/**
 * The method statement in Markdown, written from the registry and the conventions: the source of
 * docs/methods.md (npm run docs:methods) and of the report's method appendix.
 */
import { CONVENTIONS } from "./conventions";
import { METHODS, METHOD_BY_ID, type MethodEntry, type MethodFamily } from "./registry";
import { rangeText } from "./validity";

export const FAMILY_TITLES: Record<MethodFamily, string> = {
  properties: "Air properties and site pressure",
  forced: "Forced convection over external bodies",
  natural: "Natural convection",
  combined: "Combined forced and natural convection",
  internal: "Inside ducts",
  exterior: "Empirical exterior coefficients",
  wind: "Wind at height",
  radiation: "Long-wave radiation",
  psychrometrics: "Moist air",
  duct: "Duct runs",
};

/** "Re ≤ 1e8; Pr 0.6…60" — the validity ranges of a method in words. */
export function validityText(m: MethodEntry): string {
  const parts = Object.entries(m.ranges).map(([q, r]) => `${q} ${rangeText(r)}${r.minSlack ? ` (lower bound with ${r.minSlack * 100} % slack)` : ""}`);
  return parts.length > 0 ? parts.join("; ") : "no published limits beyond its definition";
}

/** One method as a report or a working prints it. */
export function methodStatementMethod(id: string): { id: string; title: string; equation: string; source: string; validity: string; evaluation: string } {
  const m = METHOD_BY_ID[id];
  return { id, title: m.title, equation: m.equation, source: m.source, validity: validityText(m), evaluation: m.evaluation };
}

export function methodsByFamily(): [MethodFamily, MethodEntry[]][] {
  const out = new Map<MethodFamily, MethodEntry[]>();
  for (const m of METHODS) {
    const list = out.get(m.family) ?? [];
    list.push(m);
    out.set(m.family, list);
  }
  return [...out.entries()];
}

export function methodStatementMarkdown(): string {
  const lines: string[] = [
    "# Filmsheet method statement",
    "",
    "Written from the engine's registry (`src/calc/registry.ts`) by `npm run docs:methods`; a test",
    "keeps this file in step with the code. Every correlation the engine uses is listed with its",
    "equation, the temperature at which air properties are taken, its validity range and its source.",
    "",
    "> Results are engineering estimates. Every design must be verified by a competent, licensed",
    "> engineer under the codes and standards that apply where it is built.",
    "",
    "## Conventions",
    "",
  ];
  for (const c of CONVENTIONS) lines.push(`- **${c.topic}.** ${c.text}`);
  for (const [family, list] of methodsByFamily()) {
    lines.push("", `## ${FAMILY_TITLES[family]}`, "");
    for (const m of list) {
      lines.push(
        `### ${m.title}`,
        "",
        `- id: \`${m.id}\` (function \`${m.fnName}\` in \`src/calc/${m.module}.ts\`)`,
        `- equation: ${m.equation}`,
        `- properties at: ${m.evaluation}`,
        `- validity: ${validityText(m)}`,
        `- source: ${m.source}`,
        "",
      );
    }
  }
  return lines.join("\n").replace(/\n{3,}/g, "\n\n").trimEnd() + "\n";
}
