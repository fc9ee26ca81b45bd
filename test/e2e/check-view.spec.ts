// The check view in a real browser, as a checker works it: the filters by warnings and by
// "changed since accepted", the keys (J/K or arrows to move, A to accept, Q to query — and none of
// them while typing), the bulk accept that names its count and filter before it accepts and leaves
// "in bulk" in each row's history, and a row sent back by a change that says what changed.
// Screenshots at 1366×768 go to SHOTS_DIR when it is set.
import { expect as baseExpect, test, type Page } from "@playwright/test";
import knexFactory, { type Knex } from "knex";
import { signedIn } from "./support/sign-in";

test.describe.configure({ timeout: 180_000 });
test.use({ actionTimeout: 20_000 });
const expect = baseExpect.configure({ timeout: 20_000 });
const SHOTS = process.env.SHOTS_DIR;
let db: Knex;

test.beforeAll(() => {
  db = knexFactory({ client: "pg", connection: process.env.E2E_DATABASE_URL, pool: { min: 0, max: 1 } });
});
test.afterAll(async () => {
  await db.destroy();
});

const tab = (page: Page, name: string) => page.getByRole("navigation", { name: "Project" }).getByRole("link", { name, exact: true });
const filters = (page: Page) => page.getByRole("navigation", { name: "Filter rows" });
const listed = (page: Page) => page.getByRole("table", { name: "Rows to check" }).locator("tbody tr[aria-selected]");
const chosen = (page: Page) => page.getByRole("table", { name: "Rows to check" }).locator("tbody tr[aria-selected=true]");
const status = (page: Page, text: string | RegExp) => page.getByRole("status").filter({ hasText: text });
const countIn = async (page: Page, role: "link" | "button", name: RegExp) => Number((await filters(page).getByRole(role, { name }).textContent())!.match(/\((\d+)\)/)![1]);

test("a checker filters, moves and checks by keyboard, accepts the rows shown in bulk, and reads what changed in a row sent back", async ({ browser }) => {
  const checker = await signedIn(browser, "checker@demo.filmsheet.test");
  await checker.setViewportSize({ width: 1366, height: 768 });
  await checker.getByRole("link", { name: "TS-2417" }).click();
  await tab(checker, "Check").click();
  await expect(checker.getByRole("heading", { level: 2, name: "Check" })).toBeVisible();
  await expect(checker.getByLabel("Keyboard")).toContainText("A accept · Q query");

  // With warnings: only rows that have one, each saying how many.
  const warned = await countIn(checker, "button", /With warnings/);
  expect(warned).toBeGreaterThan(0);
  await filters(checker).getByRole("button", { name: /With warnings/ }).click();
  await expect(checker).toHaveURL(/warnings=yes/);
  await expect(filters(checker).getByRole("button", { name: /With warnings/ })).toHaveAttribute("aria-pressed", "true");
  await expect(listed(checker)).toHaveCount(warned);
  for (const cell of await listed(checker).locator("td:nth-child(5)").all()) await expect(cell).toHaveText(/^\d+ warnings?$/);
  await filters(checker).getByRole("button", { name: /With warnings/ }).click();
  await expect(checker).not.toHaveURL(/warnings=yes/);

  // Unchecked surfaces, worked from the keyboard.
  await filters(checker).getByRole("link", { name: /^Unchecked \(/ }).click();
  await expect(checker).toHaveURL(/state=unchecked/);
  await filters(checker).getByRole("link", { name: "Surfaces", exact: true }).click();
  await expect(checker).toHaveURL(/state=unchecked&sheet=surfaces/);
  const before = await listed(checker).count();
  const labelAt = (i: number) => listed(checker).nth(i).locator("td").first().getByRole("link").textContent();
  await expect(chosen(checker)).toHaveCount(1);
  await checker.keyboard.press("j");
  await checker.keyboard.press("j");
  await expect(chosen(checker)).toContainText((await labelAt(2))!);
  await checker.keyboard.press("k");
  await expect(chosen(checker)).toContainText((await labelAt(1))!);
  await checker.keyboard.press("ArrowDown");
  const third = (await labelAt(2))!;
  await expect(chosen(checker)).toContainText(third);
  const thirdHref = (await chosen(checker).locator("td").first().getByRole("link").getAttribute("href"))!;

  // A accepts the chosen row; it leaves the unchecked list and the next row takes its place.
  await checker.keyboard.press("a");
  await expect(status(checker, `${third}: accepted`)).toBeVisible();
  await expect(listed(checker)).toHaveCount(before - 1);
  const fourth = (await chosen(checker).locator("td").first().getByRole("link").textContent())!;
  expect(fourth).not.toBe(third);

  // Q opens a query on the chosen row; keys typed there are words, not shortcuts.
  await checker.keyboard.press("q");
  const query = checker.getByRole("form", { name: `Query ${fourth}` });
  await expect(query.getByRole("textbox")).toBeFocused();
  await checker.keyboard.type("a jamb kerb? q");
  await expect(query.getByRole("textbox")).toHaveValue("a jamb kerb? q");
  await expect(listed(checker)).toHaveCount(before - 1);
  await checker.keyboard.press("Escape");
  await expect(query).toHaveCount(0);
  await checker.keyboard.press("q");
  await query.getByRole("textbox").fill("The centroid height reads low for a first-floor bay: please confirm.");
  await query.getByRole("button", { name: "Send query" }).click();
  await expect(status(checker, `${fourth}: queried`)).toBeVisible();
  await expect(listed(checker)).toHaveCount(before - 2);

  // The consultant changes the accepted row: it goes back to unchecked, "changed since accepted".
  const consultant = await signedIn(browser, "consultant@demo.filmsheet.test");
  const [, projectId, rowId] = thirdHref.match(/\/projects\/([^/]+)\/surfaces\/([^/?]+)/)!;
  const row = await db("surfaces").where({ id: rowId }).first("version", "area_m2");
  const res = await consultant.evaluate(
    async ([url, body]) => {
      const r = await fetch(url, { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
      return { status: r.status, text: await r.text() };
    },
    [`/api/projects/${projectId}/surfaces/${rowId}`, { version: row.version, area_m2: row.area_m2 + 2 }] as const,
  );
  expect(res.status, res.text).toBe(200);

  await tab(checker, "Check").click();
  await filters(checker).getByRole("button", { name: /Changed since accepted \(1\)/ }).click();
  await expect(checker).toHaveURL(/changed=yes/);
  await expect(listed(checker)).toHaveCount(1);
  await expect(listed(checker).first()).toContainText(third);
  await expect(listed(checker).first()).toContainText("changed since accepted");
  if (SHOTS) await checker.screenshot({ path: `${SHOTS}/check-view-changed-filter-1366x768.png` });

  // Its working opens on what changed since it was accepted, in the sheet's words and units.
  await listed(checker).first().locator("td").first().getByRole("link").click();
  const since = checker.getByRole("region", { name: "Changed since accepted" });
  await expect(since).toBeVisible();
  await expect(since).toContainText("Accepted by");
  await expect(since).toContainText("This surface");
  const area = since.getByRole("row").filter({ hasText: "Area" });
  await expect(area).toContainText(`${row.area_m2.toFixed(2)} m²`);
  await expect(area).toContainText(`${(row.area_m2 + 2).toFixed(2)} m²`);
  await expect(since).not.toContainText("area_m2");
  if (SHOTS) await checker.screenshot({ path: `${SHOTS}/check-changed-row-1366x768.png` });

  // The working has keys too: Q goes to the comment (where A is a letter), A accepts.
  await expect(checker.getByLabel("Keyboard")).toContainText("A accept · Q write a query · N next unchecked");
  await checker.keyboard.press("q");
  const comment = checker.getByRole("form", { name: "Check this row" }).getByLabel("Comment");
  await expect(comment).toBeFocused();
  await checker.keyboard.type("a");
  await expect(comment).toHaveValue("a");
  await comment.fill("");
  await checker.getByRole("heading", { level: 2, name: `Surface ${third}` }).click();
  await checker.keyboard.press("a");
  await expect(status(checker, "Accepted")).toBeVisible();
  await expect(since).toHaveCount(0);

  // Bulk: the unchecked duct runs, confirmed with their number and the filter, then each says "in bulk".
  await tab(checker, "Check").click();
  await filters(checker).getByRole("link", { name: /^Unchecked \(/ }).click();
  await expect(checker).toHaveURL(/state=unchecked/);
  await filters(checker).getByRole("link", { name: "Duct runs", exact: true }).click();
  await expect(checker).toHaveURL(/state=unchecked&sheet=duct_runs/);
  const ducts = await listed(checker).count();
  expect(ducts).toBeGreaterThan(1);
  const firstDuct = (await listed(checker).first().locator("td").first().getByRole("link").textContent())!;
  await checker.getByRole("button", { name: `Accept the ${ducts} rows shown…` }).click();
  const confirm = checker.getByRole("alertdialog", { name: "Confirm accepting the rows shown" });
  await expect(confirm).toContainText(`Accept ${ducts} rows shown by filter “Unchecked · Duct runs”?`);
  if (SHOTS) await checker.screenshot({ path: `${SHOTS}/check-bulk-confirm-1366x768.png` });
  // Cancel first: nothing is accepted.
  await confirm.getByRole("button", { name: "Cancel" }).click();
  await expect(listed(checker)).toHaveCount(ducts);
  await checker.getByRole("button", { name: `Accept the ${ducts} rows shown…` }).click();
  await confirm.getByRole("button", { name: `Accept ${ducts} rows` }).click();
  await expect(status(checker, `${ducts} rows accepted`)).toBeVisible();
  await expect(checker.getByText("No row matches this filter.")).toBeVisible();

  await filters(checker).getByRole("link", { name: /^Accepted \(/ }).click();
  await expect(checker).toHaveURL(/state=accepted/);
  const accepted = listed(checker).filter({ hasText: firstDuct });
  await expect(accepted).toContainText("(in bulk)");
  await accepted.locator("td").first().getByRole("link").click();
  await expect(checker.getByRole("region", { name: "Check" })).toContainText("in bulk from the check list");
  const history = checker.getByRole("region", { name: "History of this row" });
  await expect(history).toContainText(`Accepted ${firstDuct} in bulk`);
  await expect(history).toContainText(`one of ${ducts} rows shown by the filter “Unchecked · Duct runs”`);
  if (SHOTS) await checker.screenshot({ path: `${SHOTS}/check-bulk-row-1366x768.png` });

  // A duct run's working names the friction factor used for each purpose, and shows both.
  const inside = checker.getByRole("region", { name: "Inside the duct" });
  await expect(inside.getByRole("row").filter({ hasText: "Friction factor for heat transfer (smooth duct)" })).toContainText("Smooth-duct friction factor (Petukhov)");
  await expect(inside.getByRole("row", { name: /^Nusselt number/ })).toContainText("Gnielinski");
  await expect(inside.getByRole("row").filter({ hasText: "Friction factor for the pressure drop" })).toContainText("Colebrook–White");
  await expect(inside).toContainText("Pressure drop per metre of straight duct");
  if (SHOTS) await inside.screenshot({ path: `${SHOTS}/check-duct-friction-1366x768.png` });
});
