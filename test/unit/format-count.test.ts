// Counts of rows and surfaces on screen carry thousands separators, as the schedule's numbers do
// (English-language engineering documents write 4,000: common practice).
import { expect, test } from "vitest";
import { formatCount } from "@/units/format";

test.each([
  [0, "0"],
  [1, "1"],
  [999, "999"],
  [2150, "2,150"],
  [4000, "4,000"],
  [1234567, "1,234,567"],
])("%d rows read %s", (n, shown) => {
  expect(formatCount(n)).toBe(shown);
});
