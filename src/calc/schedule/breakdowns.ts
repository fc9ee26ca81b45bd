/**
 * The totals people ask for beside the zone totals, per design case: by orientation, by element
 * type (wall, roof, floor, glazing, duct) and by build-up, and each zone's peak heating and
 * cooling case. The zone-totals panel, the XLSX export and the report all read this one function.
 *
 * Every row adds in exactly as it does to the zone totals (src/calc/zone.ts), so the element
 * lines sum to the zones' heat loss and heat gain:
 * - a surface's Q_W is its heat loss, positive out: Q ≥ 0 adds to loss, Q < 0 adds −Q to gain;
 * - a duct run's Q_W is the heat to its air: for a run crossing unconditioned or outdoor space,
 *   Q ≤ 0 (the air cools) adds −Q to loss and Q > 0 (the air warms) adds Q to gain; a run inside
 *   the zone it serves gives its heat to that zone and is left out (counted, for reference).
 * Orientation and build-up lines hold surfaces only (a duct has neither), so they sum to the
 * fabric part. Rows not computed (over ground) or with errors are counted and named, not totalled.
 */
import type { CalcResult } from "../contract";
import { zoneTotals, type ZoneRowResult } from "../zone";
import type { Schedule, ScheduleResults } from "./results";
import { ORIENTATIONS, type Buildup, type DesignCase, type Orientation } from "./types";

export type OrientationBin = Orientation | "up" | "down";
export const ORIENTATION_BINS: readonly OrientationBin[] = [...ORIENTATIONS, "up", "down"];
export const ORIENTATION_LABELS: Record<OrientationBin, string> = {
  N: "N", NE: "NE", E: "E", SE: "SE", S: "S", SW: "SW", W: "W", NW: "NW",
  up: "Facing up (roofs)", down: "Facing down (floors, soffits)",
};

export const ELEMENT_TYPES = ["wall", "roof", "floor", "glazing", "duct"] as const;
export type ElementType = (typeof ELEMENT_TYPES)[number];
export const ELEMENT_LABELS: Record<ElementType, string> = {
  wall: "Walls", roof: "Roofs", floor: "Exposed floors and soffits", glazing: "Glazing", duct: "Ducts (distribution)",
};

/**
 * A face counts as vertical when its outward normal lies within 30° of the horizontal plane
 * (tilt 60…120°): the same band ISO 6946 uses for horizontal heat flow, and so for R_si here.
 */
export const VERTICAL_BAND_DEG = 30;

/** The rules, in words, printed with every breakdown. */
export const BREAKDOWN_RULES = [
  "Orientation: faces with tilt 60–120° (within 30° of vertical) by the compass point of their outward normal, 45° sectors centred on N, NE … NW (a bearing on a sector boundary goes to the clockwise sector); tilt under 60° is facing up, over 120° facing down.",
  "Element type: glazing when the build-up's name says glazed, glazing, glass, window or rooflight; otherwise by tilt as above (wall, roof facing up, floor or soffit facing down); ducts are the runs crossing unconditioned or outdoor space.",
  "Signs: a surface adds its heat loss (positive out) to loss and a negative one to gain; a duct run adds the heat its air loses to loss and the heat it gains to gain; ducts inside the zone they serve are left out, as in the zone totals.",
  "Element lines add up to the zones' heat loss and gain; orientation and build-up lines to the fabric part (surfaces only).",
] as const;

export function orientationOf(tilt_deg: number, azimuth_deg: number): OrientationBin {
  if (tilt_deg < 90 - VERTICAL_BAND_DEG) return "up";
  if (tilt_deg > 90 + VERTICAL_BAND_DEG) return "down";
  const a = ((azimuth_deg % 360) + 360) % 360;
  return ORIENTATIONS[Math.floor((a + 22.5) / 45) % 8]!;
}

// Words that name transparent elements; glass wool, glass fibre, foam or cellular glass are insulation.
const GLAZING_WORDS = /\b(glaz\w*|glass|windows?|roof ?lights?)\b/i;
const INSULATION_GLASS = /\b(foam|cellular)[\s-]*glass\b|\bglass[\s-]*(wool|fib(re|er))/i;

/** Whether a build-up is glazing, from its name (build-ups carry no element field). */
export function isGlazing(b: Pick<Buildup, "name">): boolean {
  return GLAZING_WORDS.test(b.name) && !INSULATION_GLASS.test(b.name);
}

export function elementOf(tilt_deg: number, buildup: Pick<Buildup, "name"> | undefined): Exclude<ElementType, "duct"> {
  if (buildup !== undefined && isGlazing(buildup)) return "glazing";
  const o = orientationOf(tilt_deg, 0);
  return o === "up" ? "roof" : o === "down" ? "floor" : "wall";
}

/**
 * How the breakdowns read one case's row results: by row id, whatever shape the caller keeps them
 * in (the screen may compute them differently from the server); `caseRowsOf` adapts the engine's.
 */
export interface CaseRows {
  design_case_id: string;
  surface(rowId: string): CalcResult | undefined;
  duct(rowId: string): CalcResult | undefined;
}

export function caseRowsOf(r: Pick<ScheduleResults, "design_case_id" | "surfaces" | "duct_runs">): CaseRows {
  const s = new Map(r.surfaces.map((x) => [x.row_id, x.result]));
  const d = new Map(r.duct_runs.map((x) => [x.row_id, x.result]));
  return { design_case_id: r.design_case_id, surface: (id) => s.get(id), duct: (id) => d.get(id) };
}

export interface BreakdownLine {
  key: string;
  label: string;
  /** Rows in this line's totals in this case. */
  rows: number;
  /** Surface area of those rows; null for ducts. */
  area_m2: number | null;
  loss_W: number;
  gain_W: number;
}

export interface LeftOutRow {
  label: string;
  sheet: "surfaces" | "duct_runs";
  reason: "not_computed" | "error" | "in_zone";
  message: string;
}

export interface CaseBreakdowns {
  design_case_id: string;
  name: string;
  kind: DesignCase["kind"];
  orientation: BreakdownLine[];
  element: BreakdownLine[];
  buildup: BreakdownLine[];
  /** All zones together: the sums of the element lines. */
  loss_W: number;
  gain_W: number;
  zones: { zone_id: string; name: string; loss_W: number; gain_W: number }[];
  /** Rows of the schedule in no line, with why: not computed, an error, or a duct inside its zone. */
  left_out: LeftOutRow[];
}

export interface CasePeak {
  design_case_id: string;
  name: string;
  W: number;
}

export interface ZonePeak {
  zone_id: string;
  name: string;
  /** The heating case with the largest heat loss; null when no heating case has any. */
  heating: CasePeak | null;
  /** The cooling case with the largest heat gain; null when no cooling case has any. */
  cooling: CasePeak | null;
}

export interface Breakdowns {
  cases: CaseBreakdowns[];
  peaks: ZonePeak[];
}

class Lines {
  private readonly by = new Map<string, BreakdownLine>();
  constructor(entries: [string, string, boolean][]) {
    for (const [key, label, area] of entries) this.by.set(key, { key, label, rows: 0, area_m2: area ? 0 : null, loss_W: 0, gain_W: 0 });
  }
  add(key: string, lossPositive: number, area: number | null): void {
    const l = this.by.get(key)!;
    l.rows++;
    if (l.area_m2 !== null && area !== null) l.area_m2 += area;
    if (lossPositive >= 0) l.loss_W += lossPositive;
    else l.gain_W -= lossPositive;
  }
  list(): BreakdownLine[] {
    return [...this.by.values()];
  }
}

/** The breakdowns of one design case. Lines exist for every bin the schedule has a row in, so every case lists the same lines. */
export function caseBreakdowns(s: Schedule, dc: DesignCase, rows: CaseRows): CaseBreakdowns {
  const buildups = new Map(s.buildups.map((b) => [b.id, b]));
  const used = (keys: readonly string[], present: Set<string>) => keys.filter((k) => present.has(k));
  const orient = new Set(s.surfaces.map((r) => orientationOf(r.tilt_deg, r.azimuth_deg)));
  const elems = new Set<string>(s.surfaces.map((r) => elementOf(r.tilt_deg, buildups.get(r.buildup_id))));
  if (s.ductRuns.some((d) => d.in_served_zone !== true)) elems.add("duct");
  const usedBuildups = new Set(s.surfaces.map((r) => r.buildup_id));
  const orientation = new Lines(used(ORIENTATION_BINS, orient).map((k) => [k, ORIENTATION_LABELS[k as OrientationBin], true]));
  const element = new Lines(used(ELEMENT_TYPES, elems).map((k) => [k, ELEMENT_LABELS[k as ElementType], k !== "duct"]));
  const buildup = new Lines(s.buildups.filter((b) => usedBuildups.has(b.id)).map((b) => [b.id, b.name, true]));
  const zoneRows = new Map<string, ZoneRowResult[]>(s.zones.map((z) => [z.id, []]));
  const left_out: LeftOutRow[] = [];
  // A row's heat flow, or why it has none (recorded in left_out).
  const flow = (label: string, sheet: LeftOutRow["sheet"], zone_id: string, r: CalcResult | undefined): number | null => {
    const out = (reason: LeftOutRow["reason"], message: string) => (left_out.push({ label, sheet, reason, message }), null);
    if (r === undefined) return out("error", "no result");
    if (!r.ok) return out(r.error.code === "not_computed" ? "not_computed" : "error", r.error.message);
    if (!zoneRows.has(zone_id)) return out("error", `zone ${zone_id} is not in this project`);
    const Q = (r as unknown as { Q_W: unknown }).Q_W;
    return typeof Q === "number" && Number.isFinite(Q) ? Q : out("error", "no finite heat flow");
  };

  for (const row of s.surfaces) {
    const Q = flow(row.label, "surfaces", row.zone_id, rows.surface(row.id));
    if (Q === null) continue;
    zoneRows.get(row.zone_id)!.push({ source: "surface", Q_W: Q });
    orientation.add(orientationOf(row.tilt_deg, row.azimuth_deg), Q, row.area_m2);
    element.add(elementOf(row.tilt_deg, buildups.get(row.buildup_id)), Q, row.area_m2);
    buildup.add(row.buildup_id, Q, row.area_m2);
  }
  for (const row of s.ductRuns) {
    const Q = flow(row.label, "duct_runs", row.zone_id, rows.duct(row.id));
    if (Q === null) continue;
    const in_zone = row.in_served_zone === true;
    zoneRows.get(row.zone_id)!.push({ source: "duct_run", Q_W: Q, in_zone });
    if (in_zone) left_out.push({ label: row.label, sheet: "duct_runs", reason: "in_zone", message: "inside the zone it serves: its heat stays in the zone" });
    // Heat to the air, so the heat lost by the air (−Q) is the loss; Q = 0 adds nothing either way.
    else element.add("duct", -Q, null);
  }
  const zones = s.zones.map((z) => {
    const t = zoneTotals(zoneRows.get(z.id)!, z.floor_area_m2);
    return { zone_id: z.id, name: z.name, loss_W: t.loss_W, gain_W: t.gain_W };
  });
  const el = element.list();
  return {
    design_case_id: dc.id, name: dc.name, kind: dc.kind,
    orientation: orientation.list(), element: el, buildup: buildup.list(),
    loss_W: el.reduce((a, l) => a + l.loss_W, 0), gain_W: el.reduce((a, l) => a + l.gain_W, 0),
    zones, left_out,
  };
}

/** Each zone's peak heating case (largest heat loss) and peak cooling case (largest heat gain); the first case wins a tie. */
export function zonePeaks(s: Pick<Schedule, "zones">, cases: readonly CaseBreakdowns[]): ZonePeak[] {
  return s.zones.map((z) => {
    const peak = (kind: DesignCase["kind"], of: "loss_W" | "gain_W"): CasePeak | null => {
      let best: CasePeak | null = null;
      for (const c of cases) {
        if (c.kind !== kind) continue;
        const W = c.zones.find((x) => x.zone_id === z.id)?.[of] ?? 0;
        if (W > 0 && (best === null || W > best.W)) best = { design_case_id: c.design_case_id, name: c.name, W };
      }
      return best;
    };
    return { zone_id: z.id, name: z.name, heating: peak("heating", "loss_W"), cooling: peak("cooling", "gain_W") };
  });
}

/** Every case's breakdowns (cases without rows given are skipped) and the zones' peak cases. */
export function scheduleBreakdowns(s: Schedule, cases: readonly DesignCase[], rows: readonly CaseRows[]): Breakdowns {
  const byCase = new Map(rows.map((r) => [r.design_case_id, r]));
  const out = cases.flatMap((dc) => {
    const r = byCase.get(dc.id);
    return r ? [caseBreakdowns(s, dc, r)] : [];
  });
  return { cases: out, peaks: zonePeaks(s, out) };
}

/** "1 surface not computed (over ground), 2 rows with errors, 1 duct run inside its zone": what no line holds. */
export function leftOutSentence(left: readonly LeftOutRow[]): string {
  const n = (reason: LeftOutRow["reason"]) => left.filter((l) => l.reason === reason).length;
  const plural = (k: number, one: string, many: string) => `${k} ${k === 1 ? one : many}`;
  const parts = [
    n("not_computed") ? `${plural(n("not_computed"), "row", "rows")} not computed (over ground)` : "",
    n("error") ? `${plural(n("error"), "row", "rows")} with errors` : "",
    n("in_zone") ? `${plural(n("in_zone"), "duct run inside the zone it serves", "duct runs inside the zones they serve")} (for reference)` : "",
  ].filter(Boolean);
  return parts.length === 0 ? "Every row is in these totals." : `Not in these totals: ${parts.join("; ")}.`;
}
