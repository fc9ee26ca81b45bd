/**
 * The schedule as the page carries it to the browser: each sheet's rows as arrays of values under
 * one list of keys, and text columns with few distinct values (zone and build-up ids, choices) as
 * indexes into a list of those values. A 5,000-row schedule is ≈ 2.3 MB as objects inside the
 * page and ≈ 0.9 MB packed; the page's HTML is read and parsed on the browser's main thread, and
 * every byte of it delays the first rows. `unpackSchedule(packSchedule(s))` equals `s` (same keys
 * in the same order, so the rows have the shape JSON.parse gives them).
 */
import type { TSchedule } from "@/schemas/schedule";

type Value = string | number | boolean | null;

interface PackedRows {
  keys: string[];
  /** Per key: the distinct texts its column's indexes point into (null stays null), or null when stored as is. */
  dicts: (string[] | null)[];
  rows: Value[][];
}

export interface PackedSchedule extends Omit<TSchedule, "surfaces" | "duct_runs"> {
  packed: 1;
  surfaces: PackedRows;
  duct_runs: PackedRows;
}

/** A text column is kept as indexes when its distinct values are at most this share of its rows. */
const DICT_SHARE = 0.25;

function packRows(rows: readonly object[]): PackedRows {
  const first = rows[0] as Record<string, Value> | undefined;
  const keys = first ? Object.keys(first) : [];
  const dicts = keys.map((k) => {
    const seen = new Map<string, number>();
    for (const r of rows) {
      const v = (r as Record<string, Value>)[k];
      if (v === null) continue;
      if (typeof v !== "string") return null;
      if (!seen.has(v)) seen.set(v, seen.size);
    }
    return rows.length > 0 && seen.size <= rows.length * DICT_SHARE ? [...seen.keys()] : null;
  });
  const index = dicts.map((d) => (d ? new Map(d.map((v, i) => [v, i])) : null));
  const packed = rows.map((r) => {
    const rec = r as Record<string, Value>;
    if (Object.keys(rec).length !== keys.length) throw new Error("packSchedule: rows of one sheet must have the same keys");
    return keys.map((k, i) => {
      const v = rec[k] as Value;
      if (v === undefined) throw new Error(`packSchedule: a row has no ${k}`);
      return index[i] && v !== null ? index[i]!.get(v as string)! : v;
    });
  });
  return { keys, dicts, rows: packed };
}

function unpackRows<T>(p: PackedRows): T[] {
  const { keys, dicts, rows } = p;
  const n = keys.length;
  const out = new Array<T>(rows.length);
  for (let r = 0; r < rows.length; r++) {
    const values = rows[r]!;
    const o: Record<string, Value> = {};
    for (let i = 0; i < n; i++) {
      const d = dicts[i];
      const v = values[i]!;
      o[keys[i]!] = d && v !== null ? d[v as number]! : v;
    }
    out[r] = o as T;
  }
  return out;
}

export function packSchedule(s: TSchedule): PackedSchedule {
  return { ...s, packed: 1, surfaces: packRows(s.surfaces), duct_runs: packRows(s.duct_runs) };
}

export function unpackSchedule(p: PackedSchedule): TSchedule {
  const { packed: _packed, surfaces, duct_runs, ...rest } = p;
  return { ...rest, surfaces: unpackRows(surfaces), duct_runs: unpackRows(duct_runs) } as TSchedule;
}

// The page's packed text of each schedule read from it, kept beside that schedule object: the
// results worker is sent the text (one string to copy), where copying the 5,000 row objects
// across held the page's main thread ≈ 60 ms while it was loading.
const texts = new WeakMap<TSchedule, string>();

/** The schedule in the page's packed JSON text, remembering the text for that schedule object. */
export function scheduleFromText(text: string): TSchedule {
  const s = unpackSchedule(JSON.parse(text) as PackedSchedule);
  texts.set(s, text);
  return s;
}

/** The packed text `s` was read from (scheduleFromText), or undefined for any other schedule (an edited one is a new object). */
export function packedTextOf(s: TSchedule): string | undefined {
  return texts.get(s);
}
