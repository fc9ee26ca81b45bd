// Signing in with the demo accounts in a real browser: the consultant sees the projects page
// with the controls to create one; the viewer sees the same projects and no edit controls.
import { expect, test, type Page } from "@playwright/test";

const PASSWORD = process.env.DEMO_PASSWORD || "filmsheet-demo";

async function signIn(page: Page, email: string) {
  await page.goto("/projects");
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Fprojects/);
  await page.getByLabel("E-mail", { exact: true }).fill(email);
  await page.getByLabel("Password").fill(PASSWORD);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await expect(page).toHaveURL(/\/projects$/);
}

test("the demo consultant signs in and sees the projects page", async ({ page }) => {
  await signIn(page, "consultant@demo.filmsheet.test");
  await expect(page.getByRole("heading", { level: 1, name: "Projects" })).toBeVisible();
  await expect(page.getByRole("cell", { name: "TS-2417" })).toBeVisible();
  await expect(page.getByRole("cell", { name: "Larchfield Community Library, extension" })).toBeVisible();
  await expect(page.getByRole("button", { name: "Create project" })).toBeVisible();
  await expect(page.getByLabel("Firm")).toHaveText("Tarnbrook & Sill Building Services");
  // Nothing of the other firm.
  await expect(page.getByText("OMD-0982")).toHaveCount(0);
  await expect(page.getByRole("note")).toContainText("verified by a competent, licensed engineer");
});

test("a wrong password is refused on the form, naming no detail", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail", { exact: true }).fill("consultant@demo.filmsheet.test");
  await page.getByLabel("Password").fill("not-the-password");
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await expect(page.getByRole("main").getByRole("alert")).toHaveText("That e-mail and password do not match an account");
  await expect(page.getByLabel("E-mail", { exact: true })).toHaveValue("consultant@demo.filmsheet.test");
});

test("the demo viewer signs in and finds no edit controls", async ({ page }) => {
  await signIn(page, "viewer@demo.filmsheet.test");
  await expect(page.getByRole("cell", { name: "TS-2417" })).toBeVisible();
  await expect(page.getByRole("button", { name: "Create project" })).toHaveCount(0);
  await expect(page.getByRole("textbox")).toHaveCount(0);

  await page.goto("/firm/members");
  await expect(page.getByRole("heading", { name: "For firm admins" })).toBeVisible();
  for (const name of ["Send invitation", "Save roles", "Remove", "Create token", "Resend", "Revoke"]) {
    await expect(page.getByRole("button", { name })).toHaveCount(0);
  }
  await expect(page.getByRole("checkbox")).toHaveCount(0);

  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/sign-in\?signedOut=1/);
  await page.goto("/projects");
  await expect(page).toHaveURL(/\/sign-in/);
});
