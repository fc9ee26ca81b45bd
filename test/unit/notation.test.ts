// Numbers and words as the working and the report print them. Expected strings are written out by
// hand from the rules in src/units/notation.ts (three significant figures, temperatures to 0.1 K,
// heat flows to the watt, en-GB thousands separators) and the registry's titles.
import { describe, expect, test } from "vitest";
import { METHODS } from "../../src/calc/registry";
import { methodTitle, plainText, plainWord } from "../../src/report/plain-words";
import { formatNumber, scientific } from "../../src/units/notation";
import { shownValue } from "../../src/components/working/working-lines";

describe("engineering notation", () => {
  test.each([
    [1.8537e10, 3, "1.85×10¹⁰"],
    [2.52e10, 3, "2.52×10¹⁰"],
    [1.6910e-5, 3, "1.69×10⁻⁵"],
    [-3.2e-4, 2, "−3.2×10⁻⁴"],
    [5e5, 1, "5×10⁵"],
  ])("%s to %i figures → %s", (v, sig, out) => {
    expect(scientific(v, sig)).toBe(out);
  });
});

describe("one rule per quantity, by its unit", () => {
  test.each([
    [12345.6, "W", "12,346"], // heat flows to the watt, with separators
    [-8.2437, "°C", "−8.2"], // temperatures to 0.1 K, with a real minus sign
    [-0.04, "°C", "0.0"], // no "−0.0"
    [0.192686, "W/m²K", "0.193"], // three significant figures
    [5.086591, "W/m²K", "5.09"],
    [100308.04, "Pa", "100,000"],
    [311441.25, "", "311,400"], // dimensionless groups to four figures
    [25200819842.87, "", "2.520×10¹⁰"],
    [0.0000169101, "Pa·s", "1.69×10⁻⁵"],
    [0, "W", "0"],
    [Number.NaN, "W", "–"],
  ])("%s %s → %s", (v, unit, out) => {
    expect(formatNumber(v, unit)).toBe(out);
  });

  test("never the computer's exponent", () => {
    for (const v of [1e-9, 3.3e7, 1.8537e10, 6.02e23]) expect(formatNumber(v, "")).not.toMatch(/e[+-]?\d/);
  });
});

describe("plain words for identifiers", () => {
  test("every registry id has a title, never the id itself", () => {
    for (const m of METHODS) {
      expect(methodTitle(m.id)).toBe(m.title);
      expect(plainWord(m.id)).not.toContain(m.id);
    }
  });

  test.each([
    ["boundary_layer", "boundary layer over the surface"],
    ["out_of_range", "Outside the published range"],
    ["combined", "forced and natural together"],
    ["some_new_code", "some new code"],
  ])("%s → %s", (id, words) => {
    expect(plainWord(id)).toBe(words);
  });

  test("prose loses its identifiers and computer exponents", () => {
    const t = plainText("boundary_layer: the churchill-combined-plate coefficient, Re 1000…1.000e8, mcadams above 7 m/s");
    expect(t).toBe("boundary layer over the surface: the Combined forced and natural convection, plates (Churchill, n = 3) coefficient, Re 1000…1×10⁸, McAdams wind coefficient above 7 m/s");
  });

  test("a working's values: numbers by rule, words for identifiers and flags", () => {
    expect(shownValue(1.8537e10, "")).toBe("1.854×10¹⁰");
    expect(shownValue("boundary_layer", "")).toBe("boundary layer over the surface");
    expect(shownValue(false, "")).toBe("no");
    expect(shownValue(-29.4078, "°C")).toBe("−29.4");
  });
});
