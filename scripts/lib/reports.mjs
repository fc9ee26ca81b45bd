// Turns the runners' JSON reports into the closing line CI reads: `N passed, N failed`.
import { existsSync, readFileSync } from "node:fs";

/**
 * Errors Vitest met outside any test, as vitest.config.ts writes them (a JSON line each): a
 * summary for the closing note (where and what, each message cut to 300 characters) and each
 * error's stack to print; null when there were none.
 */
export function unhandledErrors(file) {
  if (!existsSync(file)) return null;
  const errors = readFileSync(file, "utf8").split("\n").filter(Boolean).map((l) => JSON.parse(l));
  if (errors.length === 0) return null;
  const kind = (e) => (e.type ?? "error").toLowerCase();
  return {
    summary: errors.map((e) => `${kind(e)} in ${e.where}: ${e.name}: ${String(e.message).slice(0, 300)}`).join("; "),
    stacks: errors.map((e) => `Vitest met an ${kind(e)} (${e.where}):\n${e.stack ?? `${e.name}: ${e.message}`}`),
  };
}

/** Counts from a Vitest JSON report; a file that failed to load counts as one failure. */
export function countVitest(report) {
  const brokenFiles = (report.testResults ?? []).filter((f) => f.status === "failed" && (f.assertionResults ?? []).length === 0).length;
  return { passed: report.numPassedTests ?? 0, failed: (report.numFailedTests ?? 0) + brokenFiles };
}

/** Counts from a Playwright JSON report; errors outside any test (config, web server) count as failures. */
export function countPlaywright(report) {
  const s = report.stats ?? {};
  return { passed: (s.expected ?? 0) + (s.flaky ?? 0), failed: (s.unexpected ?? 0) + (report.errors ?? []).length };
}

/**
 * Reads one suite's report. A runner that exited non-zero without a report, or with a report
 * that shows no failure, still counts as one failure so the total can never look green.
 */
export function readSuite(file, count, exitCode) {
  if (!existsSync(file)) return { passed: 0, failed: 1, note: `no report at ${file}` };
  let counts;
  try {
    counts = count(JSON.parse(readFileSync(file, "utf8")));
  } catch (err) {
    return { passed: 0, failed: 1, note: `unreadable report ${file}: ${err.message}` };
  }
  if (exitCode !== 0 && counts.failed === 0) return { ...counts, failed: 1, note: `runner exited ${exitCode}` };
  return counts;
}

export function total(suites) {
  return suites.reduce((t, s) => ({ passed: t.passed + s.passed, failed: t.failed + s.failed }), { passed: 0, failed: 0 });
}

export function closingLine({ passed, failed }) {
  return `${passed} passed, ${failed} failed`;
}
