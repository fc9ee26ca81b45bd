// Checking in a real browser, from draft to an issued revision: the demo checker reads a row's
// working (the correlation, Re, the source) and queries it; the consultant answers, edits the row
// in the grid and asks for a check; the checker accepts every row and issues revision A; the
// viewer finds revision A and nothing of the draft; and the e-mails reach the test SMTP sink.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { expect as baseExpect, test, type Page } from "@playwright/test";
import knexFactory, { type Knex } from "knex";
import { dropLeftoverEmailJobs } from "../support/checking";
import { signedIn } from "./support/sign-in";

const MAIL_DIR = process.env.E2E_MAIL_DIR ?? ".data/e2e-mail";
const ROW = "RR south wall 1";
test.describe.configure({ timeout: 240_000 });
test.use({ actionTimeout: 20_000 });
const expect = baseExpect.configure({ timeout: 20_000 });
let db: Knex;
let firmId: string;
let before: Record<string, unknown> | undefined;


const tab = (page: Page, name: string) => page.getByRole("navigation", { name: "Project" }).getByRole("link", { name, exact: true });
const checkForm = (page: Page) => page.getByRole("form", { name: "Check this row" });
const status = (page: Page, text: string | RegExp) => page.getByRole("status").filter({ hasText: text });

/** Every e-mail the sink has written so far. */
function mails(): { to: string[]; subject: string; kind: string | null; text: string }[] {
  let files: string[] = [];
  try {
    files = readdirSync(MAIL_DIR).filter((f) => f.endsWith(".json")).sort();
  } catch {
    return [];
  }
  return files.map((f) => JSON.parse(readFileSync(join(MAIL_DIR, f), "utf8")));
}
const mailed = (kind: string, to: string) => mails().filter((m) => m.kind === kind && m.to.includes(to));

test.beforeAll(async () => {
  // Issuing revisions needs the paid plan: the demo firm pays for this test, then is put back.
  db = knexFactory({ client: "pg", connection: process.env.E2E_DATABASE_URL, pool: { min: 0, max: 1 } });
  // This test's own e-mails must not wait behind those the integration tests left in the queue.
  await dropLeftoverEmailJobs(db);
  firmId = (await db("firms").where({ slug: "tarnbrook-sill" }).first("id")).id;
  before = await db("firm_billing").where({ firm_id: firmId }).first();
  await db("firm_billing").insert({ firm_id: firmId, subscription_status: "active", subscription_seats: 50 }).onConflict("firm_id").merge({ subscription_status: "active", subscription_seats: 50 });
});
test.afterAll(async () => {
  await db("firm_billing").where({ firm_id: firmId }).delete();
  if (before) await db("firm_billing").insert(before);
  await db.destroy();
});

test("a consultant and a checker take the demo project from draft to revision A, every step recorded", async ({ browser }) => {
  // The checker opens a row's working from the check view, in the windy winter case.
  const checker = await signedIn(browser, "checker@demo.filmsheet.test");
  await checker.getByRole("link", { name: "TS-2417" }).click();
  await tab(checker, "Check").click();
  await expect(checker.getByRole("heading", { level: 2, name: "Check" })).toBeVisible();
  await checker.getByRole("link", { name: ROW, exact: true }).click();
  await expect(checker.getByRole("heading", { level: 2, name: `Surface ${ROW}` })).toBeVisible();
  const rowUrl = checker.url().split("?")[0]!;
  await checker.getByRole("navigation", { name: "Design case" }).getByRole("link", { name: /Winter design day, windy/ }).click();
  await expect(checker.getByRole("article", { name: `Working of ${ROW} — Winter design day, windy` })).toBeVisible();

  // What a checker reads: Re, the correlation by name, its source.
  await expect(checker.getByRole("cell", { name: "Re_L", exact: true })).toBeVisible();
  await expect(checker.getByRole("cell", { name: "Reynolds number on L" })).toBeVisible();
  const methods = checker.getByRole("region", { name: "Methods applied" });
  await expect(methods).toContainText("Combined forced and natural convection");
  await expect(methods).toContainText("S. W. Churchill");

  // A query needs its comment.
  await checkForm(checker).getByRole("button", { name: "Query" }).click();
  await expect(checkForm(checker).getByRole("alert")).toContainText("Check the highlighted fields");
  await expect(checkForm(checker)).toContainText("A query needs a comment");
  await checkForm(checker).getByLabel("Comment").fill("The panel height of 4 m looks tall for a ground-floor bay: please confirm against the elevations.");
  await checkForm(checker).getByRole("button", { name: "Query" }).click();
  await expect(status(checker, "Queried")).toBeVisible();
  await expect(checker.locator("[data-state=queried]").first()).toBeVisible();

  // The consultant reads the query on the row, answers it, and changes the row in the grid.
  const consultant = await signedIn(browser, "consultant@demo.filmsheet.test");
  await consultant.goto(rowUrl);
  await expect(consultant.getByRole("list", { name: "Comments" })).toContainText("The panel height of 4 m looks tall");
  const answer = consultant.getByRole("form", { name: "Answer the query" });
  await answer.getByLabel("Your answer").fill("Right: the bay is 3.6 m to the soffit. Corrected in the schedule.");
  await answer.getByRole("button", { name: "Send answer" }).click();
  await expect(status(consultant, "Answer added; the checker has been told")).toBeVisible();

  await tab(consultant, "Schedule").click();
  await expect(consultant.locator(".ag-row").first()).toBeVisible();
  const label = consultant.locator('.ag-row [col-id="label"]', { hasText: new RegExp(`^${ROW}$`) }).first();
  const gridRow = (await label.locator("xpath=ancestor::div[contains(@class,'ag-row')][1]").getAttribute("row-id"))!;
  const height = consultant.locator(`.ag-row[row-id="${gridRow}"] [col-id="panel_height_m"]`);
  await height.dblclick();
  await consultant.keyboard.press("ControlOrMeta+a");
  await consultant.keyboard.type("3.6");
  await consultant.keyboard.press("Enter");
  await expect(height).toHaveText("3.6");
  // The cell shows what was typed at once; the save lands a moment later (longer on a busy machine).
  await expect.poll(async () => (await db("surfaces").where({ firm_id: firmId, label: ROW }).first("panel_height_m"))?.panel_height_m, { timeout: 20_000 }).toBe(3.6);
  // The grid opens the row's working too.
  await consultant.locator(`.ag-row[row-id="${gridRow}"] [col-id="working"] a`).click();
  // It opens on the design case shown in the grid (?case=…).
  await expect(consultant).toHaveURL(new RegExp(`^${rowUrl.replace(/[.?*+^$()[\]{}|\\]/g, "\\$&")}\\?case=`));
  await expect(consultant.locator("[data-state=unchecked]").first()).toBeVisible();
  const history = consultant.getByRole("region", { name: "History of this row" });
  await expect(history).toContainText(`Changed surface ${ROW}`);
  await expect(history).toContainText("Panel height: 4.0 m → 3.6 m");
  await expect(history).toContainText("Check reset to unchecked (was queried)");

  // The consultant asks for a check.
  await tab(consultant, "Check").click();
  const ask = consultant.getByRole("form", { name: "Ask for a check" });
  await ask.getByLabel("Message to the checkers").fill("Panel heights corrected; ready for a full check.");
  await ask.getByRole("button", { name: "Ask for a check" }).click();
  await expect(status(consultant, /Check requested: \d+ checkers? e-mailed/)).toBeVisible();

  // The checker sees the changed row back at unchecked, accepts it, then every remaining row.
  await checker.goto(rowUrl);
  await expect(checker.locator("[data-state=unchecked]").first()).toBeVisible();
  await checkForm(checker).getByRole("button", { name: "Accept" }).click();
  await expect(status(checker, "Accepted")).toBeVisible();
  await tab(checker, "Check").click();
  // Accepting every row shown asks first, naming the count and the filter.
  await checker.getByRole("button", { name: /^Accept the \d+ rows? shown…$/ }).click();
  const confirm = checker.getByRole("alertdialog", { name: "Confirm accepting the rows shown" });
  await expect(confirm).toContainText(/Accept \d+ rows? shown by filter “All rows”\?/);
  await confirm.getByRole("button", { name: /^Accept \d+ rows?$/ }).click();
  await expect(status(checker, /^\d+ rows? accepted$/)).toBeVisible();

  // Every row accepted: revision A.
  const issue = checker.getByRole("form", { name: "Issue revision A" });
  await issue.getByLabel("Note for the revision").fill("For tender");
  await issue.getByRole("button", { name: "Issue revision A" }).click();
  await expect(status(checker, "Revision A issued")).toBeVisible({ timeout: 60_000 });
  await tab(checker, "Revisions").click();
  await checker.getByRole("link", { name: "Revision A", exact: true }).click();
  await expect(checker.getByRole("heading", { level: 2, name: "Revision A" })).toBeVisible();
  await expect(checker.getByRole("note").filter({ hasText: "This revision is frozen" })).toBeVisible();
  await expect(checker.getByText("For tender")).toBeVisible();

  // The viewer reaches revision A and nothing of the draft.
  const viewer = await signedIn(browser, "viewer@demo.filmsheet.test");
  await viewer.getByRole("link", { name: "TS-2417" }).click();
  await expect(viewer).toHaveURL(/\/revisions$/);
  await expect(viewer.getByRole("link", { name: "Revision A", exact: true })).toBeVisible();
  await expect(tab(viewer, "Schedule")).toHaveCount(0);
  await expect(tab(viewer, "Check")).toHaveCount(0);
  // The revisions list offers the same stored PDF as the revision's own page.
  await expect(viewer.getByRole("link", { name: "Report of revision A (PDF)" })).toHaveAttribute("href", /\/revisions\/A\/report$/);
  await viewer.getByRole("link", { name: "Revision A", exact: true }).click();
  const [download] = await Promise.all([viewer.waitForEvent("download", { timeout: 60_000 }), viewer.getByRole("link", { name: "Report of revision A (PDF)" }).click()]);
  expect(download.suggestedFilename()).toBe("TS-2417-revision-A-report.pdf");
  await viewer.goto(rowUrl);
  await expect(viewer).toHaveURL(/\/revisions$/);

  // The e-mails, through the job queue to the test SMTP sink. (Earlier suites leave e-mail jobs of
  // their own in the queue, which may reach the sink too: each is found by what it says.)
  const about = (kind: string, to: string, words: string) => () => mailed(kind, to).filter((m) => `${m.subject}\n${m.text}`.includes(words)).length;
  await expect.poll(about("row_queried", "consultant@demo.filmsheet.test", "The panel height of 4 m looks tall"), { timeout: 30_000 }).toBe(1);
  await expect.poll(about("query_answered", "checker@demo.filmsheet.test", "the bay is 3.6 m to the soffit"), { timeout: 30_000 }).toBe(1);
  await expect.poll(about("check_requested", "checker@demo.filmsheet.test", "Panel heights corrected; ready for a full check."), { timeout: 30_000 }).toBe(1);
  for (const to of ["viewer@demo.filmsheet.test", "consultant@demo.filmsheet.test"]) {
    await expect.poll(about("revision_issued", to, "Revision A issued: TS-2417 Larchfield Community Library, extension"), { timeout: 30_000 }).toBe(1);
  }
  // The issuer is not e-mailed about their own issue.
  expect(about("revision_issued", "checker@demo.filmsheet.test", "TS-2417")()).toBe(0);
});
