/** The contract's entry points: one case, or a whole request body. */
import { CalcBodyError, CaseReader, InputError, type CalcResult } from "./contract";
import { KIND_NAMES, KINDS } from "./kinds";
import { surfaceResultFinite, type SurfaceResult } from "./surface";

function fail(id: string | null, field: string, message: string): CalcResult {
  return { id, ok: false, error: { code: "invalid_input", field, message } };
}

/** True when every number in the value is finite (the contract never answers NaN or Infinity). */
function allFinite(o: Record<string, unknown>): boolean {
  for (const k in o) {
    const v = o[k];
    if (typeof v === "number" && !Number.isFinite(v)) return false;
  }
  return true;
}

/** Computes one case; never throws for bad input. */
export function calculateCase(c: unknown): CalcResult {
  if (c === null || typeof c !== "object" || Array.isArray(c)) {
    return fail(null, "case", "each case must be an object with a kind");
  }
  const raw = c as Record<string, unknown>;
  let id: string | null = null;
  if (raw.id !== undefined) {
    if (typeof raw.id === "string") id = raw.id;
    else if (typeof raw.id === "number" && Number.isFinite(raw.id)) id = String(raw.id);
    else return fail(null, "id", "id must be a string");
  }
  const kind = raw.kind;
  if (typeof kind !== "string" || !Object.prototype.hasOwnProperty.call(KINDS, kind)) {
    const what = kind === undefined ? "kind is required" : `unknown kind ${JSON.stringify(kind)}`;
    return fail(id, "kind", `${what}; valid kinds: ${KIND_NAMES.join(", ")}`);
  }
  try {
    const out = KINDS[kind](new CaseReader(raw), id);
    // The `surface` kind's result has a fixed shape, checked field by field (see
    // surfaceResultFinite); a loop over the keys would copy each number it reads.
    const finite = kind === "surface" ? surfaceResultFinite(out as SurfaceResult) : allFinite(out as Record<string, unknown>);
    if (!finite) {
      return fail(id, "kind", "the inputs lead outside the range where this method gives a finite answer");
    }
    return out;
  } catch (e) {
    if (e instanceof InputError) return fail(id, e.field, e.message);
    throw e;
  }
}

/** Computes every case of a contract body `{ "cases": [ … ] }`, answering in the same order. */
export function calculate(body: unknown): { results: CalcResult[] } {
  if (body === null || typeof body !== "object" || Array.isArray(body)) {
    throw new CalcBodyError('the body must be a JSON object { "cases": [ … ] }');
  }
  const cases = (body as Record<string, unknown>).cases;
  if (!Array.isArray(cases)) throw new CalcBodyError('"cases" must be an array of case objects');
  return { results: cases.map(calculateCase) };
}
