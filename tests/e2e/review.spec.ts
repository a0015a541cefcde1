import fs from "node:fs/promises";
import { expect, test, type Page } from "@playwright/test";

async function signInAsDemoCoach(page: Page) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill("coach@rungwise.test");
  await page.getByLabel("Password").fill("rungwise-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/coach\/readiness$/);
}

test("the demo coach reviews a chosen week, filters to ready, approves from the table and downloads the CSV", async ({ page }) => {
  await signInAsDemoCoach(page);
  await expect(page.getByRole("heading", { name: "This week" })).toBeVisible();
  const table = page.getByRole("grid", { name: "Readiness this week" });
  await expect(table.getByRole("link", { name: "Priya Dalgaard" })).toBeVisible();

  // Choose a week: one back (nothing seeded there is pending), then the current one again.
  const week = page.getByLabel("ISO week");
  const current = await week.inputValue();
  expect(current).toMatch(/^\d{4}-W\d{2}$/);
  await page.getByRole("button", { name: "Previous week" }).click();
  await expect(week).not.toHaveValue(current);
  await week.fill(current);
  await expect(page.getByText(`Week ${current} (`)).toBeVisible();

  // Wait for the filtered page itself: the table keeps showing the previous rows while it loads.
  await Promise.all([
    page.waitForResponse((r) => r.url().includes("/api/v1/readiness") && r.url().includes("status=ready")),
    page.getByLabel("Show").selectOption("ready"),
  ]);
  // The demo seed leaves a promotion waiting for approval on an approve-mode ladder.
  const approve = table.getByRole("button", { name: /Approve the promotion of/ }).first();
  await expect(approve).toBeEnabled();
  // Read together and retried: the filtered rows may still be replacing the previous ones.
  await expect(async () => {
    const label = (await approve.getAttribute("aria-label")) ?? "";
    const who = label.replace(/^Approve the promotion of /, "").split(" on ")[0]!;
    await expect(table.getByRole("link", { name: who })).toBeVisible({ timeout: 1_000 });
  }).toPass({ timeout: 10_000 });

  // Keyboard: arrow keys move between cells.
  await table.getByRole("columnheader", { name: "Athlete" }).focus();
  await page.keyboard.press("ArrowDown");
  await expect(page.locator(":focus")).toHaveAttribute("data-row", "1");
  await page.keyboard.press("ArrowRight");
  await expect(page.locator(":focus")).toHaveAttribute("data-col", "1");

  await approve.click();
  await expect(page.getByText("Promotion approved.")).toBeVisible();

  // The whole team for the export.
  await page.getByLabel("Show").selectOption({ label: "Everyone" });
  await expect(table.getByRole("link", { name: "Priya Dalgaard" })).toBeVisible();
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download CSV" }).click()]);
  expect(download.suggestedFilename()).toBe(`readiness-${current}.csv`);
  const csv = await fs.readFile((await download.path())!, "utf8");
  expect(csv.split("\r\n")[0]).toBe(
    "week,athlete_id,athlete,ladder_id,ladder,rung_id,rung,readiness,status,sessions_this_week,days_on_rung,pain,pending_promotion_id,promotions_this_week",
  );
  expect(csv).toContain("Sol Marquez");
  expect(csv).toContain("Priya Dalgaard");
});

test("the coach opens an athlete's progress and training load from the table", async ({ page }) => {
  await signInAsDemoCoach(page);
  await page.getByRole("grid", { name: "Readiness this week" }).getByRole("link", { name: "Amara Castell" }).click();
  await expect(page.getByRole("heading", { name: "Amara Castell: progress" })).toBeVisible();
  await expect(page.getByRole("heading", { name: "Ring muscle-up" })).toBeVisible();
  await expect(page.getByText("Pain flags").first()).toBeVisible();
  await expect(page.getByRole("heading", { name: "Training load" })).toBeVisible();
  await expect(page.getByText(/do not predict injury/)).toBeVisible();
  await expect(page.getByText(/population SD/)).toBeVisible();
});
