import { expect, test } from "@playwright/test";

// Read-only over the demo club (seed step 005): the coach sees what waits for them and can try a
// different standard on a rung. Decisions are covered by the integration tests, so the shared demo
// data stays as other specs expect it.
test("the demo coach reviews pending proposals and replays a standard on a rung", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill("coach@rungwise.test");
  await page.getByLabel("Password").fill("rungwise-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/coach/);

  await page.getByRole("link", { name: "Approvals" }).first().click();
  await expect(page.getByRole("heading", { name: "Approvals" })).toBeVisible();
  const proposals = page.getByRole("region", { name: "Pending proposals" });
  await expect(proposals.getByText("Ines Brodeur")).toBeVisible();
  await expect(proposals.getByText(/Ready to move up: 2 of 3 sessions met/)).toBeVisible();
  await expect(proposals.getByText("Felix Nakamura")).toBeVisible();
  await expect(proposals.getByText(/Pain flagged in 2 of the last 3 sessions/)).toBeVisible();
  await expect(proposals.getByRole("button", { name: "Approve for Ines Brodeur" })).toBeEnabled();

  const pending = await page.request.get("/api/v1/promotions?status=pending");
  const body = (await pending.json()) as { items: { athlete: { name: string }; ladder: { id: string }; fromRung: { id: string } }[] };
  const ines = body.items.find((p) => p.athlete.name === "Ines Brodeur")!;
  await page.goto(`/coach/ladders/${ines.ladder.id}/rungs/${ines.fromRung.id}/what-if`);
  await expect(page.getByRole("heading", { name: /What if: Straddle leg lifts/ })).toBeVisible();
  const replay = page.getByRole("region", { name: "Replay" });
  await expect(replay.getByRole("cell", { name: "Ines Brodeur" })).toBeVisible();

  await page.getByLabel("Value per set").fill("");
  await page.getByRole("button", { name: "Replay" }).click();
  await expect(page.getByText("Enter the value per set.")).toBeVisible();
  await page.getByLabel("Value per set").fill("12");
  await page.getByRole("button", { name: "Replay" }).click();
  await expect(replay.getByText("3 sets of at least 12 reps", { exact: false })).toBeVisible();
  await expect(replay.getByRole("row", { name: /Ines Brodeur/ })).toContainText("never, so far");
});
