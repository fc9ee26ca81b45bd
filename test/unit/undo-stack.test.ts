// Undo and redo steps: the reverse of each kind of change, the order of the stacks, a new change
// clearing redo, a refused undo dropped (a conflict can never apply) or kept (a network fault),
// and the version each undo sends as its guard.
import { describe, expect, test } from "vitest";
import { UndoStack, guarded, reverseOps, type UndoStep } from "@/components/grid/undo-stack";
import type { Row } from "@/components/schedule/schedule-cache";

const row = (id: string, over: Partial<Row> = {}): Row => ({ id, version: 3, label: `Row ${id}`, area_m2: 10, tilt_deg: 90, ...over });
const rows = new Map([["a", row("a")], ["b", row("b", { area_m2: 20 })]]);
const before = (_s: string, id: string) => rows.get(id);

describe("reverseOps", () => {
  test("an update goes back to the earlier values of just its fields; a paste over two rows reverses in one step", () => {
    const ops = [
      { op: "update" as const, sheet: "surfaces" as const, id: "a", values: { area_m2: 11, tilt_deg: 45 } },
      { op: "update" as const, sheet: "surfaces" as const, id: "b", values: { area_m2: 21 } },
    ];
    expect(reverseOps(ops, before)).toEqual([
      { op: "update", sheet: "surfaces", id: "b", values: { area_m2: 20 } },
      { op: "update", sheet: "surfaces", id: "a", values: { area_m2: 10, tilt_deg: 90 } },
    ]);
  });

  test("an added row is deleted; a deleted row comes back whole with its id", () => {
    const added = row("c");
    expect(reverseOps([{ op: "create", sheet: "duct_runs", row: added }], before)).toEqual([{ op: "delete", sheet: "duct_runs", id: "c" }]);
    expect(reverseOps([{ op: "delete", sheet: "surfaces", id: "a" }], before)).toEqual([{ op: "create", sheet: "surfaces", row: row("a") }]);
  });

  test("a blank that was undefined in the cache reverses to null (a value the server reads as blank)", () => {
    expect(reverseOps([{ op: "update", sheet: "surfaces", id: "a", values: { method: "mcadams" } }], before)[0]).toMatchObject({ values: { method: null } });
  });

  test("a change to a row not in the schedule cannot be reversed", () => {
    expect(() => reverseOps([{ op: "delete", sheet: "surfaces", id: "zz" }], before)).toThrow(/not in the schedule/);
  });
});

describe("UndoStack", () => {
  const step = (label: string): UndoStep => ({ label, forward: [], backward: [] });

  test("undo takes the latest step, redo brings it back; a new step clears redo", () => {
    const s = new UndoStack();
    const [one, two, three] = [step("one"), step("two"), step("three")];
    s.record(one);
    s.record(two);
    expect(s.take("undo")).toBe(two);
    s.settle("undo", two, "done");
    expect(s.peek("redo")).toBe(two);
    expect(s.peek("undo")).toBe(one);
    expect(s.take("redo")).toBe(two);
    s.settle("redo", two, "done");
    expect(s.sizes).toEqual({ undo: 2, redo: 0 });
    s.take("undo");
    s.settle("undo", two, "done");
    s.record(three);
    expect(s.sizes).toEqual({ undo: 2, redo: 0 });
    expect(s.peek("undo")).toBe(three);
  });

  test("a refused undo is dropped; one that failed on the network is kept to try again", () => {
    const s = new UndoStack();
    const [one, two] = [step("one"), step("two")];
    s.record(one);
    s.record(two);
    s.settle("undo", s.take("undo")!, "retry");
    expect(s.peek("undo")).toBe(two);
    s.settle("undo", s.take("undo")!, "dropped");
    expect(s.sizes).toEqual({ undo: 1, redo: 0 });
    expect(s.peek("undo")).toBe(one);
  });

  test("a step whose own write failed is forgotten; the stack keeps at most 100 steps", () => {
    const s = new UndoStack();
    const bad = step("bad");
    s.record(step("ok"));
    s.record(bad);
    s.forget(bad);
    expect(s.peek("undo")?.label).toBe("ok");
    for (let i = 0; i < 150; i++) s.record(step(`n${i}`));
    expect(s.sizes.undo).toBe(100);
    expect(s.peek("undo")?.label).toBe("n149");
  });
});

test("guarded: updates and deletes carry the version this browser last wrote; creates carry none", () => {
  const known = new Map([["a", 7]]);
  expect(
    guarded(
      [
        { op: "update", sheet: "surfaces", id: "a", values: { area_m2: 1 } },
        { op: "delete", sheet: "surfaces", id: "b" },
        { op: "create", sheet: "surfaces", row: row("c") },
      ],
      (id) => known.get(id),
    ),
  ).toEqual([
    { op: "update", sheet: "surfaces", id: "a", values: { area_m2: 1 }, version: 7 },
    { op: "delete", sheet: "surfaces", id: "b", version: undefined },
    { op: "create", sheet: "surfaces", row: row("c") },
  ]);
});
