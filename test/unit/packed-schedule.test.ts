// The schedule as the page carries it (src/schedule/packed-schedule.ts): unpacking gives back the
// schedule exactly — every value, null and text, and each row's keys in their order — and the
// packed text is much smaller than the rows as objects.
import { describe, expect, test } from "vitest";
import type { TSchedule } from "../../src/schemas/schedule";
import { packSchedule, packedTextOf, scheduleFromText, unpackSchedule, type PackedSchedule } from "../../src/schedule/packed-schedule";
import { SAMPLE_CASES, sampleSchedule as engineSample } from "../support/sample-schedule";

/** A schedule shaped as the server stores it: ids are UUIDs, rows have a version and a position. */
function sampleSchedule(surfaces: number, ducts: number): TSchedule {
  const s = engineSample(surfaces, ducts);
  const ids = new Map<string, string>();
  const uuid = (id: string) => ids.get(id) ?? (ids.set(id, crypto.randomUUID()), ids.get(id)!);
  const stored = <T extends { id: string; zone_id?: string }>(xs: T[]) =>
    xs.map((x, i) => ({
      ...x,
      id: uuid(x.id),
      ...(x.zone_id ? { zone_id: uuid(x.zone_id) } : {}),
      ...("buildup_id" in x ? { buildup_id: uuid(x.buildup_id as string) } : {}),
      version: 1,
      position: i + 1,
    }));
  return {
    project: { id: crypto.randomUUID(), version: 1, altitude_m: s.site.altitude_m, terrain: s.site.terrain, wind_law: s.site.wind_law, default_method: s.site.method, unit_system: "SI" },
    design_cases: stored(SAMPLE_CASES),
    zones: stored(s.zones),
    buildups: stored(s.buildups),
    surfaces: stored(s.surfaces),
    duct_runs: stored(s.ductRuns),
  } as unknown as TSchedule;
}

/** Through JSON text, as the page hands it over. */
const roundTrip = (s: TSchedule) => unpackSchedule(JSON.parse(JSON.stringify(packSchedule(s))) as PackedSchedule);

describe("packed schedule", () => {
  test("unpacks to the same schedule, keys in the same order", () => {
    const s = sampleSchedule(300, 40);
    const back = roundTrip(s);
    expect(back).toEqual(s);
    expect(Object.keys(back.surfaces[7]!)).toEqual(Object.keys(s.surfaces[7]!));
    expect(Object.keys(back.duct_runs[3]!)).toEqual(Object.keys(s.duct_runs[3]!));
  });

  test("repeated texts become indexes, nulls and unique texts stay as they are", () => {
    const s = sampleSchedule(200, 0);
    s.surfaces[5] = { ...s.surfaces[5]!, method: null, label: "=HYPERLINK(\"x\")", absorptance: null };
    s.surfaces[6] = { ...s.surfaces[6]!, method: "iso6946" };
    const p = packSchedule(s).surfaces;
    const zone = p.keys.indexOf("zone_id");
    const label = p.keys.indexOf("label");
    expect(p.dicts[zone]).not.toBeNull();
    expect(p.rows[0]![zone]).toBeTypeOf("number");
    expect(p.dicts[label]).toBeNull();
    const back = roundTrip(s);
    expect(back.surfaces[5]!.method).toBeNull();
    expect(back.surfaces[5]!.label).toBe("=HYPERLINK(\"x\")");
    expect(back.surfaces[6]!.method).toBe("iso6946");
    expect(back).toEqual(s);
  });

  test("an empty sheet packs and unpacks", () => {
    const s = sampleSchedule(0, 0);
    expect(roundTrip(s)).toEqual(s);
  });

  test("rows of one sheet with different keys are refused, not half packed", () => {
    const s = sampleSchedule(3, 0);
    const { absorptance: _a, ...short } = s.surfaces[1]!;
    s.surfaces[1] = short as never;
    expect(() => packSchedule(s)).toThrow(/same keys|has no/);
  });

  test("a 5,000-row schedule packs to well under half of its text as objects", () => {
    const s = sampleSchedule(4000, 1000);
    const plain = JSON.stringify(s).length;
    const packed = JSON.stringify(packSchedule(s)).length;
    expect(packed / plain).toBeLessThan(0.5);
  });

  test("a schedule read from the page's text keeps that text (for the results worker); any other schedule has none", () => {
    const s = sampleSchedule(50, 5);
    const text = JSON.stringify(packSchedule(s));
    const read = scheduleFromText(text);
    expect(read).toEqual(s);
    expect(packedTextOf(read)).toBe(text);
    // The worker reads the same schedule from the text.
    expect(scheduleFromText(packedTextOf(read)!)).toEqual(read);
    // An edit makes a new schedule object: it has no text, and goes to the worker as objects.
    expect(packedTextOf({ ...read, surfaces: [...read.surfaces] })).toBeUndefined();
    expect(packedTextOf(s)).toBeUndefined();
  });
});
