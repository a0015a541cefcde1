import { expect, test } from "@playwright/test";
import { uniqueEmail, waitForLink } from "./support/mail";

test("a coach gets the week's digest, unsubscribes from its link, and sees the choice in settings", async ({ page }) => {
  const coachEmail = uniqueEmail("digest-coach");
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Noor Haskell");
  await page.getByLabel("Club or business name").fill("Lantern Street Rings");
  await page.getByLabel("E-mail").fill(coachEmail);
  await page.getByLabel("Password").fill("lantern-strong-pass");
  await page.getByLabel("Time zone").fill("Europe/Lisbon");
  await page.getByRole("button", { name: "Create my team" }).click();
  await expect(page).toHaveURL(/\/coach/);

  // Settings: choose Friday 17:00 for the weekly mail.
  await page.goto("/settings");
  await expect(page.getByRole("heading", { name: "E-mail" })).toBeVisible();
  await page.getByLabel("Weekly mail on").selectOption({ label: "Friday" });
  await page.getByLabel("At", { exact: true }).selectOption({ label: "17:00" });
  await page.getByRole("button", { name: "Save e-mail choices" }).click();
  await expect(page.getByText("Saved.")).toBeVisible();
  await page.reload();
  await expect(page.getByLabel("Weekly mail on")).toHaveValue("5");
  await expect(page.getByLabel("At", { exact: true })).toHaveValue("17");

  // Queue the week's digest now (the worker sends it), then follow its unsubscribe link.
  const run = await page.request.post("/api/v1/digests/run?week=2026-W48");
  expect(run.status()).toBe(202);
  const link = await waitForLink(coachEmail, "/unsubscribe/", 30_000);
  await page.goto(link);
  await expect(page.getByRole("heading", { name: "Stop the weekly digest?" })).toBeVisible();
  await page.getByRole("button", { name: "Unsubscribe" }).click();
  await expect(page.getByRole("heading", { name: "You're unsubscribed" })).toBeVisible();

  await page.goto("/settings");
  await expect(page.getByLabel(/Weekly digest/)).not.toBeChecked();
  await expect(page.getByLabel(/Approval requests/)).toBeChecked();
});
