// A row's working as a checker reads it, from the schedule: it opens on the design case chosen in
// the grid, Back returns to that sheet and case, numbers are in engineering notation (never
// "1.8537e+10") and methods, regimes and warnings are words (their ids only in tooltips).
import { expect as baseExpect, test } from "@playwright/test";
import { signIn } from "./support/sign-in";

test.describe.configure({ timeout: 90_000 });
test.use({ actionTimeout: 15_000 });
const expect = baseExpect.configure({ timeout: 15_000 });

const SUMMER = /Summer design day, sunny/;

test("the working opens on the grid's case, speaks in words and notation, and Back returns to the sheet and case", async ({ page }) => {
  await signIn(page, "consultant@demo.filmsheet.test");
  await page.getByRole("link", { name: "TS-2417" }).click();
  await expect(page.locator(".ag-row").first()).toBeVisible();
  const select = page.getByRole("combobox", { name: "Design case" });
  const summer = await select.locator("option", { hasText: SUMMER }).getAttribute("value");
  await select.selectOption(summer!);

  await page.getByRole("link", { name: "Working of RR south wall 1" }).click();
  await expect(page).toHaveURL(new RegExp(`case=${summer}`));
  await expect(page.getByRole("navigation", { name: "Design case" }).getByRole("link", { name: SUMMER })).toHaveAttribute("aria-current", "page");
  const article = page.getByRole("article", { name: /Working of RR south wall 1 — Summer design day, sunny/ });
  await expect(article).toBeVisible();

  // Grashof and Rayleigh numbers of a façade run to 10⁹–10¹¹: superscript powers of ten, no "e+".
  const convection = page.getByRole("region", { name: "Convection" });
  await expect(convection).toContainText(/\d\.\d{3}×10[⁰¹²³⁴⁵⁶⁷⁸⁹]+/);
  const text = await article.innerText();
  expect(text).not.toMatch(/\de[+-]\d/);
  for (const id of ["churchill-combined-plate", "boundary_layer", "out_of_range", "radiation-linearised"]) expect(text).not.toContain(id);
  await expect(convection).toContainText("Combined forced and natural convection, plates");
  await expect(convection.getByRole("link", { name: "Long-wave radiation, linearised coefficient" }).first()).toHaveAttribute("title", "Method radiation-linearised");
  await expect(page.getByRole("region", { name: "Inputs" })).toContainText("boundary layer over the surface");

  // Values share one column: every value cell of every section starts at the same x.
  const xs = await article.locator("td[data-value]").evaluateAll((tds) => [...new Set(tds.map((td) => Math.round(td.getBoundingClientRect().right)))]);
  expect(xs).toHaveLength(1);

  await page.getByRole("link", { name: /Back to the schedule/ }).click();
  await expect(page).toHaveURL(new RegExp(`sheet=surfaces&case=${summer}`));
  await expect(page.getByRole("combobox", { name: "Design case" })).toHaveValue(summer!);
  await expect(page.locator('.ag-header-cell[col-id="r:Q_W"]')).toContainText("Heat loss (W)");
});

test("Back from a duct run's working returns to the duct-run sheet", async ({ page }) => {
  await signIn(page, "consultant@demo.filmsheet.test");
  await page.getByRole("link", { name: "TS-2417" }).click();
  await expect(page.locator(".ag-row").first()).toBeVisible();
  await page.getByRole("tab", { name: /Duct runs/ }).click();
  await expect(page.locator('.ag-header-cell[col-id="r:Q_W"]')).toContainText("Heat to the air (W)");
  await page.locator("a.fs-working-link").first().click();
  await expect(page.getByRole("heading", { level: 2, name: /^Duct run / })).toBeVisible();
  await page.getByRole("link", { name: /Back to the schedule \(duct runs/ }).click();
  await expect(page.getByRole("tab", { name: /Duct runs/ })).toHaveAttribute("aria-selected", "true");
});
