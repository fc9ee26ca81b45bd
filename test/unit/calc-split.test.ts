// Cutting a large command-line body in two between cases (scripts/lib/calc-split.ts): wherever it
// cuts, the two halves parsed apart hold the whole body's cases in order; strings holding commas,
// brackets, braces, quotes and backslashes never mislead it; other shapes are not cut.
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { splitCases } from "../../scripts/lib/calc-split";

const bytes = (s: string) => Buffer.from(s, "utf8");
const halves = (text: string, share?: number) => {
  const b = bytes(text);
  const s = splitCases(b, share);
  if (s === null) return null;
  const part = (from: number, to: number) => JSON.parse("[" + b.subarray(from, to).toString("utf8") + "]") as unknown[];
  return [part(s.headStart, s.headEnd), part(s.tailStart, s.tailEnd)] as const;
};

describe("splitCases", () => {
  test("the two halves hold the cases of the whole, in order, for any JSON cases and cut point", () => {
    fc.assert(
      fc.property(fc.array(fc.jsonValue(), { minLength: 2, maxLength: 30 }), fc.double({ min: 0, max: 1, noNaN: true }), fc.boolean(), (cases, share, spaced) => {
        const text = spaced ? JSON.stringify({ cases }, null, 2) : JSON.stringify({ cases });
        const h = halves(text, share);
        expect(h).not.toBeNull();
        expect(h![0].length).toBeGreaterThan(0);
        expect(h![1].length).toBeGreaterThan(0);
        expect([...h![0], ...h![1]]).toEqual(JSON.parse(text).cases);
      }),
      { numRuns: 300 },
    );
  });

  test("strings that look like structure do not mislead it", () => {
    const tricky = ['","', "]", "}", "[{", '\\"', "\\", '\\\\"},{"kind":"x"', "Façade — 北 , ] }"];
    const cases = tricky.flatMap((id, i) => [{ id, kind: "dew_point", T_C: i, RH_pct: 50 }, { id: id + id, note: [id, { id }] }]);
    for (const share of [0, 0.1, 0.3, 0.5, 0.7, 0.9]) {
      const h = halves(JSON.stringify({ cases }), share);
      expect([...h![0], ...h![1]]).toEqual(cases);
    }
  });

  test.each([
    ["another key after the cases", '{"cases":[1,2,3],"x":[4]}'],
    ["another key before the cases", '{"x":1,"cases":[1,2,3]}'],
    ["an escaped key", '{"\\u0063ases":[1,2,3]}'],
    ["cases not an array", '{"cases":{"a":1,"b":2}}'],
    ["one case", '{"cases":[{"a":[1,2,3]}]}'],
    ["an array body", "[1,2,3]"],
    ["unbalanced", '{"cases":[1]]]],2]}'],
  ])("not cut: %s", (_label, text) => {
    expect(splitCases(bytes(text))).toBeNull();
  });

  test("a stray comma leaves an empty half, which the caller refuses", () => {
    const b = bytes('{"cases":[,1]}');
    const s = splitCases(b, 0)!;
    expect(JSON.parse("[" + b.subarray(s.headStart, s.headEnd).toString() + "]")).toEqual([]);
  });
});
