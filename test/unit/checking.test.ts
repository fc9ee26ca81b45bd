// The pure parts of checking: the move table, revision letters, canonical JSON and the
// comparison of two revision snapshots on a known pair built from the sample schedule.
import { describe, expect, test } from "vitest";
import { buildSnapshot } from "../../src/checking/build-snapshot";
import { canonicalJson } from "../../src/checking/canonical-json";
import { CHECK_STATES, nextCheckState, type TCheckState } from "../../src/checking/check-machine";
import { compareRevisions } from "../../src/checking/compare-revisions";
import { revisionLetter, revisionSequence } from "../../src/checking/revision-letter";
import type { RevisionSnapshot } from "../../src/checking/snapshot";
import { SAMPLE_CASES, sampleSchedule } from "../support/sample-schedule";

describe("check moves", () => {
  // Every state × move, written out by hand from the rules.
  const TABLE: [TCheckState, "accept" | "query", TCheckState | null][] = [
    ["unchecked", "accept", "accepted"],
    ["unchecked", "query", "queried"],
    ["queried", "accept", "accepted"],
    ["queried", "query", null],
    ["accepted", "accept", null],
    ["accepted", "query", "queried"],
  ];
  test.each(TABLE)("%s, %s → %s", (from, move, to) => expect(nextCheckState(move, from)).toBe(to));
  test("the table covers every state", () => expect(new Set(TABLE.map((t) => t[0]))).toEqual(new Set(CHECK_STATES)));
});

describe("revision letters", () => {
  test.each([
    [1, "A"],
    [2, "B"],
    [26, "Z"],
    [27, "AA"],
    [28, "AB"],
    [52, "AZ"],
    [53, "BA"],
    [702, "ZZ"],
    [703, "AAA"],
  ])("%i → %s and back", (n, letter) => {
    expect(revisionLetter(n)).toBe(letter);
    expect(revisionSequence(letter)).toBe(n);
  });
  test.each([0, -1, 1.5, Number.NaN])("%s is not a revision number", (n) => expect(() => revisionLetter(n)).toThrow(RangeError));
  test.each(["", "a", "A1", "AAAAA"])("%j is not a revision letter", (s) => expect(revisionSequence(s)).toBeNull());
});

test("canonical JSON ignores key order, keeps array order", () => {
  expect(canonicalJson({ b: 1, a: { d: [2, 1], c: null } })).toBe(canonicalJson({ a: { c: null, d: [2, 1] }, b: 1 }));
  expect(canonicalJson([1, 2])).not.toBe(canonicalJson([2, 1]));
});

/** A snapshot of the sample schedule (6 surfaces, 2 duct runs, 3 design cases), after `edit`. */
function snapshotOf(edit: (s: ReturnType<typeof sampleSchedule>) => void = () => {}): RevisionSnapshot {
  const s = sampleSchedule(6, 2);
  edit(s);
  const v = <T,>(items: T[]) => items.map((x, i) => ({ ...x, version: 1, position: i }));
  return buildSnapshot({
    project: { id: "p", name: "Sample annexe", reference: "SA-1", altitude_m: s.site.altitude_m, terrain: s.site.terrain, wind_law: s.site.wind_law, unit_system: "SI", default_method: s.site.method },
    design_cases: SAMPLE_CASES.map((d) => ({ ...d, version: 1 })),
    zones: s.zones.map((z) => ({ ...z, version: 1 })),
    buildups: s.buildups.map((b) => ({ ...b, version: 1 })),
    surfaces: v(s.surfaces),
    duct_runs: v(s.ductRuns),
    checks: [],
    comments: [],
  });
}

describe("comparing two snapshots: a known pair", () => {
  const a = snapshotOf();
  // B: surface s-2 doubles its area, s-6 goes, a new surface s-new comes; build-up b-panel's R changes.
  const b = snapshotOf((s) => {
    s.surfaces[1]!.area_m2 *= 2;
    s.surfaces.splice(5, 1);
    s.surfaces.push({ ...s.surfaces[0]!, id: "s-new", label: "S-new Gable" });
    s.buildups[2]!.R_direct_m2K_W = 2.4;
  });
  const c = compareRevisions(a, b);

  test("rows added and removed, by id", () => {
    expect(c.rows.added).toEqual([{ sheet: "surfaces", id: "s-new", label: "S-new Gable" }]);
    expect(c.rows.removed).toEqual([{ sheet: "surfaces", id: "s-6", label: a.surfaces[5]!.label }]);
  });

  test("changed rows: the edited one with its field, and those whose build-up changed with flows only", () => {
    const edited = c.rows.changed.find((r) => r.id === "s-2")!;
    expect(edited.fields).toEqual([{ field: "area_m2", before: a.surfaces[1]!.area_m2, after: 2 * a.surfaces[1]!.area_m2 }]);
    expect(edited.flows).toHaveLength(3);
    // Q is proportional to area for the same surface and case: the flow doubles (within rounding).
    for (const f of edited.flows) expect(f.after_W! / f.before_W!).toBeCloseTo(2, 9);
    const panelRows = a.surfaces.filter((s) => s.buildup_id === "b-panel" && s.id !== "s-6").map((s) => s.id);
    expect(panelRows.length).toBeGreaterThan(0);
    for (const id of panelRows) expect(c.rows.changed.find((r) => r.id === id)).toMatchObject({ fields: [], flows: expect.any(Array) });
    expect(c.rows.changed.map((r) => r.id).sort()).toEqual(["s-2", ...panelRows].sort());
    expect(c.settings).toEqual([{ entity: "buildups", id: "b-panel", name: "Spandrel panel", change: "changed", fields: [{ field: "R_direct_m2K_W", before: 1.8, after: 2.4 }] }]);
  });

  test("each zone total's change equals the change of its rows' flows", () => {
    expect(c.zones).toHaveLength(SAMPLE_CASES.length * 3);
    const rowsOf = (s: RevisionSnapshot, caseId: string, zoneId: string) => {
      const r = s.results.find((x) => x.design_case_id === caseId)!;
      const q = (rows: typeof r.surfaces, id: string) => (rows.find((y) => y.row_id === id)!.result as unknown as { Q_W: number }).Q_W;
      const surfaces = s.surfaces.filter((x) => x.zone_id === zoneId).map((x) => q(r.surfaces, x.id));
      const ducts = s.duct_runs.filter((x) => x.zone_id === zoneId).map((x) => -q(r.duct_runs, x.id));
      return [...surfaces, ...ducts].reduce((t, q) => t + q, 0);
    };
    for (const z of c.zones) {
      const net = rowsOf(b, z.design_case_id, z.zone_id) - rowsOf(a, z.design_case_id, z.zone_id);
      expect(z.loss_delta_W - z.gain_delta_W, `${z.design_case} / ${z.zone}`).toBeCloseTo(net, 6);
    }
  });

  test("a snapshot compared with itself shows no change", () => {
    const same = compareRevisions(a, snapshotOf());
    expect(same.rows).toEqual({ added: [], removed: [], changed: [] });
    expect(same.settings).toEqual([]);
    expect(same.zones.every((z) => z.loss_delta_W === 0 && z.gain_delta_W === 0)).toBe(true);
  });
});
