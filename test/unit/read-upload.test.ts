// The upload reader's limits, run in this thread (the app runs the same code in a worker with
// capped memory and time): archive sizes and worksheet dimensions checked before inflating, a
// part that unpacks to more than it declares, far columns and too many rows, matched columns only.
import { deflateRawSync } from "node:zlib";
import ExcelJS from "exceljs";
import { describe, expect, test } from "vitest";
import { readCsv, readXlsx } from "@/server/schedule/read-upload";
import { UPLOAD_LIMITS, UploadError } from "@/server/schedule/upload-limits";
import { checkInflatedSizes, checkXlsxArchive, sheetDimension, zipEntries } from "@/server/schedule/xlsx-archive";
import { farColumnSheet, makeZip, xlsxParts } from "../support/zip";

const HEAD = ["Label", "Zone", "Build-up", "Area (m²)", "Tilt (°)", "Azimuth (°)", "Centroid height (m)", "Length along the wind (m)", "Panel height (m)"];

async function refusal(run: () => unknown): Promise<UploadError> {
  try {
    await run();
  } catch (error) {
    if (error instanceof UploadError) return error;
    throw error;
  }
  throw new Error("expected a refusal");
}

describe("XLSX archives", () => {
  test("a worksheet whose dimension reaches column XFD is refused before inflating it whole", async () => {
    // One number per row in the last column, 20,000 rows: about 100 KB zipped, 327 million cells as an array.
    const bytes = makeZip(xlsxParts("Surfaces", farColumnSheet(HEAD, 19_999, true)));
    expect(bytes.byteLength).toBeLessThan(150_000);
    const error = await refusal(() => checkXlsxArchive(bytes));
    expect(error.code).toBe("payload_too_large");
    expect(error.message).toMatch(/^A worksheet spans A1:XFD20000, reaching column 16,384 and row 20,000; an import reads at most 512 columns/);
  });

  // exceljs reads 19,000 rows here: seconds on a busy machine, hence the longer timeout.
  test("the same sheet without a dimension is refused by the reader at the first far row", { timeout: 30_000 }, async () => {
    const bytes = makeZip(xlsxParts("Surfaces", farColumnSheet(HEAD, 19_000, false)));
    expect(() => checkXlsxArchive(bytes)).not.toThrow();
    const error = await refusal(() => readXlsx(bytes, "surfaces"));
    expect(error.message).toBe("Surfaces: row 2 reaches column 16384; an import reads at most 512 columns");
  });

  test("an archive declaring more than the limit unpacked is refused from its directory alone", async () => {
    const huge = 3_000_000_000;
    // The data is a few bytes: refusing it proves nothing was inflated to find the size out.
    const bytes = makeZip(xlsxParts("Surfaces", "<worksheet/>", { declaredSize: huge }));
    expect(zipEntries(bytes).find((e) => e.name === "xl/worksheets/sheet1.xml")!.uncompressedSize).toBe(huge);
    const error = await refusal(() => checkXlsxArchive(bytes));
    expect(error.message).toBe("The workbook unpacks to 2,861 MB; an import reads at most 64 MB unpacked");
  });

  test("a part that unpacks to more than it declares is refused at its declared size", async () => {
    const zeros = Buffer.alloc(20 * 1024 * 1024);
    const bytes = makeZip(xlsxParts("Surfaces", zeros, { declaredSize: 1000, deflated: deflateRawSync(zeros) }));
    expect(() => checkXlsxArchive(bytes)).not.toThrow();
    const error = await refusal(() => checkInflatedSizes(bytes));
    expect(error.message).toContain("(xl/worksheets/sheet1.xml) unpacks to more than the 1000 bytes it declares");
  });

  test("dimensions read from a worksheet's first bytes", () => {
    expect(sheetDimension('<worksheet><dimension ref="A1:AS20001"/><sheetData>')).toEqual({ ref: "A1:AS20001", columns: 45, rows: 20001 });
    expect(sheetDimension('<worksheet><dimension ref="B2"/><sheetData>')).toEqual({ ref: "B2", columns: 2, rows: 2 });
    expect(sheetDimension("<worksheet><sheetData><dimension ref=\"A1:XFD9\"/>")).toBeNull();
  });
});

describe("only the matched columns are read", () => {
  test("a CSV's other columns are dropped but named; the heading keeps its matched order", () => {
    const csv = ["Label,Notes,Zone,Build-up,Area (m²)", "Wall,long notes here,Hall,Wall,3"].join("\n");
    expect(readCsv(new TextEncoder().encode(csv), "surfaces")).toEqual([
      ["Label", "Zone", "Build-up", "Area (m²)", "Notes"],
      ["Wall", "Hall", "Wall", "3"],
    ]);
  });

  test("a cell far beyond the text limit leaves the reader cut just past the limit", () => {
    const csv = `Label,Zone\n${"x".repeat(1_000_000)},Hall`;
    const [, row] = readCsv(new TextEncoder().encode(csv), "surfaces");
    expect((row![0] as string).length).toBe(2001);
  });

  test("more rows than the limit is refused with the row named", async () => {
    const lines = ["Label,Zone", ...Array.from({ length: UPLOAD_LIMITS.maxRows + 1 }, (_, i) => `W${i},Hall`)];
    const error = await refusal(() => readCsv(new TextEncoder().encode(lines.join("\n")), "surfaces"));
    expect(error.message).toBe("Surfaces: more than 20,000 rows; import at most that many at a time");
    expect(error.details).toEqual([{ row: 20_002, column: "", field: "file", message: "At most 20000 rows below the heading" }]);
  });

  test("a CSV row wider than the column limit is refused", async () => {
    const error = await refusal(() => readCsv(new TextEncoder().encode(`Label,Zone\n${"x,".repeat(100_000)}`), "surfaces"));
    expect(error.message).toBe("Surfaces: row 2 reaches column 100001; an import reads at most 512 columns");
  });

  test("text protected by the CSV export comes back as it was", () => {
    const csv = ["Label,Zone", "'=HYPERLINK(\"http://x\"),'+Plant", "''=kept one quote,'plain"].join("\n");
    expect(readCsv(new TextEncoder().encode(csv), "surfaces").slice(1)).toEqual([
      ['=HYPERLINK("http://x")', "+Plant"],
      ["'=kept one quote", "'plain"],
    ]);
  });
});
