// The schedule grid registers only the parts of AG Grid it uses (src/components/grid/ag-grid-runtime.ts, loaded by schedule-grid.tsx).
// A part left out does not fail loudly: the grid writes an error to the console and the feature
// does nothing. This spec sorts, filters, selects, opens an editor and reads a tooltip on the demo
// sheet, checks each worked, and that the grid wrote no error or warning. Nothing is saved.
import { expect, test, type Page } from "@playwright/test";
import { signIn } from "./support/sign-in";

test.describe.configure({ timeout: 120_000 });
test.use({ actionTimeout: 15_000, viewport: { width: 1440, height: 900 } });

// Each body row's label (pinned, so once per row) and its area cell.
const labels = (page: Page) => page.locator('.ag-row:not(.ag-row-pinned) [col-id="label"]');
const areaCells = (page: Page) => page.locator('.ag-row:not(.ag-row-pinned) [col-id="area_m2"]');
// The areas in display order (the grid places rows by row-index, not in document order).
const numbers = (page: Page) =>
  page.locator('.ag-row:not(.ag-row-pinned)[row-index]').evaluateAll((rows) =>
    rows
      .map((r) => ({ i: Number(r.getAttribute("row-index")), cell: r.querySelector('[col-id="area_m2"]') }))
      .filter((r) => r.cell)
      .sort((a, b) => a.i - b.i)
      .map((r) => Number((r.cell!.textContent ?? "").replace(/,/g, ""))),
  );

test("sorting, a number filter, row selection, an editor and a tooltip work, and the grid reports no missing part", async ({ page }) => {
  const messages: string[] = [];
  page.on("console", (m) => {
    if ((m.type() === "error" || m.type() === "warning") && /AG Grid|ag-grid|#\d{3}/i.test(m.text())) messages.push(m.text());
  });
  await signIn(page, "consultant@demo.filmsheet.test");
  await page.getByRole("link", { name: "TS-2417" }).click();
  const rows = labels(page);
  await expect(rows.first()).toBeVisible();
  const area = page.locator('.ag-header-cell[col-id="area_m2"]');
  await area.scrollIntoViewIfNeeded();

  // Sorting: a click on the heading sorts by area, ascending.
  await area.locator(".ag-header-cell-label").click();
  await expect(area).toHaveAttribute("aria-sort", "ascending");
  const areas = await numbers(page);
  expect(areas.length).toBeGreaterThan(3);
  expect([...areas].sort((a, b) => a - b)).toEqual(areas);

  // A number filter: only areas greater than the middle one of those drawn stay.
  await area.locator(".ag-header-cell-filter-button").click();
  const filter = page.locator(".ag-filter");
  await expect(filter).toBeVisible();
  const median = areas[Math.floor(areas.length / 2)]!;
  await filter.locator("select, .ag-picker-field").first().click();
  await page.getByRole("option", { name: "Greater than", exact: true }).click();
  await filter.locator("input").first().fill(String(median));
  await expect.poll(async () => (await numbers(page)).every((a) => a > median)).toBe(true);
  await page.keyboard.press("Escape");
  const filtered = await numbers(page);
  // (The rows drawn are those in view: the smallest areas, drawn before, are gone.)
  expect(filtered.length).toBeGreaterThan(0);
  expect(filtered).not.toContain(areas[0]);

  // Row selection: the row's checkbox selects it, and the toolbar offers Duplicate.
  await page.locator('.ag-row:not(.ag-row-pinned) [col-id="select"] input').first().check();
  await expect(page.getByRole("button", { name: "Duplicate" })).toBeEnabled();

  // An editor opens on a number cell, and Escape leaves it unchanged.
  const cell = areaCells(page).first();
  const shown = await cell.innerText();
  await cell.dblclick();
  await expect(cell.locator("input")).toBeVisible();
  await page.keyboard.press("Escape");
  await expect(cell).toHaveText(shown);

  // A heading's tooltip (the grid's own tooltip part).
  await page.locator('.ag-header-cell[col-id="label"] .ag-header-cell-text').hover();
  await expect(page.locator(".ag-tooltip")).toBeVisible();

  expect(messages, messages.join("\n")).toEqual([]);
});
