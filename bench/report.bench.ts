// Benchmark of the calculation report (npm run bench:report): time to build the PDF of a
// 1,000-row project (880 surfaces and 120 duct runs, 3 design cases, every working in the
// appendix). Goal: 5 s. It prints figures; it asserts nothing.
import { performance } from "node:perf_hooks";
import { buildReport, buildReportAsync } from "../src/report/build-report";
import { SAMPLE_CASES, sampleSchedule } from "../test/support/sample-schedule";

const meta = {
  projectName: "Larchfield Community Library extension", projectReference: "TS-2417", siteDescription: "Larchfield; suburban; 85 m",
  firmName: "Tarnbrook & Sill Building Services", author: "Mina Okafor", checker: "Declan Rusk", date: "2026-12-02",
  status: "issued" as const, revision: "A", unitSystem: "SI" as const, watermark: false,
};

function run(surfaces: number, ducts: number): void {
  const t0 = performance.now();
  const c0 = process.cpuUsage();
  const r = buildReport({ meta, schedule: sampleSchedule(surfaces, ducts), designCases: SAMPLE_CASES });
  const cpu = process.cpuUsage(c0);
  const s = (performance.now() - t0) / 1000;
  console.log(
    `${String(surfaces + ducts).padStart(5)} rows × ${SAMPLE_CASES.length} cases: ${s.toFixed(2)} s ` +
      `(${((cpu.user + cpu.system) / 1e6).toFixed(2)} s CPU), ${r.pages} pages, ${(r.pdf.length / 1e6).toFixed(1)} MB`,
  );
}

/** As the report job builds it: in steps, handing the event loop back between them. */
async function runStepped(surfaces: number, ducts: number): Promise<void> {
  const t0 = performance.now();
  const c0 = process.cpuUsage();
  let steps = 0;
  let longest = 0;
  let last = performance.now();
  const r = await buildReportAsync({ meta, schedule: sampleSchedule(surfaces, ducts), designCases: SAMPLE_CASES }, () => {
    const now = performance.now();
    longest = Math.max(longest, now - last);
    last = now;
    steps++;
  });
  const cpu = process.cpuUsage(c0);
  console.log(
    `${String(surfaces + ducts).padStart(5)} rows × ${SAMPLE_CASES.length} cases, in steps: ${((performance.now() - t0) / 1000).toFixed(2)} s ` +
      `(${((cpu.user + cpu.system) / 1e6).toFixed(2)} s CPU), ${r.pages} pages; ${steps} progress reports, longest step ${(longest / 1000).toFixed(2)} s`,
  );
}

console.log(`report benchmark, node ${process.version}; goal: 1,000 rows in ≤ 5 s`);
run(44, 6); // warm-up and a small project
run(880, 120);
await runStepped(880, 120);
