// Links are prefetched when a person reaches for them, not when they scroll into view
// (src/components/shell/link.tsx): opening the demo schedule asks the server for no other page,
// pointing at a link in the main navigation prefetches that page, and the click then shows it.
import { expect, test, type Request } from "@playwright/test";
import { signIn } from "./support/sign-in";

test.describe.configure({ timeout: 120_000 });
test.use({ actionTimeout: 15_000, viewport: { width: 1440, height: 900 } });

const isPrefetch = (r: Request) => r.headers()["next-router-prefetch"] !== undefined;

test("the schedule page prefetches no page on its own; pointing at a link prefetches it, and the click opens it", async ({ page }) => {
  await signIn(page, "consultant@demo.filmsheet.test");
  // (Pointing at the project's link to click it prefetches the schedule itself: counted from after.)
  await page.getByRole("link", { name: "TS-2417" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Larchfield Community Library, extension" })).toBeVisible();
  const prefetched: string[] = [];
  page.on("request", (r) => {
    if (isPrefetch(r)) prefetched.push(new URL(r.url()).pathname);
  });
  await expect(page.locator(".ag-row").first()).toBeVisible();
  // The navigation, the project's tabs and the working links are all on screen by now; a viewport
  // prefetch would have asked for their pages within moments of them being drawn.
  await page.waitForTimeout(2_500);
  expect(prefetched).toEqual([]);

  const methods = page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: /Methods/ });
  const asked = page.waitForRequest((r) => isPrefetch(r) && new URL(r.url()).pathname === "/methods");
  await methods.hover();
  await asked;
  await methods.click();
  await expect(page).toHaveURL(/\/methods$/);
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
});
