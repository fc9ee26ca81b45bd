// Types for reports.mjs (plain JavaScript so the test script runs before anything is compiled).
export interface Counts {
  passed: number;
  failed: number;
  note?: string;
}
export function countVitest(report: unknown): Counts;
export function countPlaywright(report: unknown): Counts;
export function readSuite(file: string, count: (report: unknown) => Counts, exitCode: number): Counts;
export function total(suites: Counts[]): Counts;
export function closingLine(counts: Counts): string;
export function unhandledErrors(file: string): { summary: string; stacks: string[] } | null;
