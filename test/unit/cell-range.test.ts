// The range selection's maths: bounds either way round, Shift+arrow growth clamped to the sheet,
// the fill handle's growth (down or right only), the tiling of a fill and the stylesheet that draws it.
import { describe, expect, test } from "vitest";
import { boundsOf, extendRange, fillExtension, fillSource, onFillHandle, rangeCss, singleCell, tiledSources } from "@/components/grid/cell-range";

describe("boundsOf and extendRange", () => {
  test("a range dragged up and left has the same bounds as one dragged down and right", () => {
    expect(boundsOf({ anchor: { row: 5, col: 4 }, focus: { row: 2, col: 1 } })).toEqual({ top: 2, bottom: 5, left: 1, right: 4 });
    expect(boundsOf({ anchor: { row: 2, col: 1 }, focus: { row: 5, col: 4 } })).toEqual({ top: 2, bottom: 5, left: 1, right: 4 });
  });

  test("Shift+arrows move the far corner, keep the anchor and stop at the sheet's edges", () => {
    const size = { rows: 10, cols: 6 };
    let r = singleCell({ row: 0, col: 0 });
    r = extendRange(r, "down", size);
    r = extendRange(r, "right", size);
    r = extendRange(r, "right", size);
    expect(r).toEqual({ anchor: { row: 0, col: 0 }, focus: { row: 1, col: 2 } });
    expect(extendRange(r, "up", size)).toEqual({ anchor: { row: 0, col: 0 }, focus: { row: 0, col: 2 } });
    expect(extendRange(extendRange(r, "up", size), "up", size).focus).toEqual({ row: 0, col: 2 });
    expect(extendRange(r, "left", size, true).focus).toEqual({ row: 1, col: 0 });
    expect(extendRange(r, "down", size, true).focus).toEqual({ row: 9, col: 2 });
    expect(extendRange(singleCell({ row: 9, col: 5 }), "right", size).focus).toEqual({ row: 9, col: 5 });
  });
});

describe("fill", () => {
  const source = { top: 2, bottom: 3, left: 1, right: 2 };
  test("the handle grows the range down or right, whichever the pointer went further, never up or left", () => {
    expect(fillExtension(source, { row: 3, col: 2 })).toBeNull();
    expect(fillExtension(source, { row: 0, col: 0 })).toBeNull();
    expect(fillExtension(source, { row: 7, col: 3 })).toEqual({ bounds: { top: 2, bottom: 7, left: 1, right: 2 }, direction: "down" });
    expect(fillExtension(source, { row: 4, col: 6 })).toEqual({ bounds: { top: 2, bottom: 3, left: 1, right: 6 }, direction: "right" });
  });

  test("a two-row block dragged down three rows repeats itself: rows 4, 5, 6 copy rows 2, 3, 2", () => {
    const pairs = tiledSources(source, { ...source, bottom: 6 });
    expect(pairs.map((p) => [p.target.row, p.target.col, p.source.row, p.source.col])).toEqual([
      [4, 1, 2, 1], [4, 2, 2, 2], [5, 1, 3, 1], [5, 2, 3, 2], [6, 1, 2, 1], [6, 2, 2, 2],
    ]);
  });

  test("Ctrl+D takes the top row, Ctrl+R the left column", () => {
    const b = { top: 1, bottom: 4, left: 2, right: 3 };
    expect(fillSource(b, "down")).toEqual({ top: 1, bottom: 1, left: 2, right: 3 });
    expect(fillSource(b, "right")).toEqual({ top: 1, bottom: 4, left: 2, right: 2 });
    expect(tiledSources(fillSource(b, "down"), b)).toHaveLength(6);
    expect(tiledSources(fillSource(b, "down"), b).every((p) => p.source.row === 1 && p.source.col === p.target.col)).toBe(true);
  });

  test("the handle is the cell's bottom-right corner, 9 px square", () => {
    const box = { right: 200, bottom: 100 };
    expect(onFillHandle(box, 196, 97)).toBe(true);
    expect(onFillHandle(box, 180, 97)).toBe(false);
    expect(onFillHandle(box, 196, 80)).toBe(false);
  });
});

describe("rangeCss", () => {
  const ids = ["label", "zone_id", "area_m2", 'odd"id'];
  test("tints and outlines exactly the range's rows and columns, and puts the handle on its last cell", () => {
    const css = rangeCss("s1", { top: 1, bottom: 2, left: 1, right: 2 }, ids);
    expect(css).toContain('[data-range-scope="s1"] .ag-row:not(.ag-row-pinned):is([row-index="1"],[row-index="2"]) .ag-cell:is([col-id="zone_id"],[col-id="area_m2"])::after');
    expect(css).not.toContain('[col-id="label"]');
    expect(css).toContain('.ag-row:not(.ag-row-pinned):is([row-index="2"]) .ag-cell:is([col-id="area_m2"])::before');
    expect(css).toMatch(/--fs-rt:2px/);
  });
  test("a single cell gets only the handle; quotes in ids are escaped; no range, no rules", () => {
    const css = rangeCss("s1", { top: 0, bottom: 0, left: 3, right: 3 }, ids);
    expect(css).not.toContain("::after");
    expect(css).toContain('[col-id="odd\\"id"])::before');
    expect(rangeCss("s1", null, ids)).toBe("");
  });
  test("a fill drag shows a dashed outline over the cells it would write", () => {
    expect(rangeCss("s1", { top: 0, bottom: 0, left: 2, right: 2 }, ids, { top: 0, bottom: 3, left: 2, right: 2 })).toContain("dashed");
  });
});
