// docs/methods.md is written from the registry; it must list every method and be up to date.
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, test } from "vitest";
import { CONVENTIONS } from "../../src/calc/conventions";
import { methodStatementMarkdown } from "../../src/calc/method-statement";
import { METHODS } from "../../src/calc/registry";

const doc = readFileSync(fileURLToPath(new URL("../../docs/methods.md", import.meta.url)), "utf8");

describe("method statement", () => {
  test("docs/methods.md matches the registry (run npm run docs:methods after changing it)", () => {
    expect(doc).toBe(methodStatementMarkdown());
  });

  test.each(METHODS.map((m) => [m.id, m] as const))("lists %s with its equation and source", (id, m) => {
    expect(doc).toContain(`\`${id}\``);
    expect(doc).toContain(m.equation);
    expect(doc).toContain(m.source);
  });

  test("states the conventions: tilt, azimuth, sign of Q, evaluation temperature", () => {
    for (const topic of ["Tilt", "Azimuth, wind direction and exposure", "Sign of heat flow", "Evaluation temperature", "Sky and cloud", "Switches", "Inputs refused"]) {
      expect(CONVENTIONS.map((c) => c.topic)).toContain(topic);
      expect(doc).toContain(`**${topic}.**`);
    }
  });
});
