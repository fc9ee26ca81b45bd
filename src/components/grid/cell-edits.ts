/**
 * A cell edit from what was typed to stored values: converted to SI, the whole row checked with
 * the same schema the server uses (messages in the person's units), and a few helpful fills (a
 * duct switched to rectangular gets an equal-area section to start from).
 */
import { numberProblem } from "@/schemas/schedule-fields";
import type { TSheet } from "@/schemas/schedule";
import { SHEET_COLUMNS, type SheetColumn } from "@/schedule/sheet-columns";
import { fromDisplay, type UnitSystem } from "@/units/units";
import type { Row } from "@/components/schedule/schedule-cache";

const META = new Set(["id", "version", "position"]);

let schemas: (typeof import("./row-schemas"))["ROW_SCHEMAS"] | null = null;
let loading: Promise<void> | null = null;

/** Loads the row schemas (zod and the schedule's schemas, ≈ 20 ms to evaluate), once. */
export function loadRowSchemas(): Promise<void> {
  loading ??= import("./row-schemas").then(
    (m) => {
      schemas = m.ROW_SCHEMAS;
    },
    (e: unknown) => {
      loading = null;
      throw e;
    },
  );
  return loading;
}

/**
 * Runs `check` (which reads rowProblems) at once when the row schemas are loaded, else as soon as
 * they are; `failed` when they cannot be loaded (nothing is sent then).
 */
export function withRowSchemas(check: () => void, failed: () => void): void {
  if (schemas) check();
  else loadRowSchemas().then(check, failed);
}

/** Every problem of a whole row, by field, worded in the unit system (after loadRowSchemas). */
export function rowProblems(sheet: TSheet, row: Record<string, unknown>, system: UnitSystem): Map<string, string> {
  if (!schemas) throw new Error("The row schemas are not loaded: call loadRowSchemas (or withRowSchemas) first");
  const values = Object.fromEntries(Object.entries(row).filter(([k]) => !META.has(k)));
  const parsed = schemas[sheet].safeParse(values);
  const out = new Map<string, string>();
  if (parsed.success) return out;
  for (const issue of parsed.error.issues) {
    const field = String(issue.path[0] ?? "");
    const col = SHEET_COLUMNS[sheet].find((c) => c.field === field);
    const inUnits = col?.kind === "number" ? numberProblem(col.spec!, values[field] as number | null, system) : null;
    if (!out.has(field)) out.set(field, inUnits ?? issue.message);
  }
  return out;
}

/** What a typed value stores as (SI, ids, null for blank). */
export function storedValue(col: SheetColumn, shown: unknown, system: UnitSystem): unknown {
  if (col.kind === "number") {
    if (shown === null || shown === undefined || shown === "") return null;
    const n = typeof shown === "number" ? shown : Number(shown);
    return Number.isFinite(n) ? fromDisplay(col.spec!.quantity, n, system) : Number.NaN;
  }
  if (col.kind === "text") return String(shown ?? "").trim();
  if (col.kind === "flag") return shown === true || shown === "yes";
  if (col.kind === "choice") return shown === "" || shown === null || shown === undefined ? (col.blankValue ?? null) : String(shown);
  return shown === null || shown === undefined ? "" : String(shown);
}

/** Fills that make a change complete: an equal-area section when a duct changes shape. */
export function completeChange(sheet: TSheet, row: Row, values: Record<string, unknown>): Record<string, unknown> {
  if (sheet !== "duct_runs" || values.shape === undefined || values.shape === row.shape) return values;
  const d = row.diameter_m as number | null;
  const w = row.width_m as number | null;
  const h = row.height_m as number | null;
  if (values.shape === "rect" && (w === null || h === null) && d !== null) {
    // A square of the same area as the round duct, to the millimetre.
    const side = Math.round(Math.sqrt((Math.PI * d * d) / 4) * 1000) / 1000;
    return { width_m: side, height_m: side, ...values };
  }
  if (values.shape === "round" && d === null && w !== null && h !== null) {
    return { diameter_m: Math.round(Math.sqrt((4 * w * h) / Math.PI) * 1000) / 1000, ...values };
  }
  return values;
}

export type EditOutcome = { ok: true; values: Record<string, unknown> } | { ok: false; message: string };

/** One cell typed into: the values to save, or why not (the row's other problems are not this edit's). */
export function editCell(sheet: TSheet, row: Row, col: SheetColumn, shown: unknown, system: UnitSystem): EditOutcome {
  const value = storedValue(col, shown, system);
  if (typeof value === "number" && Number.isNaN(value)) return { ok: false, message: `${col.title} must be a number` };
  const values = completeChange(sheet, row, { [col.field]: value });
  const problems = rowProblems(sheet, { ...row, ...values }, system);
  const before = rowProblems(sheet, row, system);
  const fresh = [...problems].filter(([f, m]) => before.get(f) !== m);
  if (fresh.length) return { ok: false, message: fresh.map(([, m]) => m).join("; ") };
  return { ok: true, values };
}
