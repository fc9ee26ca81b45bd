// The page's results kept current edit by edit must equal a whole recalculation after every kind
// of edit (row edit, a row moved to another zone, a zone or build-up edit, delete, add), reusing
// the results of the rows the edit did not touch; the site or the case changing asks for a whole one.
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import type { TDesignCase, TSchedule } from "../../src/schemas/schedule";
import { resultsFor } from "../../src/schedule/engine-schedule";
import { caseResultsOf, planUpdate, updateCaseResults, type CaseResults } from "../../src/schedule/incremental-results";
import { mergeRows, removeRows, upsertRows, type Row } from "../../src/components/schedule/schedule-cache";
import { SAMPLE_CASES, sampleSchedule } from "../support/sample-schedule";

function stored(surfaces = 60, ducts = 12): TSchedule {
  const s = sampleSchedule(surfaces, ducts);
  const v = <T extends object>(xs: T[]) => xs.map((x, i) => ({ ...x, version: 1, position: i + 1 }));
  return {
    project: { id: "p-1", version: 1, altitude_m: s.site.altitude_m, terrain: s.site.terrain, wind_law: s.site.wind_law, default_method: s.site.method, unit_system: "SI" },
    design_cases: v(SAMPLE_CASES),
    zones: v(s.zones),
    buildups: v(s.buildups),
    surfaces: v(s.surfaces),
    duct_runs: v(s.ductRuns),
  } as unknown as TSchedule;
}

const start = (s: TSchedule, dc: TDesignCase) => caseResultsOf(s, dc, resultsFor(s, dc));

/** Brings `prev` up to `next` incrementally (failing if it asks for a whole recalculation) and compares. */
function expectSameAsFull(prev: CaseResults, next: TSchedule, dc: TDesignCase, maxRows = 1000): CaseResults {
  const up = updateCaseResults(prev, next, dc, maxRows);
  expect(up, "an incremental update").toBeDefined();
  expect(up!.state.results).toStrictEqual(resultsFor(next, dc));
  for (const r of [...up!.state.results.surfaces, ...up!.state.results.duct_runs]) expect(up!.state.byRow.get(r.row_id)).toBe(r);
  return up!.state;
}

describe.each(SAMPLE_CASES.map((c) => [c.name, c] as const))("%s", (_name, engineCase) => {
  const s0 = stored();
  const dc = s0.design_cases.find((d) => d.id === engineCase.id)!;
  const prev = start(s0, dc);

  test("a row edit recalculates that row and its zone only, and equals the whole recalculation", () => {
    const row = s0.surfaces[7]!;
    const next = mergeRows(s0, "surfaces", [{ id: row.id, values: { area_m2: row.area_m2 * 2, azimuth_deg: 45 } }]);
    expect(planUpdate(prev, next, dc)).toEqual({ kind: "rows", surfaces: new Set([row.id]), ducts: new Set(), zones: new Set([row.zone_id]) });
    const state = expectSameAsFull(prev, next, dc);
    // Untouched rows and zones keep their very objects.
    expect(state.byRow.get(s0.surfaces[8]!.id)).toBe(prev.byRow.get(s0.surfaces[8]!.id));
    const other = state.results.zones.find((z) => z.zone_id !== row.zone_id)!;
    expect(other).toBe(prev.results.zones.find((z) => z.zone_id === other.zone_id));
    expect(state.byRow.get(row.id)).not.toBe(prev.byRow.get(row.id));
  });

  test("a row moved to another zone changes both zones' totals", () => {
    const row = s0.surfaces[3]!;
    const to = s0.zones.find((z) => z.id !== row.zone_id)!.id;
    const next = mergeRows(s0, "surfaces", [{ id: row.id, values: { zone_id: to } }]);
    expect(planUpdate(prev, next, dc)).toMatchObject({ kind: "rows", zones: new Set([row.zone_id, to]) });
    expectSameAsFull(prev, next, dc);
    const duct = s0.duct_runs[2]!;
    const ductTo = s0.zones.find((z) => z.id !== duct.zone_id)!.id;
    expectSameAsFull(prev, mergeRows(s0, "duct_runs", [{ id: duct.id, values: { zone_id: ductTo, in_served_zone: true } }]), dc);
  });

  test("a build-up edit recalculates the rows built of it", () => {
    const b = s0.buildups[0]!;
    const next = upsertRows(s0, "buildups", [{ ...b, layers: b.layers.map((l) => ({ ...l, thickness_m: l.thickness_m * 1.5 })) } as unknown as Row]);
    const plan = planUpdate(prev, next, dc, 1000);
    expect(plan.kind === "rows" && [...plan.surfaces].sort()).toEqual(s0.surfaces.filter((r) => r.buildup_id === b.id).map((r) => r.id).sort());
    expectSameAsFull(prev, next, dc);
    // With the default limit, a change touching this many rows is a whole recalculation (the worker's).
    expect(planUpdate(prev, next, dc, 5).kind).toBe("full");
  });

  test("a zone edit (temperatures, floor area, name) recalculates its rows and totals", () => {
    const z = s0.zones[1]!;
    const next = upsertRows(s0, "zones", [{ ...z, T_heating_C: z.T_heating_C - 3, T_cooling_C: z.T_cooling_C + 2, floor_area_m2: 999, name: "Stack room, renamed" } as unknown as Row]);
    expectSameAsFull(prev, next, dc);
  });

  test("deleting rows drops them and their zones' totals follow", () => {
    const gone = new Set([s0.surfaces[0]!.id, s0.surfaces[11]!.id, s0.duct_runs[1]!.id]);
    const next = removeRows(removeRows(s0, "surfaces", gone), "duct_runs", gone);
    const state = expectSameAsFull(prev, next, dc);
    for (const id of gone) expect(state.byRow.has(id)).toBe(false);
  });

  test("adding rows (a new surface, a duplicated duct run) computes only those", () => {
    const copy = { ...s0.surfaces[5]!, id: "s-new", version: 0, position: 1e9, label: "New bay" } as unknown as Row;
    const duct = { ...s0.duct_runs[0]!, id: "d-new", version: 0, position: 1e9, label: "New run" } as unknown as Row;
    const next = upsertRows(upsertRows(s0, "surfaces", [copy]), "duct_runs", [duct]);
    expect(planUpdate(prev, next, dc)).toMatchObject({ kind: "rows", surfaces: new Set(["s-new"]), ducts: new Set(["d-new"]) });
    expectSameAsFull(prev, next, dc);
  });

  test("a row with a zone or build-up not in the project is flagged as the whole recalculation flags it", () => {
    const next = mergeRows(s0, "surfaces", [{ id: s0.surfaces[2]!.id, values: { buildup_id: "b-gone" } }]);
    expectSameAsFull(prev, next, dc);
  });
});

test("the site or the design case changing asks for a whole recalculation; an unrelated project change does not", () => {
  const s0 = stored();
  const dc = s0.design_cases[0]!;
  const prev = start(s0, dc);
  expect(planUpdate(undefined, s0, dc).kind).toBe("full");
  expect(planUpdate(prev, { ...s0, project: { ...s0.project, altitude_m: 900 } }, dc).kind).toBe("full");
  expect(planUpdate(prev, s0, { ...dc, T_outdoor_C: dc.T_outdoor_C - 5 }).kind).toBe("full");
  expect(planUpdate(prev, { ...s0, project: { ...s0.project, name: "Renamed", version: 2 } as TSchedule["project"] }, dc).kind).toBe("same");
  expect(updateCaseResults(prev, { ...s0, project: { ...s0.project, altitude_m: 900 } }, dc)).toBeUndefined();
});

test("any sequence of edits, kept up incrementally, ends where a whole recalculation does", () => {
  const s0 = stored(40, 8);
  const dc = s0.design_cases[1]!;
  const op = fc.oneof(
    fc.record({ kind: fc.constant("area" as const), at: fc.nat(), area: fc.double({ min: 0.5, max: 80, noNaN: true }) }),
    fc.record({ kind: fc.constant("zone" as const), at: fc.nat(), zone: fc.nat(2) }),
    fc.record({ kind: fc.constant("buildup" as const), at: fc.nat(), buildup: fc.nat(2) }),
    fc.record({ kind: fc.constant("delete" as const), at: fc.nat() }),
    fc.record({ kind: fc.constant("add" as const), at: fc.nat() }),
    fc.record({ kind: fc.constant("duct" as const), at: fc.nat(), length: fc.double({ min: 1, max: 60, noNaN: true }) }),
    fc.record({ kind: fc.constant("zone-air" as const), zone: fc.nat(2), t: fc.double({ min: 10, max: 26, noNaN: true }) }),
  );
  fc.assert(
    fc.property(fc.array(op, { minLength: 1, maxLength: 12 }), (ops) => {
      let s = s0;
      let state = start(s0, dc);
      let added = 0;
      for (const o of ops) {
        const rows = s.surfaces;
        const row = rows[("at" in o ? o.at : 0) % Math.max(1, rows.length)];
        if (o.kind === "area" && row) s = mergeRows(s, "surfaces", [{ id: row.id, values: { area_m2: o.area } }]);
        if (o.kind === "zone" && row) s = mergeRows(s, "surfaces", [{ id: row.id, values: { zone_id: s.zones[o.zone]!.id } }]);
        if (o.kind === "buildup" && row) s = mergeRows(s, "surfaces", [{ id: row.id, values: { buildup_id: s.buildups[o.buildup]!.id } }]);
        if (o.kind === "delete" && row) s = removeRows(s, "surfaces", new Set([row.id]));
        if (o.kind === "add") s = upsertRows(s, "surfaces", [{ ...s0.surfaces[o.at % s0.surfaces.length]!, id: `added-${++added}`, position: 1e6 + added } as unknown as Row]);
        if (o.kind === "duct") {
          const d = s.duct_runs[o.at % s.duct_runs.length]!;
          s = mergeRows(s, "duct_runs", [{ id: d.id, values: { length_m: o.length } }]);
        }
        if (o.kind === "zone-air") s = upsertRows(s, "zones", [{ ...s.zones[o.zone]!, T_cooling_C: o.t } as unknown as Row]);
        state = updateCaseResults(state, s, dc, 1000)!.state;
      }
      expect(state.results).toStrictEqual(resultsFor(s, dc));
    }),
    { numRuns: 60 },
  );
});
