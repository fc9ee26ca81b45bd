// The compile hint put first in AG Grid's chunk after `next build` (scripts/lib/compile-hints.mjs).
// The magic comment's spelling and its place (the script's first line) are V8's explicit compile
// hints as shipped in Chromium 136 (v8.dev, "Explicit JavaScript compile hints", from memory).
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { AG_GRID_MARKER, COMPILE_HINT, markEagerChunks } from "../../scripts/lib/compile-hints.mjs";

let dir = "";
const chunk = (name: string, text: string) => writeFileSync(join(dir, name), text);
const read = (name: string) => readFileSync(join(dir, name), "utf8");

afterEach(() => rmSync(dir, { recursive: true, force: true }));

describe("markEagerChunks", () => {
  it("puts the hint first in the chunk holding AG Grid's code, and only there", () => {
    dir = mkdtempSync(join(tmpdir(), "fs-hints-"));
    chunk("grid.js", `(()=>{const c="${AG_GRID_MARKER}";})();`);
    chunk("react.js", "(()=>{})();");
    chunk("grid.css", `.${AG_GRID_MARKER}{}`);
    expect(markEagerChunks(dir)).toEqual(["grid.js"]);
    expect(read("grid.js")).toBe(`//# allFunctionsCalledOnLoad\n(()=>{const c="${AG_GRID_MARKER}";})();`);
    expect(read("react.js")).toBe("(()=>{})();");
    expect(read("grid.css")).toBe(`.${AG_GRID_MARKER}{}`);
  });

  it("marks a chunk once however often it runs", () => {
    dir = mkdtempSync(join(tmpdir(), "fs-hints-"));
    chunk("grid.js", `x="${AG_GRID_MARKER}"`);
    markEagerChunks(dir);
    markEagerChunks(dir);
    expect(read("grid.js")).toBe(`${COMPILE_HINT}x="${AG_GRID_MARKER}"`);
  });

  it("fails loudly when no chunk holds AG Grid's code", () => {
    dir = mkdtempSync(join(tmpdir(), "fs-hints-"));
    chunk("react.js", "(()=>{})();");
    expect(() => markEagerChunks(dir)).toThrow(/no chunk .* holds "ag-root-wrapper"/);
  });
});
