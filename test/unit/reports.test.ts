// The closing line of `npm test` is computed from the runners' JSON reports.
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, test } from "vitest";
import { closingLine, countPlaywright, countVitest, readSuite, total, unhandledErrors } from "../../scripts/lib/reports.mjs";

describe("countVitest", () => {
  test.each([
    ["all green", { numPassedTests: 12, numFailedTests: 0, testResults: [{ status: "passed", assertionResults: [{}] }] }, { passed: 12, failed: 0 }],
    ["two failures", { numPassedTests: 3, numFailedTests: 2, testResults: [] }, { passed: 3, failed: 2 }],
    ["a file that failed to load", { numPassedTests: 4, numFailedTests: 0, testResults: [{ status: "failed", assertionResults: [] }] }, { passed: 4, failed: 1 }],
  ])("%s", (_label, report, expected) => {
    expect(countVitest(report)).toEqual(expected);
  });
});

describe("countPlaywright", () => {
  test.each([
    ["all green", { stats: { expected: 2, unexpected: 0, flaky: 0, skipped: 0 }, errors: [] }, { passed: 2, failed: 0 }],
    ["a flaky pass counts as passed", { stats: { expected: 1, unexpected: 0, flaky: 1 } }, { passed: 2, failed: 0 }],
    ["a global error counts as a failure", { stats: { expected: 0, unexpected: 0 }, errors: [{ message: "webServer" }] }, { passed: 0, failed: 1 }],
  ])("%s", (_label, report, expected) => {
    expect(countPlaywright(report)).toEqual(expected);
  });
});

describe("readSuite", () => {
  const dir = mkdtempSync(join(tmpdir(), "filmsheet-reports-"));

  test("a missing report is one failure", () => {
    expect(readSuite(join(dir, "none.json"), countVitest, 1)).toMatchObject({ passed: 0, failed: 1 });
  });

  test("a non-zero exit with an all-green report is still one failure", () => {
    const file = join(dir, "green.json");
    writeFileSync(file, JSON.stringify({ numPassedTests: 5, numFailedTests: 0, testResults: [] }));
    expect(readSuite(file, countVitest, 1)).toMatchObject({ passed: 5, failed: 1 });
    expect(readSuite(file, countVitest, 0)).toEqual({ passed: 5, failed: 0 });
  });
});

test("total and closingLine give the line CI reads", () => {
  expect(closingLine(total([{ passed: 10, failed: 0 }, { passed: 3, failed: 1 }]))).toBe("13 passed, 1 failed");
});

describe("unhandledErrors", () => {
  const dir = mkdtempSync(join(tmpdir(), "fs-unhandled-"));
  test("none written: nothing to say", () => {
    expect(unhandledErrors(join(dir, "absent.jsonl"))).toBeNull();
    writeFileSync(join(dir, "empty.jsonl"), "");
    expect(unhandledErrors(join(dir, "empty.jsonl"))).toBeNull();
  });
  test("each error is named with the test it came during, its message cut to 300 characters, and its stack kept to print", () => {
    const file = join(dir, "two.jsonl");
    const long = "x".repeat(400);
    writeFileSync(
      file,
      [
        JSON.stringify({ type: "Unhandled Rejection", name: "Error", message: "socket hang up", where: "test/server/a.test.ts › saves", stack: "Error: socket hang up\n    at a.ts:1:1" }),
        JSON.stringify({ type: "Uncaught Exception", name: "TypeError", message: long, where: "no test named" }),
      ].join("\n") + "\n",
    );
    const out = unhandledErrors(file)!;
    expect(out.summary).toBe(`unhandled rejection in test/server/a.test.ts › saves: Error: socket hang up; uncaught exception in no test named: TypeError: ${"x".repeat(300)}`);
    expect(out.stacks).toEqual(["Vitest met an unhandled rejection (test/server/a.test.ts › saves):\nError: socket hang up\n    at a.ts:1:1", `Vitest met an uncaught exception (no test named):\nTypeError: ${long}`]);
  });
});
