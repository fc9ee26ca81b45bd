// Hostile cells for the importer and the grid's paste (they share parse-cells): a huge cell is
// refused by its length before any parsing, and the number pattern runs in linear time.
import { describe, expect, test } from "vitest";
import { MAX_NUMBER_CELL_CHARS, MAX_TEXT_CELL_CHARS, isPlainNumber, parseCell, parseSheet } from "@/schedule/parse-cells";
import { SURFACE_COLUMNS, columnHeader } from "@/schedule/sheet-columns";

const lookups = { zones: [{ id: "z1", name: "Hall" }], buildups: [{ id: "b1", name: "Wall" }] };
const area = SURFACE_COLUMNS.find((c) => c.field === "area_m2")!;
const label = SURFACE_COLUMNS.find((c) => c.field === "label")!;
// 100 KB of digits ending in a letter: the old pattern backtracked over it for ~13 s.
const HOSTILE = `${"1".repeat(100_000)}x`;

describe("a huge cell", () => {
  test("a 100 KB number cell is refused by its length, naming the column", () => {
    const result = parseCell(area, HOSTILE, "SI", lookups);
    expect(result).toEqual({ ok: false, message: `${columnHeader(area, "SI")}: the cell is longer than ${MAX_NUMBER_CELL_CHARS} characters, the most a number may have` });
  });

  test("a text cell longer than the text limit is refused; one at the limit is read", () => {
    expect(parseCell(label, "a".repeat(MAX_TEXT_CELL_CHARS + 1), "SI", lookups)).toMatchObject({ ok: false, message: expect.stringContaining(`longer than ${MAX_TEXT_CELL_CHARS} characters`) });
    expect(parseCell(label, "a".repeat(MAX_TEXT_CELL_CHARS), "SI", lookups)).toEqual({ ok: true, value: "a".repeat(MAX_TEXT_CELL_CHARS) });
  });

  test("in a sheet, the problem names the row and the column", () => {
    const headers = SURFACE_COLUMNS.map((c) => columnHeader(c, "SI"));
    const row = SURFACE_COLUMNS.map((c) => (c.field === "area_m2" ? HOSTILE : c.field === "label" ? "P1" : c.field === "zone_id" ? "Hall" : c.field === "buildup_id" ? "Wall" : ""));
    const parsed = parseSheet([headers, row], "surfaces", lookups);
    expect(parsed.problems).toEqual([expect.objectContaining({ row: 2, column: columnHeader(area, "SI"), field: "area_m2", message: expect.stringContaining("longer than 64 characters") })]);
  });
});

describe("the number pattern", () => {
  // No timing assertion: vitest's test timeout is the guard, and the old pattern took ~13 s here.
  test("answers at once on a long digit run ending in a letter", () => {
    expect(isPlainNumber(HOSTILE)).toBe(false);
    expect(isPlainNumber(`${"9".repeat(100_000)}.${"9".repeat(100_000)}e+`)).toBe(false);
  });

  test.each(["1", "-1.5", "+.5", "2.", "1e3", "1.5E-3", "0.000"])("accepts %s", (t) => expect(isPlainNumber(t)).toBe(true));
  test.each(["", ".", "1,000", "1e", "e3", "--1", "1.2.3", "0x10", " 1"])("refuses %j", (t) => expect(isPlainNumber(t)).toBe(false));
});
