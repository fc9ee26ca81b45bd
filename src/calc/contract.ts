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
  /**
   * `invalid_input` on the contract's wire; a schedule also answers `not_computed` for a row the
   * engine leaves out by design (a surface over ground).
   */
  code: "invalid_input" | "not_computed";
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

/**
 * A NumberRule with every bound present (±Infinity where there is none): one object shape for
 * every rule, so the checks on the hot path read them without megamorphic lookups.
 */
export interface Rule {
  readonly min: number;
  readonly gt: number;
  readonly max: number;
  readonly why: string;
}

export function rule(r: NumberRule = {}): Rule {
  return { min: r.min ?? -Infinity, gt: r.gt ?? -Infinity, max: r.max ?? Infinity, why: r.why ?? "" };
}

const ANY = rule();

function describe(v: unknown): string {
  if (typeof v === "string") return JSON.stringify(v.length > 40 ? v.slice(0, 40) + "…" : v);
  if (v === null) return "null";
  if (Array.isArray(v)) return "an array";
  if (typeof v === "object") return "an object";
  return String(v);
}

/**
 * The physical reach of the air model, 100 K…1000 K: below 100 K air at atmospheric pressure is
 * close to condensing (about 79–82 K at 1 atm), so the ideal gas and the dilute-gas transport terms
 * no longer describe it (at −260 °C they give a negative viscosity); above 1000 K the cp table is
 * long past its end. Between the reach and the validated −50…150 °C the engine answers and warns.
 */
export const T_REACH_MIN_C = -173.15;
export const T_REACH_MAX_C = 726.85;
const TEMP_RULE = rule({
  min: T_REACH_MIN_C,
  max: T_REACH_MAX_C,
  why: "outside the air model's reach of 100 K to 1000 K; air properties are validated for −50…150 °C",
});

/**
 * Reads and checks the fields of one case. Optional numbers are tested with `=== undefined`.
 * The `…At` forms take the value the caller read by name (`raw.area_m2`): named reads are the
 * fast path for the kinds that large schedules use; the short forms look the field up by key.
 */
export class CaseReader {
  constructor(readonly raw: Record<string, unknown>) {}

  has(field: string): boolean {
    return this.raw[field] !== undefined;
  }

  /** A required finite number within the rule's bounds. */
  num(field: string, rule: Rule = ANY): number {
    return this.numAt(field, this.raw[field], rule);
  }

  numAt(field: string, v: unknown, rule: Rule = ANY): number {
    if (v === undefined) throw new InputError(field, `${field} is required`);
    return check(field, v, rule);
  }

  /** An optional finite number; `fallback` when absent. */
  optNum(field: string, fallback: number, rule: Rule = ANY): number {
    return this.optNumAt(field, this.raw[field], fallback, rule);
  }

  optNumAt(field: string, v: unknown, fallback: number, rule: Rule = ANY): number {
    return v === undefined ? fallback : check(field, v, rule);
  }

  /** A temperature in °C: finite and within the air model's physical reach (100 K…1000 K). */
  tempC(field: string, fallback?: number): number {
    return this.tempCAt(field, this.raw[field], fallback);
  }

  tempCAt(field: string, v: unknown, fallback?: number): number {
    return fallback === undefined ? this.numAt(field, v, TEMP_RULE) : this.optNumAt(field, v, fallback, TEMP_RULE);
  }

  /** One of a fixed set of words. */
  oneOf<T extends string>(field: string, options: readonly T[], fallback?: T): T {
    return this.oneOfAt(field, this.raw[field], options, fallback);
  }

  oneOfAt<T extends string>(field: string, v: unknown, options: readonly T[], fallback?: T): T {
    if (v === undefined) {
      if (fallback !== undefined) return fallback;
      throw new InputError(field, `${field} is required: one of ${options.join(", ")}`);
    }
    if (typeof v !== "string" || !(options as readonly string[]).includes(v)) {
      throw new InputError(field, `${field} must be one of ${options.join(", ")} (got ${describe(v)})`);
    }
    return v as T;
  }
}

/**
 * A checked number. Small on purpose: the optimiser inlines it into the kinds' readers, so a
 * number read from the case is compared where it was loaded, not boxed into a fresh heap number
 * to be passed to a call (a surface case reads about twenty of them).
 */
function check(field: string, v: unknown, r: Rule): number {
  if (typeof v === "number" && v > r.gt && v >= r.min && v <= r.max && v - v === 0) return v;
  return refuse(field, v, r);
}

/** Throws the InputError that names why `v` fails `r` (check's slow path). */
function refuse(field: string, v: unknown, r: Rule): never {
  if (typeof v !== "number" || !Number.isFinite(v)) {
    throw new InputError(field, `${field} must be a finite number (got ${describe(v)})`);
  }
  if (!(v > r.gt)) throw new InputError(field, `${field} must be > ${r.gt}${because(r)}`);
  if (v < r.min) throw new InputError(field, `${field} must be ≥ ${r.min}${because(r)}`);
  if (v > r.max) throw new InputError(field, `${field} must be ≤ ${r.max}${because(r)}`);
  throw new InputError(field, `${field} must be a finite number (got ${describe(v)})`);
}

function because(r: Rule): string {
  return r.why ? ` (${r.why})` : "";
}

export const PRESSURE = rule({ min: 1000, max: 200000, why: "site pressures lie between 1 kPa and 200 kPa" });

/** Site pressure, the optional field of every kind. */
export function readPressure(r: CaseReader): number {
  return r.optNum("pressure_Pa", 101325, PRESSURE);
}
