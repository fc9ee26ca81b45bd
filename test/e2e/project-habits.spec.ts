// Project habits in a real browser as the demo consultant: "Create project" opens the new project,
// whose page says what to set up first and offers the import at once; the design-case form's hint
// follows the kind chosen; the export menu closes on Escape, an outside click and a download.
// With E2E_SHOTS_DIR set, the empty project page and the new design case form are saved as
// screenshots at 1366×768.
import { expect as baseExpect, test, type Page } from "@playwright/test";
import knexFactory, { type Knex } from "knex";
import { signIn } from "./support/sign-in";

test.describe.configure({ timeout: 90_000 });
test.use({ actionTimeout: 15_000, viewport: { width: 1366, height: 768 } });
const expect = baseExpect.configure({ timeout: 15_000 });
const SHOTS = process.env.E2E_SHOTS_DIR;

let db: Knex;
let demoFirmId: string;
const created: string[] = [];

test.beforeAll(async () => {
  db = knexFactory({ client: "pg", connection: process.env.E2E_DATABASE_URL, pool: { min: 0, max: 1 } });
  demoFirmId = (await db("firms").where({ slug: "tarnbrook-sill" }).first("id")).id;
});
test.afterAll(async () => {
  // Leave the demo firm as seeded: its one project, on the free plan.
  if (created.length) await db("projects").whereIn("reference", created).delete();
  await db("firm_billing").where({ firm_id: demoFirmId }).delete();
  await db.destroy();
});

async function openDemo(page: Page, section = "") {
  await signIn(page, "consultant@demo.filmsheet.test");
  await page.getByRole("link", { name: "TS-2417" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Larchfield Community Library, extension" })).toBeVisible();
  if (section) await page.getByRole("navigation", { name: "Project" }).getByRole("link", { name: section }).click();
}

test("Create project opens the new project, which says what to set up first and offers the import at once", async ({ page }) => {
  // A second project needs the paid plan (the free plan holds one).
  await db("firm_billing").insert({ firm_id: demoFirmId, subscription_status: "active", subscription_seats: 50 }).onConflict("firm_id").merge();
  const reference = `TS-NEW-${Date.now().toString(36).toUpperCase()}`;
  created.push(reference);
  await signIn(page, "consultant@demo.filmsheet.test");
  await page.getByLabel("Reference").fill(reference);
  await page.getByLabel("Name").fill("Larchfield depot, workshop bay");
  await page.getByRole("button", { name: "Create project" }).click();

  await expect(page).toHaveURL(/\/projects\/[0-9a-f-]{36}$/);
  await expect(page.getByRole("heading", { level: 1, name: "Larchfield depot, workshop bay" })).toBeVisible();
  const setup = page.getByRole("region", { name: "Set up the project" });
  await expect(setup).toBeVisible();
  const steps = setup.getByRole("listitem");
  await expect(steps).toHaveCount(3);
  await expect(steps.nth(0)).toContainText("Zones");
  await expect(steps.nth(0)).toContainText("none yet");
  await expect(steps.nth(1)).toContainText("Build-ups");
  await expect(steps.nth(2)).toContainText("A design case");
  await expect(setup.getByRole("link", { name: "Add zones →" })).toHaveAttribute("href", /\/zones$/);
  await expect(setup.getByRole("link", { name: "Add build-ups →" })).toHaveAttribute("href", /\/buildups$/);
  await expect(setup.getByRole("link", { name: "Add a design case →" })).toHaveAttribute("href", /\/design-cases$/);
  await expect(setup.getByRole("link", { name: "Site and units" })).toHaveAttribute("href", /\/settings$/);
  if (SHOTS) await page.screenshot({ path: `${SHOTS}/project-empty.png`, fullPage: true });

  // The import is there at once, before any design case exists.
  const importButton = setup.getByRole("button", { name: "Import a schedule…" });
  await expect(importButton).toBeEnabled();
  await importButton.click();
  await expect(importButton).toHaveAttribute("aria-expanded", "true");
  await expect(page.getByRole("region", { name: "Import a schedule" })).toBeVisible();
  if (SHOTS) await page.screenshot({ path: `${SHOTS}/project-empty-import.png`, fullPage: true });

  // Each step's link opens its page; once a zone exists the step says so.
  await setup.getByRole("link", { name: "Add zones →" }).click();
  await expect(page).toHaveURL(/\/zones$/);
  const zone = page.locator("form").filter({ has: page.getByRole("heading", { name: "New zone" }) });
  await zone.getByLabel("Name").fill("Workshop");
  await zone.getByLabel(/^Floor area/).fill("220");
  await zone.getByLabel(/^Heating set point/).fill("16");
  await zone.getByLabel(/^Cooling set point/).fill("26");
  await zone.getByLabel(/^Inside RH/).fill("50");
  await zone.getByRole("button", { name: "Add zone" }).click();
  await expect(page.getByRole("heading", { name: /^Workshop/ })).toBeVisible();
  await page.getByRole("navigation", { name: "Project" }).getByRole("link", { name: "Schedule" }).click();
  await expect(page.getByRole("region", { name: "Set up the project" }).getByRole("listitem").nth(0)).toContainText("1 zone");
});

test("the design-case form's hint follows the kind chosen", async ({ page }) => {
  await openDemo(page, "Design cases");
  const form = page.locator("form").filter({ has: page.getByRole("heading", { name: "New design case" }) });
  const kind = form.getByLabel("Kind");
  await expect(kind).toHaveValue("heating");
  await expect(form.getByText(/heating set point/)).toBeVisible();
  await expect(form.getByText(/cooling set point/)).toHaveCount(0);
  if (SHOTS) {
    await form.scrollIntoViewIfNeeded();
    await page.screenshot({ path: `${SHOTS}/project-design-case-form.png` });
  }
  await kind.selectOption("cooling");
  await expect(form.getByText(/cooling set point/)).toBeVisible();
  await expect(form.getByText(/heating set point/)).toHaveCount(0);
  if (SHOTS) await page.screenshot({ path: `${SHOTS}/project-design-case-form-cooling.png` });
  await kind.selectOption("heating");
  await expect(form.getByText(/heating set point/)).toBeVisible();
  // A stored case's form speaks of its own kind.
  for (const dc of await db("design_cases").join("projects", "projects.id", "design_cases.project_id").where("projects.reference", "TS-2417").select("design_cases.name", "design_cases.kind")) {
    const card = page.locator("form").filter({ has: page.getByRole("heading", { name: dc.name, exact: true }) });
    await expect(card.getByText(new RegExp(`${dc.kind} set point`))).toBeVisible();
  }
});

test("the export menu closes on Escape, on a click outside it and once a download starts", async ({ page }) => {
  await openDemo(page);
  await expect(page.locator(".ag-row").first()).toBeVisible();
  const button = page.getByRole("button", { name: "Export ▾" });
  const menu = page.getByRole("group", { name: "Export" });
  await expect(menu).toBeHidden();

  await button.click();
  await expect(menu).toBeVisible();
  await expect(button).toHaveAttribute("aria-expanded", "true");
  await page.keyboard.press("Escape");
  await expect(menu).toBeHidden();
  await expect(button).toBeFocused();
  await expect(button).toHaveAttribute("aria-expanded", "false");

  await button.click();
  await expect(menu).toBeVisible();
  await page.getByRole("heading", { level: 1 }).click();
  await expect(menu).toBeHidden();

  // A click inside the menu (not on a link) keeps it open.
  await button.click();
  await menu.click({ position: { x: 4, y: 4 } });
  await expect(menu).toBeVisible();

  const download = page.waitForEvent("download");
  await menu.getByRole("link", { name: /as CSV/ }).click();
  expect((await download).suggestedFilename()).toMatch(/\.csv$/);
  await expect(menu).toBeHidden();

  // And it opens again afterwards.
  await button.click();
  await expect(menu).toBeVisible();
});
