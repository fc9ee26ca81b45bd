// The public method page in a real browser: every registered method with its source and validity.
import { expect, test } from "@playwright/test";
import { METHODS } from "../../src/calc/registry";

test("the Methods page lists every registered correlation with its source and the conventions", async ({ page }) => {
  await page.goto("/methods");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Methods");
  await expect(page.getByRole("main").getByRole("note").first()).toContainText("licensed engineer");
  for (const m of METHODS) {
    const card = page.locator(`article[id="${m.id}"]`);
    await expect(card, m.id).toContainText(m.title);
    await expect(card, m.id).toContainText(m.source);
  }
  await page.getByRole("link", { name: "Conventions" }).click();
  await expect(page.getByRole("heading", { name: "Conventions" })).toBeInViewport();
  await expect(page.locator("#conventions")).toContainText("positive for heat lost from inside");
});

test("the worked example shows a row's working with its charts, correlation, Re and sources", async ({ page }) => {
  await page.goto("/methods/example");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("One wall panel, one design case");
  await expect(page.getByRole("figure", { name: "Local film coefficient along the surface" }).locator("svg").first()).toBeVisible();
  await expect(page.getByRole("figure", { name: "Film coefficient against wind speed" }).locator("svg").first()).toBeVisible();
  const convection = page.getByRole("region", { name: "Convection" });
  await expect(convection).toContainText("Re_L");
  await expect(convection).toContainText("Combined forced and natural convection, plates");
  await expect(convection).not.toContainText("churchill-combined-plate");
  await expect(convection.getByRole("link", { name: "Combined forced and natural convection, plates (Churchill, n = 3)" }).first()).toHaveAttribute("title", "Method churchill-combined-plate");
  await expect(page.getByRole("region", { name: "Methods applied" })).toContainText("Churchill, H. H. S. Chu");
});
