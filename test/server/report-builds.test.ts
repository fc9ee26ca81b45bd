// Reports built by the job queue, on the built app (whose in-process worker runs the jobs) and the
// real PostgreSQL: a draft asked for, followed to the end and downloaded; an issued revision's
// report built as it is issued, stored, served byte for byte and refused any change by the
// database; refusals naming the field; a build that fails says why.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { runReportBuild } from "@/server/reports/run-report-build";
import { startAppWithSessions, type BuiltApp } from "../support/app-with-sessions";
import { clearPlan, grantPaidPlan } from "../support/billing";
import { acceptAll } from "../support/checking";
import { closeTestDb, testDb } from "../support/db";
import { binaryBody, pdfPages } from "../support/pdf-text";
import { makeProject } from "../support/schedule-fixtures";

const EMAILS = ["consultant@demo.filmsheet.test", "checker@demo.filmsheet.test", "viewer@demo.filmsheet.test", "admin@other.filmsheet.test"] as const;
let app: BuiltApp;
let as: Record<(typeof EMAILS)[number], Record<string, string>>;
let firmId: string;
let checkerId: number;

beforeAll(async () => {
  ({ app, as } = await startAppWithSessions(EMAILS));
  firmId = (await testDb()("firms").where({ slug: "tarnbrook-sill" }).first("id")).id;
  checkerId = (await testDb()("users").where({ email: "checker@demo.filmsheet.test" }).first("id")).id;
});
afterAll(async () => {
  await clearPlan(firmId);
  await app?.close();
  await closeTestDb();
});

const consultant = () => as["consultant@demo.filmsheet.test"];
const checker = () => as["checker@demo.filmsheet.test"];
const viewer = () => as["viewer@demo.filmsheet.test"];
const download = (path: string, who: Record<string, string>) => request(app.server).get(path).set(who).buffer(true).parse(binaryBody);

/** Polls a build until it has finished, keeping every answer (the progress seen on the way). */
async function follow(projectId: string, buildId: string, who: Record<string, string>): Promise<{ final: any; seen: any[] }> {
  const seen: any[] = [];
  const deadline = Date.now() + 90_000;
  for (;;) {
    const res = await request(app.server).get(`/api/projects/${projectId}/reports/${buildId}`).set(who);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    seen.push(res.body);
    if (res.body.status === "done" || res.body.status === "failed") return { final: res.body, seen };
    if (Date.now() > deadline) throw new Error(`build ${buildId} still ${res.body.status} after 90 s`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

describe("a draft report through the job", () => {
  test("is queued (202), reports progress that only grows, and downloads as the watermarked PDF of the schedule", async () => {
    const project = await testDb()("projects").where({ reference: "TS-2417" }).first("id", "name");
    const res = await request(app.server).post(`/api/projects/${project.id}/reports`).set(consultant()).send({ kind: "draft" });
    expect(res.status, JSON.stringify(res.body)).toBe(202);
    expect(res.body).toMatchObject({ kind: "draft", status: "queued", progress: 0, watermark: true, download: null, revision: null });

    const { final, seen } = await follow(project.id, res.body.id, checker());
    expect(final.status, final.error).toBe("done");
    expect(final.progress).toBe(1);
    const progress = seen.map((s) => s.progress as number);
    for (let i = 1; i < progress.length; i++) expect(progress[i]).toBeGreaterThanOrEqual(progress[i - 1]!);
    expect(final.download).toBe(`/api/projects/${project.id}/reports/${res.body.id}/pdf`);

    const pdf = await download(final.download, consultant());
    expect(pdf.status).toBe(200);
    expect(pdf.headers["content-disposition"]).toContain("TS-2417-draft-report.pdf");
    const pages = await pdfPages(new Uint8Array(pdf.body as Buffer));
    expect(pages.length).toBe(final.pages);
    expect(pdf.body.length).toBe(final.byte_size);
    expect(pages[0]).toContain(project.name);
    expect(pages[0]).toContain("Draft");
    expect(pages.every((p) => p.includes("NOT FOR ISSUE"))).toBe(true);
    const labels = await testDb()("surfaces").where({ project_id: project.id }).pluck("label");
    for (const label of labels) expect(pages.join(" ")).toContain(label);
  });

  test("records its stages as it goes when the job is run directly", async () => {
    const fx = await makeProject("tarnbrook-sill");
    // Queued without the queue: this test runs the job itself and reads the row between writes.
    const [b] = await testDb()("report_builds").insert({ firm_id: fx.firmId, project_id: fx.projectId, kind: "draft", watermark: true, requested_by_name: "Test" }).returning("id");
    await runReportBuild(b.id);
    const row = await testDb()("report_builds").where({ id: b.id }).first();
    expect(row).toMatchObject({ status: "done", progress: 1, stage: "Done", error: null });
    expect(row.pages).toBeGreaterThan(3);
    expect(Buffer.from(row.pdf).subarray(0, 5).toString("latin1")).toBe("%PDF-");
    expect(new Date(row.finished_at).getTime()).toBeGreaterThanOrEqual(new Date(row.started_at).getTime());
    // Run again (a duplicate delivery): a finished build is left alone.
    await runReportBuild(b.id);
    expect((await testDb()("report_builds").where({ id: b.id }).first("finished_at")).finished_at).toEqual(row.finished_at);
  });

  test("viewers may not ask for one or read a draft's progress; the other firm gets 404; a bad kind is named", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const post = (who: Record<string, string>, body: unknown) => request(app.server).post(`/api/projects/${fx.projectId}/reports`).set(who).send(body as object);
    expect((await post(viewer(), { kind: "draft" })).status).toBe(403);
    expect((await post(as["admin@other.filmsheet.test"], { kind: "draft" })).status).toBe(404);
    const bad = await post(consultant(), { kind: "final" });
    expect(bad.status).toBe(422);
    expect(bad.body.error.details[0].field).toBe("body.kind");
    expect(await testDb()("report_builds").where({ project_id: fx.projectId })).toEqual([]);

    const ok = await post(consultant(), {});
    expect(ok.status).toBe(202);
    expect((await request(app.server).get(`/api/projects/${fx.projectId}/reports/${ok.body.id}`).set(viewer())).status).toBe(403);
    expect((await request(app.server).get(`/api/projects/${fx.projectId}/reports/${ok.body.id}`).set(as["admin@other.filmsheet.test"])).status).toBe(404);
    expect((await request(app.server).get(`/api/projects/${fx.projectId}/reports/not-a-uuid`).set(consultant())).body.error.details[0].field).toBe("params.buildId");
    await follow(fx.projectId, ok.body.id, consultant());
  });

  test("a PDF asked for before it is built is 409 with its progress; a build gone quiet is reported as interrupted", async () => {
    const fx = await makeProject("tarnbrook-sill");
    const [waiting] = await testDb()("report_builds").insert({ firm_id: fx.firmId, project_id: fx.projectId, kind: "draft", status: "running", progress: 0.42, stage: "Writing the appendix of workings", watermark: true, requested_by_name: "Test" }).returning("id");
    const early = await request(app.server).get(`/api/projects/${fx.projectId}/reports/${waiting.id}/pdf`).set(consultant());
    expect(early.status).toBe(409);
    expect(early.body.error.message).toContain("42 %");

    // Another project: one project holds one queued or running draft at a time.
    const other = await makeProject("tarnbrook-sill");
    const [quiet] = await testDb()("report_builds")
      .insert({ firm_id: other.firmId, project_id: other.projectId, kind: "draft", status: "running", progress: 0.3, stage: "Writing", watermark: true, requested_by_name: "Test", updated_at: new Date(Date.now() - 20 * 60_000) })
      .returning("id");
    const res = await request(app.server).get(`/api/projects/${other.projectId}/reports/${quiet.id}`).set(consultant());
    expect(res.body).toMatchObject({ status: "failed", stage: "Interrupted" });
    expect(res.body.error).toContain("ask for the report again");
  });

  test("a build that fails is marked failed with the reason, and its PDF is refused with it", async () => {
    const fx = await makeProject("tarnbrook-sill");
    // A revision whose snapshot lacks its schedule (inserted by hand): the build cannot be made.
    const [rev] = await testDb()("revisions").insert({ firm_id: fx.firmId, project_id: fx.projectId, sequence: 1, letter: "A", issued_by: checkerId, issued_by_name: "Test", snapshot: JSON.stringify({ format: 1 }) }).returning("id");
    const [b] = await testDb()("report_builds").insert({ firm_id: fx.firmId, project_id: fx.projectId, revision_id: rev.id, kind: "revision", watermark: false, requested_by_name: "Test" }).returning("id");
    await runReportBuild(b.id);
    const row = await testDb()("report_builds").where({ id: b.id }).first("status", "error", "stage");
    expect(row.status).toBe("failed");
    expect(row.error.length).toBeGreaterThan(0);
    const res = await request(app.server).get(`/api/projects/${fx.projectId}/reports/${b.id}/pdf`).set(viewer());
    expect(res.status).toBe(409);
    expect(res.body.error.message).toContain("could not be built");
    expect(await testDb()("revision_reports").where({ revision_id: rev.id })).toEqual([]);
  });
});

describe("an issued revision's report", () => {
  test("is built by the job as the revision is issued, clean on the paid plan, stored and served byte for byte", async () => {
    await grantPaidPlan(firmId);
    const fx = await makeProject("tarnbrook-sill");
    await acceptAll(fx.projectId, checkerId);
    const issued = await request(app.server).post(`/api/projects/${fx.projectId}/revisions`).set(checker()).send({});
    expect(issued.status).toBe(201);
    // The build was queued in the issuing transaction.
    const { final } = await follow(fx.projectId, issued.body.report_build_id, viewer());
    expect(final).toMatchObject({ kind: "revision", revision: "A", status: "done", watermark: false, download: `/api/projects/${fx.projectId}/revisions/A/report` });
    const stored = await testDb()("revision_reports").where({ revision_id: issued.body.id }).first("pdf", "pages", "watermark");
    expect(stored).toMatchObject({ pages: final.pages, watermark: false });

    const a = await download(final.download, viewer());
    const b = await download(`/api/projects/${fx.projectId}/reports/${final.id}/pdf`, checker());
    expect(Buffer.compare(a.body, Buffer.from(stored.pdf))).toBe(0);
    expect(Buffer.compare(b.body, Buffer.from(stored.pdf))).toBe(0);
    const pages = await pdfPages(new Uint8Array(a.body as Buffer));
    expect(pages[0]).toContain("Issued");
    expect(pages.join(" ")).not.toContain("NOT FOR ISSUE");
  });

  test("the database refuses to change or delete a stored revision report, whoever asks", async () => {
    await grantPaidPlan(firmId);
    const fx = await makeProject("tarnbrook-sill");
    await acceptAll(fx.projectId, checkerId);
    const issued = await request(app.server).post(`/api/projects/${fx.projectId}/revisions`).set(checker()).send({});
    await follow(fx.projectId, issued.body.report_build_id, checker());
    const where = { revision_id: issued.body.id };
    await expect(testDb()("revision_reports").where(where).update({ pdf: Buffer.from("%PDF-forged") })).rejects.toThrow(/never changed: UPDATE refused/);
    await expect(testDb()("revision_reports").where(where).update({ watermark: true })).rejects.toThrow(/never changed/);
    await expect(testDb()("revision_reports").where(where).delete()).rejects.toThrow(/never changed: DELETE refused/);
    await expect(testDb().raw("TRUNCATE revision_reports CASCADE")).rejects.toThrow(/TRUNCATE refused/);
    expect(await testDb()("revision_reports").where(where).first("watermark")).toEqual({ watermark: false });
  });

  test("downloaded the moment it is issued, it is the same ever after; one issued before reports were kept takes today's plan", async () => {
    await grantPaidPlan(firmId);
    const fx = await makeProject("tarnbrook-sill");
    await acceptAll(fx.projectId, checkerId);
    const issued = await request(app.server).post(`/api/projects/${fx.projectId}/revisions`).set(checker()).send({});
    expect(issued.status).toBe(201);
    const first = await download(`/api/projects/${fx.projectId}/revisions/A/report`, viewer());
    expect(first.status).toBe(200);
    // Whichever build was stored first (the job's or this request's) is what every later request gets.
    await clearPlan(firmId);
    const again = await download(`/api/projects/${fx.projectId}/revisions/A/report`, viewer());
    expect(Buffer.compare(first.body, again.body)).toBe(0);
    expect((await pdfPages(new Uint8Array(again.body as Buffer))).join(" ")).not.toContain("NOT FOR ISSUE");

    // One issued with no build row at all (before reports were kept) takes the plan of today: free.
    const fx2 = await makeProject("tarnbrook-sill");
    await testDb()("revisions").insert({ firm_id: fx2.firmId, project_id: fx2.projectId, sequence: 1, letter: "A", issued_by: checkerId, issued_by_name: "Test", snapshot: (await testDb()("revisions").where({ id: issued.body.id }).first("snapshot")).snapshot });
    const free = await download(`/api/projects/${fx2.projectId}/revisions/A/report`, checker());
    expect(free.status).toBe(200);
    expect((await pdfPages(new Uint8Array(free.body as Buffer))).every((p) => p.includes("NOT FOR ISSUE"))).toBe(true);
    expect(await testDb()("revision_reports").where({ project_id: fx2.projectId }).first("watermark")).toEqual({ watermark: true });
  });
});
