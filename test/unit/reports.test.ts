// The closing line of `npm test` is computed from the runners' JSON reports.
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, test } from "vitest";
import { closingLine, countPlaywright, countVitest, readSuite, total } from "../../scripts/lib/reports.mjs";

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
