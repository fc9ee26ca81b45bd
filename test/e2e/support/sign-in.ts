// Signing in as a demo account in the browser tests, through the sign-in form as a person would.
import { expect, type Browser, type Page } from "@playwright/test";

export const PASSWORD = process.env.DEMO_PASSWORD || "filmsheet-demo";

/** Signs `page` in as `email` with the demo password and waits for the projects page. */
export async function signIn(page: Page, email: string): Promise<Page> {
  await page.goto("/sign-in?callbackUrl=%2Fprojects");
  await page.getByLabel("E-mail", { exact: true }).fill(email);
  await page.getByLabel("Password").fill(PASSWORD);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await expect(page).toHaveURL(/\/projects$/, { timeout: 20_000 });
  return page;
}

/** A new browser context (its own cookies) signed in as `email`. */
export async function signedIn(browser: Browser, email: string): Promise<Page> {
  return signIn(await (await browser.newContext()).newPage(), email);
}
