// The shared answer writer (src/calc/serialize.ts) of POST /api/calc and npm run calc: its text is
// JSON.stringify(calculate(body)) exactly, whatever the number of batches.
import { describe, expect, test } from "vitest";
import { calculate } from "../../src/calc/index";
import { ANSWER_BATCH, calcAnswerText, writeCalcAnswer } from "../../src/calc/serialize";

const good = { kind: "radiation", T_surface_C: 10, T_surround_C: -3.25, emissivity: 0.9 };
const bad = { kind: "radiation", T_surface_C: 10, T_surround_C: 0, emissivity: 1.5 };
const warned = { kind: "air_properties", T_C: 180 };
const mixed = (n: number) => Array.from({ length: n }, (_, i) => ({ id: `r${i}`, ...[good, bad, warned][i % 3], T_surface_C: 10 + i / 7 }));

describe("calcAnswerText", () => {
  test.each([0, 1, ANSWER_BATCH - 1, ANSWER_BATCH, ANSWER_BATCH + 1, 2 * ANSWER_BATCH + 3])(
    "%i cases: byte for byte JSON.stringify(calculate(body))",
    (n) => {
      const cases = mixed(n);
      expect(calcAnswerText(cases)).toBe(JSON.stringify(calculate({ cases })));
    },
  );

  test("numbers keep full round-trip precision", () => {
    const cases = mixed(30);
    const results = JSON.parse(calcAnswerText(cases)).results as Record<string, unknown>[];
    expect(results).toEqual(calculate({ cases }).results);
  });

  test("writes one piece per batch between the opening and the closing", () => {
    const pieces: string[] = [];
    const ticks: string[] = [];
    writeCalcAnswer(mixed(ANSWER_BATCH + 1), (p) => pieces.push(p), (phase) => ticks.push(phase));
    expect(pieces).toHaveLength(4);
    expect(pieces[0]).toBe('{"results":[');
    expect(pieces[2]!.startsWith(',{"id":"r1000"')).toBe(true);
    expect(pieces[3]).toBe("]}");
    expect(ticks).toEqual(["engine", "serialize", "engine", "serialize"]);
  });
});
