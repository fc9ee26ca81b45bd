// GET /api/projects/:id/report for the demo project: the PDF the consultant downloads carries the
// cover, every zone total and every row label, matching what GET …/results answers.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { cell } from "@/report/format";
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
  test("is a PDF whose text matches the API's results, watermarked as a draft", { timeout: 180_000 }, async () => {
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
        expect(text).toContain(cell(z.loss_W, "W"));
        expect(text).toContain(cell(z.gain_W, "W"));
      }
    }
    const labels = [
      ...(await testDb()("surfaces").where({ project_id: project.id }).pluck("label")),
      ...(await testDb()("duct_runs").where({ project_id: project.id }).pluck("label")),
    ];
    expect(labels.length).toBeGreaterThanOrEqual(48);
    for (const label of labels) expect(text).toContain(label);
  });

  test("names on its cover who last edited rows and who accepted them, whoever downloads it", { timeout: 180_000 }, async () => {
    const db = testDb();
    const project = await db("projects").where({ reference: "TS-2417" }).first("id", "firm_id");
    const who = async (email: string) => (await db("users").where({ email }).first("id", "name")) as { id: number; name: string };
    const [mina, declan] = [await who("consultant@demo.filmsheet.test"), await who("checker@demo.filmsheet.test")];
    const row = await db("surfaces").where({ project_id: project.id }).orderBy("position").first("id");
    const key = { project_id: project.id, sheet: "surfaces", row_id: row.id };
    const before = await db("row_checks").where(key).first();
    await db("row_checks")
      .insert({ firm_id: project.firm_id, ...key, state: "accepted", checked_by: declan.id, checked_at: new Date(), last_edited_by: mina.id })
      .onConflict(["project_id", "sheet", "row_id"])
      .merge(["state", "checked_by", "checked_at", "last_edited_by"]);
    try {
      // The checker downloads it: the cover still says the consultant prepared it.
      const res = await request(app.server).get(`/api/projects/${project.id}/report`).set(checker).buffer(true).parse(binaryBody);
      expect(res.status).toBe(200);
      const [cover] = await pdfPages(new Uint8Array(res.body as Buffer));
      expect(cover).toContain(`Prepared by ${mina.name}`);
      expect(cover).toContain(`Checked by ${declan.name}`);
      expect(cover).not.toContain(`Prepared by ${declan.name}`);
      expect(cover).not.toContain("Every row accepted"); // one row of 50
    } finally {
      if (before) await db("row_checks").where(key).update({ state: before.state, checked_by: before.checked_by, checked_at: before.checked_at, last_edited_by: before.last_edited_by });
      else await db("row_checks").where(key).delete();
    }
  });
});
