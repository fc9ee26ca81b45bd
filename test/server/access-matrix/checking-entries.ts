// Access-matrix rows of the checking routes. Drafts (check view, workings, threads, history) are
// read by consultants, checkers and admins, not viewers; issued revisions by everyone in the firm.
// Checkers alone accept, query and issue; consultants ask for a check; both write in threads.
// Each entry works on a fixture project of its own, so the demo project is left as seeded.
import { buildSnapshot } from "@/checking/build-snapshot";
import { loadSnapshotInputs } from "@/server/repositories/snapshot-inputs";
import { testDb } from "../../support/db";
import { acceptAll } from "../../support/checking";
import { makeProject, type FixtureProject } from "../../support/schedule-fixtures";
import { paidDemoFirm } from "./fixtures";
import type { MatrixEntry, Principal } from "./entries";

type Status = Record<Principal, number>;
const PRINCIPALS: Principal[] = ["anonymous", "admin", "consultant", "checker", "viewer", "other_firm", "admin_token", "revoked_token", "expired_token"];
const refused = { anonymous: 401, revoked_token: 401, expired_token: 401 };
const all = (status: number) => Object.fromEntries(PRINCIPALS.map((p) => [p, status])) as Status;
/** Everyone in the firm; the other firm's admin gets 404 for the demo firm's project. */
const anyone = (ok: number): Status => ({ ...all(ok), ...refused, other_firm: 404 });
const draftReaders = (ok: number): Status => ({ ...all(403), ...refused, consultant: ok, checker: ok, admin: ok, admin_token: ok, other_firm: 404 });
/** Only these roles; everyone else 403, decided before any lookup (so the other firm too). */
const only = (ok: number, ...who: Principal[]): Status => ({ ...all(403), ...refused, ...Object.fromEntries(who.map((w) => [w, ok])) });

let shared: Promise<FixtureProject> | undefined;
/** One project for the read-only entries, with revisions A and B issued. */
function readProject(): Promise<FixtureProject> {
  shared ??= (async () => {
    const fx = await makeProject("tarnbrook-sill");
    const checker = await testDb()("users").where({ email: "checker@demo.filmsheet.test" }).first("id");
    await acceptAll(fx.projectId, checker.id);
    // The project frozen as the issuing service freezes it (twice: A and B are the same here).
    const snapshot = JSON.stringify(buildSnapshot((await loadSnapshotInputs(testDb(), fx.firmId, fx.projectId))!));
    await testDb()("revisions").insert(["A", "B"].map((letter, i) => ({ firm_id: fx.firmId, project_id: fx.projectId, sequence: i + 1, letter, issued_by: checker.id, issued_by_name: "Solveig Prynne", snapshot })));
    return fx;
  })();
  return shared;
}

let finished: Promise<string> | undefined;
/** A finished draft report build of the read-only project (its PDF a stand-in: only access is tested). */
function draftBuild(): Promise<string> {
  finished ??= (async () => {
    const fx = await readProject();
    const [b] = await testDb()("report_builds")
      .insert({ firm_id: fx.firmId, project_id: fx.projectId, kind: "draft", status: "done", progress: 1, stage: "Done", watermark: true, requested_by_name: "Matrix", filename: "matrix.pdf", pages: 1, pdf: Buffer.from("%PDF-1.4\n%%EOF\n"), byte_size: 15, finished_at: new Date() })
      .returning("id");
    return `/api/projects/${fx.projectId}/reports/${b.id}`;
  })();
  return finished;
}

const SHEETS: [string, "surfaceIds" | "ductRunIds"][] = [
  ["surfaces", "surfaceIds"],
  ["duct-runs", "ductRunIds"],
];

export const CHECKING_ENTRIES: MatrixEntry[] = [
  { file: "projects/[projectId]/checks/route.ts", method: "GET", request: async () => ({ path: `/api/projects/${(await readProject()).projectId}/checks` }), expect: draftReaders(200) },
  {
    file: "projects/[projectId]/checks/route.ts",
    method: "POST",
    request: async () => {
      const fx = await makeProject("tarnbrook-sill");
      return { path: `/api/projects/${fx.projectId}/checks`, body: { rows: fx.surfaceIds.map((id) => ({ sheet: "surfaces", id, row_version: 1 })), filter: "Unchecked · Surfaces", confirmed_count: fx.surfaceIds.length } };
    },
    expect: only(200, "checker"),
  },
  { file: "projects/[projectId]/history/route.ts", method: "GET", request: async () => ({ path: `/api/projects/${(await readProject()).projectId}/history` }), expect: draftReaders(200) },
  {
    file: "projects/[projectId]/check-requests/route.ts",
    method: "POST",
    request: async () => ({ path: `/api/projects/${(await makeProject("tarnbrook-sill")).projectId}/check-requests`, body: { message: "Matrix" } }),
    expect: only(201, "consultant"),
  },
  { file: "projects/[projectId]/revisions/route.ts", method: "GET", request: async () => ({ path: `/api/projects/${(await readProject()).projectId}/revisions` }), expect: anyone(200) },
  {
    file: "projects/[projectId]/revisions/route.ts",
    method: "POST",
    request: async () => {
      const fx = await makeProject("tarnbrook-sill");
      const checker = await testDb()("users").where({ email: "checker@demo.filmsheet.test" }).first("id");
      await acceptAll(fx.projectId, checker.id);
      return { ...(await paidDemoFirm()), path: `/api/projects/${fx.projectId}/revisions`, body: { note: "Matrix" } };
    },
    expect: only(201, "checker"),
  },
  { file: "projects/[projectId]/revisions/[letter]/route.ts", method: "GET", request: async () => ({ path: `/api/projects/${(await readProject()).projectId}/revisions/A` }), expect: anyone(200) },
  { file: "projects/[projectId]/revisions/[letter]/report/route.ts", method: "GET", request: async () => ({ path: `/api/projects/${(await readProject()).projectId}/revisions/A/report` }), expect: anyone(200) },
  // Report builds: drafts are asked for and read by the people who work on the schedule.
  // A fresh project each time: while a project's draft is queued, asking again returns it (200).
  { file: "projects/[projectId]/reports/route.ts", method: "POST", request: async () => ({ path: `/api/projects/${(await makeProject("tarnbrook-sill")).projectId}/reports`, body: { kind: "draft" } }), expect: draftReaders(202) },
  { file: "projects/[projectId]/reports/[buildId]/route.ts", method: "GET", request: async () => ({ path: await draftBuild() }), expect: draftReaders(200) },
  { file: "projects/[projectId]/reports/[buildId]/pdf/route.ts", method: "GET", request: async () => ({ path: `${await draftBuild()}/pdf` }), expect: draftReaders(200) },
  { file: "projects/[projectId]/revisions/compare/route.ts", method: "GET", request: async () => ({ path: `/api/projects/${(await readProject()).projectId}/revisions/compare?from=A&to=B` }), expect: anyone(200) },
  { file: "projects/[projectId]/notifications/route.ts", method: "GET", request: async () => ({ path: `/api/projects/${(await readProject()).projectId}/notifications` }), expect: anyone(200) },
  // E-mail settings belong to a person: an API token is refused.
  { file: "projects/[projectId]/notifications/route.ts", method: "PUT", request: async () => ({ path: `/api/projects/${(await readProject()).projectId}/notifications`, body: { muted: false } }), expect: { ...anyone(200), admin_token: 403 } },
  ...SHEETS.flatMap(([segment, ids]): MatrixEntry[] => {
    const row = async (fresh: boolean) => {
      const fx = fresh ? await makeProject("tarnbrook-sill") : await readProject();
      return `/api/projects/${fx.projectId}/${segment}/${fx[ids][0]}`;
    };
    return [
      { file: `projects/[projectId]/${segment}/[itemId]/check/route.ts`, method: "POST", request: async () => ({ path: `${await row(true)}/check`, body: { move: "accept", row_version: 1 } }), expect: only(200, "checker") },
      { file: `projects/[projectId]/${segment}/[itemId]/comments/route.ts`, method: "GET", request: async () => ({ path: `${await row(false)}/comments` }), expect: draftReaders(200) },
      { file: `projects/[projectId]/${segment}/[itemId]/comments/route.ts`, method: "POST", request: async () => ({ path: `${await row(true)}/comments`, body: { body: "Matrix note" } }), expect: only(201, "consultant", "checker") },
      { file: `projects/[projectId]/${segment}/[itemId]/working/route.ts`, method: "GET", request: async () => ({ path: `${await row(false)}/working` }), expect: draftReaders(200) },
      { file: `projects/[projectId]/${segment}/[itemId]/history/route.ts`, method: "GET", request: async () => ({ path: `${await row(false)}/history` }), expect: draftReaders(200) },
    ];
  }),
];
