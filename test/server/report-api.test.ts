// GET /api/projects/:id/report for the demo project: the PDF the consultant downloads carries the
// cover, every zone total and every row label, matching what GET …/results answers.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { num } from "@/report/format";
import { startAppWithSessions, type BuiltApp } from "../support/app-with-sessions";
import { closeTestDb, testDb } from "../support/db";
import { binaryBody, pdfPages } from "../support/pdf-text";

let app: BuiltApp;
let consultant: Record<string, string>;
let checker: Record<string, string>;

beforeAll(async () => {
  const started = await startAppWithSessions(["consultant@demo.filmsheet.test", "checker@demo.filmsheet.test"]);
  app = started.app;
  consultant = started.as["consultant@demo.filmsheet.test"];
  checker = started.as["checker@demo.filmsheet.test"];
});
afterAll(async () => {
  await app?.close();
  await closeTestDb();
});


describe("the demo project's draft report", () => {
  test("is a PDF whose text matches the API's results, watermarked as a draft", async () => {
    const project = await testDb()("projects").where({ reference: "TS-2417" }).first("id", "name");
    const res = await request(app.server).get(`/api/projects/${project.id}/report`).set(consultant).buffer(true).parse(binaryBody);
    expect(res.status, String(res.body)).toBe(200);
    expect(res.headers["content-type"]).toBe("application/pdf");
    expect(res.headers["content-disposition"]).toContain("TS-2417-draft-report.pdf");
    const pages = await pdfPages(new Uint8Array(res.body as Buffer));
    expect(pages.length).toBe(Number(res.headers["x-report-pages"]));
    const text = pages.join(" ");
    for (const s of [project.name, "TS-2417", "Tarnbrook & Sill Building Services", "Draft"]) expect(pages[0]).toContain(s);
    expect(pages.every((p) => p.includes("NOT FOR ISSUE"))).toBe(true);

    const cases = await testDb()("design_cases").where({ project_id: project.id }).select("id", "name");
    expect(cases.length).toBeGreaterThanOrEqual(3);
    for (const dc of cases) {
      const r = await request(app.server).get(`/api/projects/${project.id}/results?case=${dc.id}`).set(checker);
      expect(r.status).toBe(200);
      expect(text).toContain(dc.name);
      for (const z of r.body.zones as { name: string; loss_W: number; gain_W: number }[]) {
        expect(text).toContain(z.name);
        expect(text).toContain(`${num(z.loss_W)} W`);
        expect(text).toContain(`${num(z.gain_W)} W`);
      }
    }
    const labels = [
      ...(await testDb()("surfaces").where({ project_id: project.id }).pluck("label")),
      ...(await testDb()("duct_runs").where({ project_id: project.id }).pluck("label")),
    ];
    expect(labels.length).toBeGreaterThanOrEqual(48);
    for (const label of labels) expect(text).toContain(label);
  });
});
