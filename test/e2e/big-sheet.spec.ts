// A sheet beyond ALL_COLUMNS_ROWS (400) rows draws only the columns in view (src/components/grid/
// schedule-grid.tsx): the far columns are not in the page at first, and moving there by keyboard
// draws them with their results and the Working link. The project (450 surfaces, 5 duct runs) is
// made through the API as the demo consultant on the paid plan, and deleted afterwards.
import { expect, test, type Page } from "@playwright/test";
import { bigProject } from "../../bench/lib/big-schedule";
import { usePaidDemoFirm } from "./support/paid-demo-firm";
import { signIn } from "./support/sign-in";

test.describe.configure({ timeout: 180_000 });
test.use({ actionTimeout: 20_000, viewport: { width: 1366, height: 768 } });

const db = usePaidDemoFirm();

/** The API as the signed-in person (their session cookie, the app's own origin). */
function apiOf(page: Page) {
  const origin = new URL(page.url()).origin;
  return async (method: string, path: string, body?: unknown, type = "application/json") => {
    const res = await page.request.fetch(path, { method, headers: { "content-type": type, origin }, data: body === undefined ? undefined : typeof body === "string" ? body : JSON.stringify(body) });
    const json = await res.json();
    if (!res.ok()) throw new Error(`${method} ${path}: ${res.status()} ${JSON.stringify(json).slice(0, 300)}`);
    return json;
  };
}

/**
 * Signs in as the demo consultant, makes a project of `surfaces` and `ducts` rows through the API,
 * shows every column of the surfaces sheet, runs `body` and deletes the project.
 */
async function withProject(page: Page, prefix: string, surfaces: number, ducts: number, body: (projectId: string) => Promise<void>) {
  await signIn(page, "consultant@demo.filmsheet.test");
  const call = apiOf(page);
  const projectId = await bigProject(call, `${prefix}-${Date.now().toString(36).toUpperCase()}`, surfaces, ducts);
  try {
    await call("PATCH", "/api/me/preferences", { active_column_sets: { surfaces: "everything" } });
    await body(projectId);
  } finally {
    await db()("projects").where({ id: projectId }).del();
  }
}

test("a 450-row sheet draws the columns in view; End moves to the last column and draws Q and the Working link", async ({ page }) => {
  await withProject(page, "WIDE", 450, 5, async (projectId) => {
    await drawsColumnsInView(page, projectId);
  });
});

// The first screen of rows comes with the page (src/components/grid/sheet-preview.tsx): with the
// page's scripts off, the server's HTML alone shows the first rows in the grid's columns; with
// them on, the preview gives way to the grid once it has painted its rows.
// 700 rows: beyond the rows a page computes in place (INLINE_ROWS, use-schedule-results.ts), so the
// results come from the worker and the server must not draw any either.
test("the first screen of rows is drawn by the server, and gives way to the grid", async ({ page, browser }) => {
  await withProject(page, "FIRST", 700, 5, async (projectId) => {
    const still = await browser.newContext({ javaScriptEnabled: false, storageState: await page.context().storageState(), viewport: { width: 1366, height: 768 } });
    try {
      const html = await still.newPage();
      await html.goto(`/projects/${projectId}`);
      const rows = html.locator(".fs-sheet-preview [data-preview-row]");
      await expect(rows).toHaveCount(40);
      await expect(rows.first().locator("td").nth(1)).toHaveAttribute("data-v", "Panel 1");
      // The grid's columns and headings, in the person's set: the area beside its heading.
      const headings = await html.locator(".fs-sheet-preview th[data-v]").evaluateAll((ths) => ths.map((th) => th.getAttribute("data-v")));
      expect(headings[0]).toBe("Label");
      expect(headings).toContain("Area (m²)");
      expect(headings.at(-1)).toBe("Working");
      // A picture of the grid: not page text, not for assistive technology.
      await expect(html.locator(".fs-sheet-preview")).toHaveAttribute("aria-hidden", "true");
      expect(await html.locator(".fs-sheet-preview").textContent()).toBe("");
      if (process.env.E2E_SHOTS) await html.screenshot({ path: `${process.env.E2E_SHOTS}/preview-1366.png` });
    } finally {
      await still.close();
    }
    // The page's scripts take over the server's preview as it is: a mismatch would be redrawn and
    // reported (in the production build as "Minified React error #418", thrown to the page).
    const errors: string[] = [];
    page.on("console", (m) => {
      if (m.type() === "error") errors.push(m.text());
    });
    page.on("pageerror", (e) => errors.push(String(e)));
    await page.goto(`/projects/${projectId}`);
    await expect(page.locator('.ag-row:not(.ag-row-pinned)[row-index="0"] [col-id="label"]')).toHaveText("Panel 1", { timeout: 60_000 });
    await expect(page.locator(".fs-sheet-preview")).toHaveCount(0);
    expect(errors.filter((e) => /hydrat|did not match|React error #4(18|19|23|25)/i.test(e))).toEqual([]);
    if (process.env.E2E_SHOTS) await page.screenshot({ path: `${process.env.E2E_SHOTS}/grid-1366.png` });
  });
});

// A big sheet is made with no rows, given its first screen, and then the rest a thousand rows a
// task (schedule-grid.tsx): every row arrives, in the sheet's order, and the last is reachable.
test("a 2,150-row sheet is given every row, in order", async ({ page }) => {
  await withProject(page, "STEPS", 2150, 2, async (projectId) => {
    await page.goto(`/projects/${projectId}`);
    const first = page.locator('.ag-row:not(.ag-row-pinned)[row-index="0"] [col-id="label"]');
    await expect(first).toHaveText("Panel 1", { timeout: 60_000 });
    await expect(page.getByText("Total of 2,150 rows")).toBeVisible();
    await first.click();
    await page.keyboard.press("ControlOrMeta+ArrowDown");
    const last = page.locator('.ag-row:not(.ag-row-pinned)[row-index="2149"] [col-id="label"]');
    await expect(last).toHaveText("Panel 2150", { timeout: 30_000 });
    await expect(page.locator('.ag-row:not(.ag-row-pinned)[row-index="2150"]')).toHaveCount(0);
    await expect(page.locator('.ag-row:not(.ag-row-pinned)[row-index="2148"] [col-id="label"]')).toHaveText("Panel 2149");
  });
});

// An edit reaches the grid as its row's new data (setData) when nothing must be re-sorted or
// re-filtered, and as a transaction when the sheet is sorted (schedule-grid.tsx): in a sheet
// sorted by area, a row given the smallest area moves to the top; unsorted, it keeps its place.
test("an edit keeps its row's place in an unsorted sheet and moves it in a sorted one", async ({ page }) => {
  await withProject(page, "SORT", 30, 2, async (projectId) => {
    await page.goto(`/projects/${projectId}`);
    const atIndex = (i: number, col: string) => page.locator(`.ag-row:not(.ag-row-pinned)[row-index="${i}"] [col-id="${col}"]`);
    await expect(atIndex(0, "label")).toHaveText("Panel 1", { timeout: 60_000 });
    const setArea = async (i: number, value: string) => {
      await atIndex(i, "area_m2").dblclick();
      await page.keyboard.press("ControlOrMeta+a");
      await page.keyboard.type(value);
      await page.keyboard.press("Enter");
    };
    // Unsorted: Panel 3 takes the new area where it stands.
    await setArea(2, "0.51");
    await expect(atIndex(2, "area_m2")).toHaveText("0.51");
    await expect(atIndex(2, "label")).toHaveText("Panel 3");
    // Sorted by area, ascending: Panel 3 is first; the second row, given a still smaller area, takes its place.
    const heading = page.locator('.ag-header-cell[col-id="area_m2"]');
    await heading.locator(".ag-header-cell-label").click();
    await expect(heading).toHaveAttribute("aria-sort", "ascending");
    await expect(atIndex(0, "label")).toHaveText("Panel 3");
    const second = (await atIndex(1, "label").innerText()).trim();
    expect(second).not.toBe("Panel 3");
    await setArea(1, "0.25");
    await expect(atIndex(0, "label")).toHaveText(second);
    await expect(atIndex(0, "area_m2")).toHaveText("0.25");
    await expect(atIndex(1, "label")).toHaveText("Panel 3");
  });
});

async function drawsColumnsInView(page: Page, projectId: string) {

  await page.goto(`/projects/${projectId}`);
  const firstLabel = page.locator('.ag-row:not(.ag-row-pinned)[row-index="0"] [col-id="label"]');
  await expect(firstLabel).toHaveText("Panel 1", { timeout: 60_000 });
  // Every column is in the set, but the heat flow, far to the right, is not drawn yet.
  await expect(page.locator('.ag-header-cell[col-id="area_m2"]')).toHaveCount(1);
  await expect(page.locator('.ag-header-cell[col-id="r:Q_W"]')).toHaveCount(0);
  await expect(page.locator('.ag-row:not(.ag-row-pinned)[row-index="0"] [col-id="working"]')).toHaveCount(0);

  // End on the first row's area: the grid scrolls to the last column and draws what it passes.
  await page.locator('.ag-row:not(.ag-row-pinned)[row-index="0"] [col-id="area_m2"]').click();
  await page.keyboard.press("End");
  const q = page.locator('.ag-row:not(.ag-row-pinned)[row-index="0"] [col-id="r:Q_W"]');
  await expect(page.locator('.ag-header-cell[col-id="r:Q_W"]')).toHaveCount(1);
  await expect(q).toHaveText(/^-?[\d,]+$/, { timeout: 60_000 });
  const link = page.locator('.ag-row:not(.ag-row-pinned)[row-index="0"] [col-id="working"] a.fs-working-link');
  await expect(link).toHaveText("Working ›");
  await expect(link).toHaveAttribute("aria-label", "Working of Panel 1");
  await expect(link).toHaveAttribute("href", new RegExp(`^/projects/${projectId}/`));
  // The area, now far to the left, is no longer drawn.
  await expect(page.locator('.ag-header-cell[col-id="area_m2"]')).toHaveCount(0);
}
