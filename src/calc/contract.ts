/**
 * Types and input reading of calculation contract v1 (shared/design/calc-contract.md).
 * Input errors are thrown as InputError and turned into per-case `ok: false` results by index.ts.
 */

export interface CalcWarning {
  code: string;
  message: string;
  /** Registry id of the method whose range was left (out_of_range only). */
  method?: string;
  quantity?: string;
  value?: number;
  min?: number;
  max?: number;
}

export interface CalcErrorBody {
  code: "invalid_input";
  field: string;
  message: string;
}

/** Outputs of a case: numbers, words, flags and nulls by the contract's names. */
export type Outputs = Record<string, unknown>;

export type CalcResult =
  | ({ id: string | null; ok: true; correlation: string; warnings: CalcWarning[] } & Outputs)
  | { id: string | null; ok: false; error: CalcErrorBody };

/** A bad input of one case, naming the field. */
export class InputError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = "InputError";
  }
}

/** A request body that is not of the contract's shape ({ "cases": [ … ] }). */
export class CalcBodyError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "CalcBodyError";
  }
}

export interface NumberRule {
  /** Inclusive lower bound. */
  min?: number;
  /** Exclusive lower bound. */
  gt?: number;
  /** Inclusive upper bound. */
  max?: number;
  /** Why the bound exists, appended to the message. */
  why?: string;
}

function describe(v: unknown): string {
  if (typeof v === "string") return JSON.stringify(v.length > 40 ? v.slice(0, 40) + "…" : v);
  if (v === null) return "null";
  if (Array.isArray(v)) return "an array";
  if (typeof v === "object") return "an object";
  return String(v);
}

/** Reads and checks the fields of one case. Optional numbers are tested with `=== undefined`. */
export class CaseReader {
  constructor(readonly raw: Record<string, unknown>) {}

  has(field: string): boolean {
    return this.raw[field] !== undefined;
  }

  /** A required finite number within the rule's bounds. */
  num(field: string, rule: NumberRule = {}): number {
    const v = this.raw[field];
    if (v === undefined) throw new InputError(field, `${field} is required`);
    return this.check(field, v, rule);
  }

  /** An optional finite number; `fallback` when absent. */
  optNum(field: string, fallback: number, rule: NumberRule = {}): number {
    const v = this.raw[field];
    if (v === undefined) return fallback;
    return this.check(field, v, rule);
  }

  /** A temperature in °C: finite and above absolute zero. */
  tempC(field: string, fallback?: number): number {
    const rule = { gt: -273.15, why: "absolute zero is −273.15 °C" };
    return fallback === undefined ? this.num(field, rule) : this.optNum(field, fallback, rule);
  }

  /** One of a fixed set of words. */
  oneOf<T extends string>(field: string, options: readonly T[], fallback?: T): T {
    const v = this.raw[field];
    if (v === undefined) {
      if (fallback !== undefined) return fallback;
      throw new InputError(field, `${field} is required: one of ${options.join(", ")}`);
    }
    if (typeof v !== "string" || !(options as readonly string[]).includes(v)) {
      throw new InputError(field, `${field} must be one of ${options.join(", ")} (got ${describe(v)})`);
    }
    return v as T;
  }

  private check(field: string, v: unknown, rule: NumberRule): number {
    if (typeof v !== "number" || !Number.isFinite(v)) {
      throw new InputError(field, `${field} must be a finite number (got ${describe(v)})`);
    }
    const why = rule.why ? ` (${rule.why})` : "";
    if (rule.gt !== undefined && !(v > rule.gt)) throw new InputError(field, `${field} must be > ${rule.gt}${why}`);
    if (rule.min !== undefined && v < rule.min) throw new InputError(field, `${field} must be ≥ ${rule.min}${why}`);
    if (rule.max !== undefined && v > rule.max) throw new InputError(field, `${field} must be ≤ ${rule.max}${why}`);
    return v;
  }
}

/** Site pressure, the optional field of every kind. */
export function readPressure(r: CaseReader): number {
  return r.optNum("pressure_Pa", 101325, { min: 1000, max: 200000, why: "site pressures lie between 1 kPa and 200 kPa" });
}
