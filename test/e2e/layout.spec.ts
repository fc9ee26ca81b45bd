// The schedule as a working surface on a laptop and on a large screen, as the demo consultant:
// the grid fills the window with only the label pinned, column sets switch and a set of one's
// own is saved, used and deleted, the zone totals fold to a strip — each remembered after a
// reload — and every heading keeps its unit's case in SI and IP. Screenshots go to
// $LAYOUT_SHOTS_DIR (or the test's output folder).
import { expect as baseExpect, test, type Page, type TestInfo } from "@playwright/test";
import { signIn } from "./support/sign-in";

test.describe.configure({ timeout: 180_000 });
test.use({ actionTimeout: 15_000, viewport: { width: 1366, height: 768 } });
// A busy two-core machine renders a 2560-px grid slowly after a reload.
const expect = baseExpect.configure({ timeout: 30_000 });

const header = (page: Page, col: string) => page.locator(`.ag-header-cell[col-id="${col}"]`);
const setPicker = (page: Page) => page.getByRole("combobox", { name: "Column set" });
const savedPrefs = (page: Page) => page.waitForResponse((r) => r.url().endsWith("/api/me/preferences") && r.request().method() === "PATCH" && r.ok());
// Unit symbols that are only right in their own case (M²: mega-square? BTU/H, FT²…).
const SHOUTED = /M²|M³|\bFT|BTU|\bMPH\b|\bCFM\b|W\/M|\(H·|\bMM\b/;

async function openDemoSchedule(page: Page) {
  await signIn(page, "consultant@demo.filmsheet.test");
  // Each test starts from a person who has chosen nothing (and leaves it so for the other specs).
  await resetPreferences(page);
  await page.getByRole("link", { name: "TS-2417" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Larchfield Community Library, extension" })).toBeVisible();
  await expect(page.locator(".ag-row").first()).toBeVisible();
}

async function resetPreferences(page: Page) {
  const status = await page.evaluate(async () => {
    const res = await fetch("/api/me/preferences", { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify({ unit_system: null, zone_totals_collapsed: false, active_column_sets: { surfaces: "everything", duct_runs: "everything" }, column_sets: [] }) });
    return res.status;
  });
  expect(status).toBe(200);
}

async function shot(page: Page, info: TestInfo, name: string) {
  await page.evaluate(() => window.scrollTo(0, 0));
  const dir = process.env.LAYOUT_SHOTS_DIR;
  await page.screenshot({ path: dir ? `${dir}/layout-${name}.png` : info.outputPath(`layout-${name}.png`) });
}

test.afterEach(async ({ page }) => {
  if (page.url().startsWith("http")) await resetPreferences(page).catch(() => {});
});

test("column sets switch the columns; a set of one's own is saved, kept after a reload, and deleted", async ({ page }) => {
  await openDemoSchedule(page);
  await expect(setPicker(page)).toHaveValue("everything");
  await expect(header(page, "tilt_deg")).toBeVisible();
  await expect(header(page, "r:h_o_W_m2K")).toHaveCount(1);

  await setPicker(page).selectOption({ label: "Inputs" });
  await expect(header(page, "r:h_o_W_m2K")).toHaveCount(0);
  await expect(header(page, "tilt_deg")).toHaveCount(1);
  await expect(header(page, "r:Q_W")).toHaveCount(1);
  await setPicker(page).selectOption({ label: "Results" });
  await expect(header(page, "tilt_deg")).toHaveCount(0);
  await expect(header(page, "r:h_o_W_m2K")).toHaveCount(1);
  await expect(header(page, "buildup_id")).toHaveCount(1);

  // A set of one's own, made from the Inputs set: drop the tilt, add h_o and U.
  await setPicker(page).selectOption({ label: "Inputs" });
  await page.getByRole("button", { name: "New set…" }).click();
  const dialog = page.getByRole("dialog", { name: "Column set" });
  await dialog.getByRole("checkbox", { name: "Tilt", exact: true }).uncheck();
  await dialog.getByRole("checkbox", { name: "h_o", exact: true }).check();
  await dialog.getByRole("checkbox", { name: "U", exact: true }).check();
  await dialog.getByLabel("Set name").fill("Heat check");
  const saved = savedPrefs(page);
  await dialog.getByRole("button", { name: "Save as new set" }).click();
  await saved;
  await expect(dialog).toHaveCount(0);
  await expect(setPicker(page).locator("option:checked")).toHaveText("Heat check");
  await expect(header(page, "tilt_deg")).toHaveCount(0);
  await expect(header(page, "r:h_o_W_m2K")).toHaveCount(1);
  await expect(header(page, "r:U_W_m2K")).toHaveCount(1);

  // The duct runs keep their own choice (everything).
  await page.getByRole("tab", { name: /Duct runs/ }).click();
  await expect(setPicker(page)).toHaveValue("everything");
  await expect(header(page, "r:h_i_W_m2K")).toHaveCount(1);

  await page.reload();
  await expect(page.locator(".ag-row").first()).toBeVisible();
  await expect(setPicker(page).locator("option:checked")).toHaveText("Heat check");
  await expect(header(page, "tilt_deg")).toHaveCount(0);
  await expect(header(page, "r:U_W_m2K")).toHaveCount(1);

  // A name already taken is refused in the form; nothing is saved.
  await page.getByRole("button", { name: "Edit set…" }).click();
  await dialog.getByLabel("Set name").fill("results");
  await dialog.getByRole("button", { name: "Save as new set" }).click();
  await expect(dialog.getByRole("alert")).toContainText("built-in");

  const deleted = savedPrefs(page);
  await dialog.getByRole("button", { name: "Delete set" }).click();
  await deleted;
  await expect(setPicker(page)).toHaveValue("everything");
  await expect(header(page, "tilt_deg")).toHaveCount(1);
  await page.reload();
  await expect(page.locator(".ag-row").first()).toBeVisible();
  await expect(setPicker(page).locator("option", { hasText: "Heat check" })).toHaveCount(0);
});

test("the zone totals fold to a strip, which gives the grid the room and is remembered after a reload", async ({ page }) => {
  await page.setViewportSize({ width: 2560, height: 1440 });
  await openDemoSchedule(page);
  const totals = page.getByRole("table", { name: "Zone totals for the design case" });
  await expect(totals).toBeVisible();
  const wide = (await page.locator(".fs-grid").boundingBox())!.width;

  const saved = savedPrefs(page);
  await page.getByRole("button", { name: "Fold zone totals" }).click();
  await saved;
  await expect(totals).toHaveCount(0);
  const strip = page.getByRole("button", { name: "Zone totals", exact: true });
  await expect(strip).toHaveAttribute("aria-expanded", "false");
  // The strip is narrow: the grid gains nearly all of the panel's 20rem.
  await expect.poll(async () => (await page.locator(".fs-grid").boundingBox())!.width).toBeGreaterThan(wide + 250);

  await page.reload();
  await expect(page.locator(".ag-row").first()).toBeVisible();
  await expect(page.getByRole("button", { name: "Zone totals", exact: true })).toHaveAttribute("aria-expanded", "false");
  await expect(totals).toHaveCount(0);

  await page.getByRole("button", { name: "Zone totals", exact: true }).click();
  await expect(totals).toBeVisible();
});

for (const size of [
  { width: 1366, height: 768 },
  { width: 1440, height: 900 },
  { width: 2560, height: 1440 },
]) {
  test(`at ${size.width}×${size.height} the grid fills the window, only the label is pinned, and headings keep their units' case`, async ({ page }, info) => {
    await page.setViewportSize(size);
    await openDemoSchedule(page);
    const grid = page.locator(".fs-grid");
    const box = (await grid.boundingBox())!;
    // Down to the bottom of the window, less the main area's padding, the range line under the
    // grid (selection, copy with headings) and the help line.
    expect(box.y + box.height).toBeGreaterThan(size.height - 100);
    expect(box.y + box.height).toBeLessThanOrEqual(size.height);
    // A laptop: the rail folds to icons and the totals go below; a large screen keeps both beside.
    expect(box.width).toBeGreaterThan(size.width - (size.width >= 1536 ? 640 : 120));
    const pinnedLeft = await page.locator(".ag-header [class*=pinned-left] .ag-header-cell").evaluateAll((els) => els.map((e) => e.getAttribute("col-id")));
    expect(pinnedLeft.filter((id) => id !== "select")).toEqual(["label"]);
    expect(await page.locator(".ag-header [class*=pinned-right] .ag-header-cell").count()).toBe(0);

    for (const system of ["SI", "IP"] as const) {
      if (system === "IP") {
        const saved = savedPrefs(page);
        await page.getByRole("radio", { name: "IP" }).click();
        await saved;
        await expect(header(page, "r:Q_W")).toContainText("Btu/h");
      }
      for (const sheet of ["Surfaces", "Duct runs"]) {
        await page.getByRole("tab", { name: new RegExp(sheet) }).click();
        await expect(page.locator(".ag-row").first()).toBeVisible();
        const headings = await page.locator(".ag-header-cell-text").evaluateAll((els) => els.map((e) => ({ text: e.textContent ?? "", shown: (e as HTMLElement).innerText, transform: getComputedStyle(e).textTransform })));
        expect(headings.length).toBeGreaterThan(10);
        for (const h of headings) {
          expect(h.transform, h.text).toBe("none");
          expect(h.shown, h.text).toBe(h.text);
          expect(h.shown).not.toMatch(SHOUTED);
        }
        if (sheet === "Surfaces") {
          const totalsHeads = page.getByRole("table", { name: "Zone totals for the design case" }).locator("th");
          for (const t of await totalsHeads.evaluateAll((els) => els.map((e) => (e as HTMLElement).innerText))) expect(t).not.toMatch(SHOUTED);
        }
      }
      await page.getByRole("tab", { name: /Surfaces/ }).click();
    }
    await page.getByRole("radio", { name: "SI" }).click();

    // Inputs and results side by side: a set of the person's own, the totals folded on a laptop.
    if (size.width < 1536) {
      const saved = savedPrefs(page);
      await page.getByRole("button", { name: "Fold zone totals" }).click();
      await saved;
    }
    await page.getByRole("button", { name: "New set…" }).click();
    const dialog = page.getByRole("dialog", { name: "Column set" });
    for (const name of ["Outside of surface", "Centroid height", "Length along the wind", "Panel height", "Method", "Absorptance", "Emissivity", "Local wind", "Exposure", "Regime", "h_o across methods", "Q across methods", "f_Rsi", "f_Rsi,min (mould)", "Inside surface T_si", "h_c", "h_r", "Method-sensitive (> 10 %)", "Inside surface", "Notes", "Working"]) {
      const box = dialog.getByRole("checkbox", { name, exact: true });
      if ((await box.count()) === 1) await box.uncheck();
    }
    await dialog.getByLabel("Set name").fill("Walls at a glance");
    const saved = savedPrefs(page);
    await dialog.getByRole("button", { name: "Save as new set" }).click();
    await saved;
    await expect(header(page, "r:U_W_m2K")).toBeInViewport();
    await expect(header(page, "area_m2")).toBeInViewport();
    await shot(page, info, `${size.width}x${size.height}`);
    await setPicker(page).selectOption({ label: "Everything" });
    await shot(page, info, `${size.width}x${size.height}-everything`);
  });
}
