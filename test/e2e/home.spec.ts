// The home page in a real browser: heading, navigation, caution, and both themes.
import { expect, test } from "@playwright/test";

test("the home page shows its heading, the navigation and the engineering caution", async ({ page }) => {
  await page.goto("/");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Filmsheet");
  const nav = page.getByRole("navigation", { name: "Main" });
  for (const label of ["Projects", "Methods", "Firm"]) {
    await expect(nav.getByRole("link", { name: new RegExp(`^${label}`) })).toBeVisible();
  }
  await expect(page.getByRole("note")).toContainText("verified by a competent, licensed engineer");
});

test("the theme follows the system and the switch overrides it", async ({ page }) => {
  const canvas = () => page.evaluate(() => getComputedStyle(document.documentElement).backgroundColor);
  await page.emulateMedia({ colorScheme: "dark" });
  await page.goto("/");
  const dark = await canvas();
  await page.getByRole("button", { name: "Light" }).click();
  await expect(page.locator("html")).toHaveAttribute("data-theme", "light");
  const light = await canvas();
  expect(light).not.toBe(dark);
  // The choice survives a reload (stored, applied before first paint).
  await page.reload();
  await expect(page.locator("html")).toHaveAttribute("data-theme", "light");
  expect(await canvas()).toBe(light);
});
