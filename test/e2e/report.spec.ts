// The consultant asks for the demo project's draft calculation report on the project page, follows
// the report job's progress bar and downloads the PDF.
import { writeFileSync } from "node:fs";
import { join } from "node:path";
import { expect, test } from "@playwright/test";
import { signIn } from "./support/sign-in";

test.describe.configure({ timeout: 90_000 });

test("the consultant follows the draft report's progress and downloads the PDF", async ({ page }) => {
  await signIn(page, "consultant@demo.filmsheet.test");
  await page.getByRole("link", { name: "TS-2417" }).click();
  await page.getByRole("button", { name: "Draft report (PDF)" }).click();
  // The job's progress, shown until it is done (the page polls twice a second).
  await expect(page.getByRole("progressbar", { name: "Draft report progress" })).toBeVisible();
  const link = page.getByRole("link", { name: "Download draft report (PDF)" });
  await expect(link).toBeVisible({ timeout: 60_000 });
  await expect(page.getByText(/\d+ pages, marked “not for issue”/)).toBeVisible();
  await expect(page.getByRole("progressbar", { name: "Draft report progress" })).toHaveCount(0);
  const [download] = await Promise.all([page.waitForEvent("download", { timeout: 60_000 }), link.click()]);
  expect(download.suggestedFilename()).toBe("TS-2417-draft-report.pdf");
  const stream = await download.createReadStream();
  const chunks: Buffer[] = [];
  for await (const c of stream) chunks.push(c as Buffer);
  const pdf = Buffer.concat(chunks);
  expect(pdf.subarray(0, 5).toString("latin1")).toBe("%PDF-");
  expect(pdf.length).toBeGreaterThan(50_000);
  // For people to read it as pages (pdftoppm), as the screenshots of other specs.
  if (process.env.E2E_SHOTS_DIR) writeFileSync(join(process.env.E2E_SHOTS_DIR, "TS-2417-draft-report.pdf"), pdf);
});

test("the viewer is not offered the draft report", async ({ page }) => {
  await signIn(page, "viewer@demo.filmsheet.test");
  await page.getByRole("link", { name: "TS-2417" }).click();
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  await expect(page.getByRole("button", { name: "Draft report (PDF)" })).toHaveCount(0);
});
