import { expect, test } from "@playwright/test";

test("an athlete sees their own progress and load on the phone", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill("athlete@rungwise.test");
  await page.getByLabel("Password").fill("rungwise-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/today$/);
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Progress" }).click();
  await expect(page.getByRole("heading", { name: "Your progress" })).toBeVisible();
  await expect(page.getByRole("heading", { name: "Freestanding handstand" })).toBeVisible();
  await expect(page.getByText(/Path so far/).first()).toBeVisible();
  await expect(page.getByRole("heading", { name: "Training load" })).toBeVisible();
  await expect(page.getByText(/does not replace a qualified coach/).first()).toBeVisible();
});
