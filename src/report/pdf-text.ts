/**
 * Text for jsPDF's standard fonts, which print Latin-1 only: Greek letters, minus signs,
 * superscripts and vulgar fractions of the method statement become their plain spellings.
 */
const MAP: Record<string, string> = {
  "θ": "theta", "ε": "eps", "σ": "sigma", "ρ": "rho", "μ": "\u00b5", "ν": "nu", "β": "beta", "α": "alpha",
  "δ": "delta", "Δ": "Delta", "π": "pi", "Σ": "Sum ", "Ω": "Omega", "η": "eta", "λ": "lambda", "γ": "gamma",
  "−": "-", "–": "-", "—": "-", "…": "...", "≤": "<=", "≥": ">=", "≈": "~", "∝": "~", "→": "->", "′": "'",
  "√": "sqrt", "∞": "inf", "⅓": "1/3", "⅔": "2/3", "⅕": "1/5", "⅘": "4/5", "⅙": "1/6", "⅝": "5/8",
  "⁰": "^0", "⁴": "^4", "⁵": "^5", "⁶": "^6", "⁷": "^7", "⁸": "^8", "⁹": "^9", "⁻": "^-", "ṁ": "m_dot",
  "V̇": "V_dot", "\u0307": "", "“": "\"", "”": "\"", "‘": "'", "’": "'", "•": "-", "×": "x",
};
const PATTERN = new RegExp(Object.keys(MAP).map((k) => k.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")).join("|"), "g");

/** The text as the standard PDF fonts can print it. */
export function pdfText(s: string): string {
  return s.replace(PATTERN, (c) => MAP[c] ?? c).replace(/[^\x00-\xff]/g, "?");
}
