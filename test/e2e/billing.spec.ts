// The demo firm upgrades in a real browser: the free plan stops the consultant at 40 rows in the
// demo project (its seeded schedule already holds 50) and at one project; the admin buys seats on
// the Stripe stand-in's Checkout page, the signed webhook makes the firm paid, and the row and the
// consultant's second project are then saved.
import { expect, test, type Page } from "@playwright/test";
import knexFactory, { type Knex } from "knex";
import { signedIn } from "./support/sign-in";

let db: Knex;
const started = new Date();


async function createProject(page: Page, reference: string) {
  await page.getByLabel("Reference").fill(reference);
  await page.getByLabel("Name").fill("Larchfield Community Library, plant-room annexe");
  await page.getByRole("button", { name: "Create project" }).click();
}

/** The demo firm on the free plan with its free seats, as the seed leaves it. */
async function demoFirmFree() {
  const firm = await db("firms").where({ slug: "tarnbrook-sill" }).first("id");
  await db("firm_billing").where({ firm_id: firm.id }).delete();
  await db("firms").where({ id: firm.id }).update({ seats: 5 });
}

test.beforeAll(async () => {
  // Earlier suites (or an earlier run) may have left the demo firm paid: start from the free plan.
  db = knexFactory({ client: "pg", connection: process.env.E2E_DATABASE_URL, pool: { min: 0, max: 1 } });
  await demoFirmFree();
});
test.afterAll(async () => {
  // The row this test added to the demo project goes again, so later suites see the seeded schedule.
  const added = await db("surfaces").where("label", "like", "% (new)").where("created_at", ">=", started).pluck("id");
  await db("row_checks").whereIn("row_id", added).delete();
  await db("surfaces").whereIn("id", added).delete();
  await demoFirmFree();
  await db.destroy();
});

/** The demo project's rows (surfaces and duct runs) as stored. */
async function demoRows(): Promise<number> {
  const p = await db("projects").where({ reference: "TS-2417" }).first("id");
  const [{ s }] = await db("surfaces").where({ project_id: p.id }).count({ s: "*" });
  const [{ d }] = await db("duct_runs").where({ project_id: p.id }).count({ d: "*" });
  return Number(s) + Number(d);
}

test("the demo admin upgrades through Checkout; a row beyond the free 40 and the consultant's second project become possible", async ({ browser }) => {
  test.setTimeout(90_000);
  const reference = `TS-E2E-${Date.now().toString(36).toUpperCase()}`;

  // On the free plan the consultant sees the limits and is refused a second project.
  const consultant = await signedIn(browser, "consultant@demo.filmsheet.test");
  await expect(consultant.getByRole("complementary", { name: "Plan" })).toContainText("Your firm is on the free plan");
  await expect(consultant.getByRole("complementary", { name: "Plan" })).toContainText("Ask a firm admin to upgrade");
  await createProject(consultant, reference);
  await expect(consultant.getByRole("main").getByRole("alert")).toContainText("The free plan holds 1 project");
  await expect(consultant.getByRole("cell", { name: reference })).toHaveCount(0);

  // Nor may the demo project (50 rows as seeded) take another row: the free plan holds 40.
  const rowsBefore = await demoRows();
  expect(rowsBefore).toBeGreaterThan(40);
  await consultant.getByRole("link", { name: "TS-2417" }).click();
  await consultant.getByRole("button", { name: "Add row" }).click();
  const refusal = consultant.getByRole("alert").filter({ hasText: "The free plan holds 40 rows per project" });
  await expect(refusal).toContainText(`this change would make ${rowsBefore + 1}`);
  expect(await demoRows()).toBe(rowsBefore);
  await refusal.getByRole("button", { name: "Dismiss" }).click();
  await expect(refusal).toHaveCount(0);

  // The admin follows the upgrade path to the billing page and on to Checkout.
  const admin = await signedIn(browser, "admin@demo.filmsheet.test");
  await admin.getByRole("link", { name: "Upgrade" }).click();
  await expect(admin).toHaveURL(/\/firm\/billing$/);
  await expect(admin.getByRole("region", { name: "Plan" })).toContainText("Free plan");
  // The form offers the seats in use (4 demo members, plus whatever earlier suites added), and never
  // fewer than the free plan's 5 (a firm upgrading keeps at least what it had); buy two more.
  const field = admin.getByRole("spinbutton", { name: "Seats" });
  const inUse = Number(await field.inputValue());
  expect(inUse).toBeGreaterThanOrEqual(5);
  const seats = inUse + 2;
  await field.fill(String(seats));
  await admin.getByRole("button", { name: "Continue to checkout" }).click();

  // The stand-in's Checkout page, where Stripe's would be.
  await expect(admin).toHaveURL(/\/checkout\/cs_test_/);
  await expect(admin.getByRole("heading", { name: "Subscribe: Filmsheet seat" })).toBeVisible();
  await expect(admin.getByText(`${seats}`, { exact: true })).toBeVisible();
  await admin.getByRole("button", { name: "Pay and subscribe" }).click();

  // Back in Filmsheet: the webhook has made the firm paid.
  await expect(admin).toHaveURL(/\/firm\/billing\?checkout=done$/);
  await expect(admin.getByRole("status").first()).toHaveText(`Payment received: the firm is on the paid plan with ${seats} seats.`);
  await expect(admin.getByRole("region", { name: "Plan" })).toContainText("Paid plan");
  await expect(admin.getByRole("region", { name: "Invoices" }).getByRole("cell", { name: /^FSLOCAL-/ })).toHaveCount(1);
  await expect(admin.getByRole("region", { name: "Invoices" })).toContainText("paid");
  // The invoice links its PDF (served by Stripe; here by the stand-in).
  const pdfLink = admin.getByRole("region", { name: "Invoices" }).getByRole("link", { name: /^PDF of invoice FSLOCAL-/ });
  const pdf = await admin.request.get((await pdfLink.getAttribute("href"))!);
  expect(pdf.headers()["content-type"]).toBe("application/pdf");
  expect((await pdf.body()).subarray(0, 5).toString()).toBe("%PDF-");
  await expect(admin.getByRole("button", { name: "Change seats" })).toBeVisible();

  // The consultant's row is now saved …
  await consultant.getByRole("button", { name: "Add row" }).click();
  await expect.poll(demoRows).toBe(rowsBefore + 1);
  await expect(consultant.getByRole("alert").filter({ hasText: "The free plan holds 40 rows" })).toHaveCount(0);

  // … the projects page no longer shows the limits, and the second project is saved and opened.
  await consultant.goto("/projects");
  await expect(consultant.getByRole("complementary", { name: "Plan" })).toHaveCount(0);
  await createProject(consultant, reference);
  await expect(consultant).toHaveURL(/\/projects\/[0-9a-f-]{36}$/);
  await expect(consultant.getByRole("heading", { level: 1, name: "Larchfield Community Library, plant-room annexe" })).toBeVisible();
  await consultant.goto("/projects");
  await expect(consultant.getByRole("cell", { name: reference })).toBeVisible();
});

test("a viewer cannot reach billing: the page says it is for admins and offers no controls", async ({ browser }) => {
  const viewer = await signedIn(browser, "viewer@demo.filmsheet.test");
  await viewer.goto("/firm/billing");
  await expect(viewer.getByRole("heading", { name: "For firm admins" })).toBeVisible();
  await expect(viewer.getByRole("button", { name: /checkout|Manage payment|Change seats/ })).toHaveCount(0);
});
