/**
 * Numbers as a reader of workings and reports expects them: one rule per quantity (by its unit),
 * thousands separators as on the schedule, and engineering notation with superscripts
 * (1.85×10¹⁰) for very large and very small magnitudes, never "1.8537e+10".
 */

export interface NumberRule {
  /** Fixed decimals (temperatures, heat flows) … */
  decimals?: number;
  /** … or significant figures (everything else). */
  sig?: number;
}

// Temperatures to 0.1 K, heat flows to the watt and angles to the degree, as the schedule shows them; other quantities
// to three significant figures, dimensionless groups (Re, Nu, Pr …) to four.
const RULES: Record<string, NumberRule> = {
  "°C": { decimals: 1 },
  "°F": { decimals: 1 },
  W: { decimals: 0 },
  "°": { decimals: 0 },
  "Btu/h": { decimals: 0 },
  "": { sig: 4 },
};
const DEFAULT_RULE: NumberRule = { sig: 3 };

export function ruleFor(unit: string): NumberRule {
  return RULES[unit] ?? DEFAULT_RULE;
}

const SUPERSCRIPT: Record<string, string> = {
  "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹", "-": "⁻",
};

/** 1.85×10¹⁰ with `sig` significant figures; "−" is the minus sign. */
export function scientific(v: number, sig = 3): string {
  const [mantissa, exponent] = v.toExponential(Math.max(0, sig - 1)).split("e");
  const e = String(Number(exponent)).replace(/./g, (c) => SUPERSCRIPT[c] ?? c);
  return `${mantissa.replace("-", "−")}×10${e}`;
}

const formats = new Map<number, Intl.NumberFormat>();
function grouped(v: number, d: number): string {
  let f = formats.get(d);
  if (!f) {
    f = new Intl.NumberFormat("en-GB", { minimumFractionDigits: d, maximumFractionDigits: d });
    formats.set(d, f);
  }
  return f.format(v).replace("-", "−");
}

/**
 * A number by the rule of its unit: "12,345", "21.4", "0.0123", "1.85×10¹⁰". `rule` overrides
 * the unit's rule. Missing and non-finite values print as "–".
 */
export function formatNumber(v: number | null | undefined, unit = "", rule: NumberRule = ruleFor(unit)): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return "–";
  if (v === 0) return "0";
  const a = Math.abs(v);
  if (a >= 1e6 || a < 1e-3) return scientific(v, rule.sig ?? 3);
  if (rule.decimals !== undefined) {
    const s = grouped(Object.is(Number(v.toFixed(rule.decimals)), -0) ? 0 : v, rule.decimals);
    return s === "−0" || /^−0\.0*$/.test(s) ? s.slice(1) : s;
  }
  const sig = rule.sig ?? 3;
  const magnitude = Math.floor(Math.log10(a));
  const d = Math.max(0, sig - 1 - magnitude);
  return grouped(Number(v.toPrecision(sig)), d);
}
