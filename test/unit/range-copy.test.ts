// Copying a range out: cells as shown (units included in the headings), no thousands separators,
// blank for inherited values, spreadsheet quoting only where a cell holds a tab or line break.
import { describe, expect, test } from "vitest";
import { copyText, toTsv, tsvCell } from "@/components/grid/range-copy";

describe("copy out", () => {
  test("a number is copied as shown but without thousands separators; a blank override as blank", () => {
    expect(copyText(12345.678, "12,345.68")).toBe("12345.68");
    expect(copyText(null, "0.90")).toBe("");
    expect(copyText("z1", "Reading room")).toBe("Reading room");
    expect(copyText("yes", "Yes")).toBe("Yes");
  });

  test("tab-separated lines, headings first when asked", () => {
    const cells = [["RR wall 1", "12.50"], ["RR wall 2", "8.00"]];
    expect(toTsv(cells)).toBe("RR wall 1\t12.50\nRR wall 2\t8.00");
    expect(toTsv(cells, ["Label", "Area (m²)"])).toBe("Label\tArea (m²)\nRR wall 1\t12.50\nRR wall 2\t8.00");
  });

  test("a cell with a tab, a line break or a leading quote is quoted, its quotes doubled; an inch mark is not", () => {
    expect(tsvCell("a\tb")).toBe('"a\tb"');
    expect(tsvCell('line\n"two"')).toBe('"line\n""two"""');
    expect(tsvCell('"quoted')).toBe('"""quoted"');
    expect(tsvCell('12" duct')).toBe('12" duct');
  });
});
