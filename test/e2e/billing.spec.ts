// The demo firm upgrades in a real browser: the free plan stops the consultant at one project,
// the admin buys seats on the Stripe stand-in's Checkout page, the signed webhook makes the firm
// paid, and the consultant's second project is then saved. (The free plan's 40-row limit is
// checked by the same service once the schedule exists; here the project limit stands for it.)
import { expect, test, type Browser, type Page } from "@playwright/test";
import knexFactory, { type Knex } from "knex";

const PASSWORD = process.env.DEMO_PASSWORD || "filmsheet-demo";
let db: Knex;

async function signedIn(browser: Browser, email: string): Promise<Page> {
  const page = await (await browser.newContext()).newPage();
  await page.goto("/sign-in?callbackUrl=%2Fprojects");
  await page.getByLabel("E-mail", { exact: true }).fill(email);
  await page.getByLabel("Password").fill(PASSWORD);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await expect(page).toHaveURL(/\/projects$/);
  return page;
}

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
  await demoFirmFree();
  await db.destroy();
});

test("the demo admin upgrades through Checkout, and the consultant's second project becomes possible", async ({ browser }) => {
  test.setTimeout(60_000);
  const reference = `TS-E2E-${Date.now().toString(36).toUpperCase()}`;

  // On the free plan the consultant sees the limits and is refused a second project.
  const consultant = await signedIn(browser, "consultant@demo.filmsheet.test");
  await expect(consultant.getByRole("complementary", { name: "Plan" })).toContainText("Your firm is on the free plan");
  await expect(consultant.getByRole("complementary", { name: "Plan" })).toContainText("Ask a firm admin to upgrade");
  await createProject(consultant, reference);
  await expect(consultant.getByRole("main").getByRole("alert")).toContainText("The free plan holds 1 project");
  await expect(consultant.getByRole("cell", { name: reference })).toHaveCount(0);

  // The admin follows the upgrade path to the billing page and on to Checkout.
  const admin = await signedIn(browser, "admin@demo.filmsheet.test");
  await admin.getByRole("link", { name: "Upgrade" }).click();
  await expect(admin).toHaveURL(/\/firm\/billing$/);
  await expect(admin.getByRole("region", { name: "Plan" })).toContainText("Free plan");
  // The form offers the seats in use (4 demo members, plus whatever earlier suites added); buy two more.
  const field = admin.getByRole("spinbutton", { name: "Seats" });
  const inUse = Number(await field.inputValue());
  expect(inUse).toBeGreaterThanOrEqual(4);
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
  await expect(admin.getByRole("button", { name: "Change seats" })).toBeVisible();

  // The consultant's projects page no longer shows the limits, and the project is saved.
  await consultant.reload();
  await expect(consultant.getByRole("complementary", { name: "Plan" })).toHaveCount(0);
  await createProject(consultant, reference);
  await expect(consultant.getByRole("status")).toHaveText(`Project ${reference} created`);
  await expect(consultant.getByRole("cell", { name: reference })).toBeVisible();
});

test("a viewer cannot reach billing: the page says it is for admins and offers no controls", async ({ browser }) => {
  const viewer = await signedIn(browser, "viewer@demo.filmsheet.test");
  await viewer.goto("/firm/billing");
  await expect(viewer.getByRole("heading", { name: "For firm admins" })).toBeVisible();
  await expect(viewer.getByRole("button", { name: /checkout|Manage payment|Change seats/ })).toHaveCount(0);
});
