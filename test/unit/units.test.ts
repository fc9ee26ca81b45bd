// Unit conversion at the edges, checked against published factors. Expected values: NIST Special
// Publication 811 (2008 edition), Guide for the Use of the International System of Units,
// appendix B.8/B.9 ("factors for units listed alphabetically / by kind of quantity"), given there to
// 7 significant figures; tolerance 5 parts in 10^7 where the publication rounds, exact where it
// marks the factor exact. Temperature points: the Fahrenheit scale's definition (ITS-90 text).
import { describe, expect, test } from "vitest";
import { QUANTITIES, fromDisplay, toDisplay, unitLabel, type Quantity } from "@/units/units";

// [quantity, IP unit, SI value of one IP unit per NIST SP 811, exact?]
const NIST: [Quantity, string, number, boolean][] = [
  ["length", "ft", 0.3048, true],
  ["thickness", "in", 0.0254, true],
  ["area", "ft²", 0.09290304, true],
  ["speed", "mph", 0.44704, true],
  ["flow", "cfm", 4.719474e-4, false],
  ["power", "Btu/h", 0.2930711, false],
  ["heat_flux", "Btu/(h·ft²)", 3.154591, false],
  ["film", "Btu/(h·ft²·°F)", 5.678263, false],
  ["resistance", "h·ft²·°F/Btu", 0.1761102, false],
  ["conductivity", "Btu·in/(h·ft²·°F)", 0.1442279, false],
  ["linear_transmittance", "Btu/(h·ft·°F)", 1.730735, false],
  ["temperature_difference", "°F", 5 / 9, true],
];

describe("one IP unit in SI equals the NIST SP 811 factor", () => {
  test.each(NIST)("%s: 1 %s", (q, unit, si, exact) => {
    expect(unitLabel(q, "IP")).toBe(unit);
    const got = fromDisplay(q, 1, "IP");
    if (exact) expect(got).toBeCloseTo(si, 12);
    else expect(Math.abs(got / si - 1)).toBeLessThan(5e-7);
  });
});

describe("temperature points of the Fahrenheit scale", () => {
  test.each([
    [0, 32], // ice point
    [100, 212], // steam point
    [-40, -40], // the two scales cross
    [20, 68],
  ])("%d °C = %d °F", (c, f) => {
    expect(toDisplay("temperature", c, "IP")).toBeCloseTo(f, 12);
    expect(fromDisplay("temperature", f, "IP")).toBeCloseTo(c, 12);
  });
});

describe("SI display units", () => {
  test("sections and insulation are typed in millimetres and stored in metres", () => {
    expect(unitLabel("thickness", "SI")).toBe("mm");
    expect(fromDisplay("thickness", 50, "SI")).toBeCloseTo(0.05, 15);
    expect(toDisplay("thickness", 0.4, "SI")).toBeCloseTo(400, 12);
  });

  test("every other SI display unit is the stored unit itself", () => {
    for (const q of Object.keys(QUANTITIES) as Quantity[]) {
      if (q === "thickness") continue;
      expect(toDisplay(q, 12.5, "SI"), q).toBe(12.5);
    }
  });
});

describe("round trips", () => {
  test.each(Object.keys(QUANTITIES) as Quantity[])("%s: SI → IP → SI returns the value", (q) => {
    for (const v of [-30, 0, 0.035, 1, 287.5, 1e4]) {
      expect(fromDisplay(q, toDisplay(q, v, "IP"), "IP")).toBeCloseTo(v, 9);
    }
  });
});
