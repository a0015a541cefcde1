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

  // The demo seed leaves at least one move up and one step down waiting (which athletes depends on
  // the seeded history, so the spec reads them from the API rather than naming them).
  const pending = await page.request.get("/api/v1/promotions?status=pending");
  expect(pending.status()).toBe(200);
  type Item = { direction: "up" | "down"; athlete: { name: string }; ladder: { id: string }; fromRung: { id: string; name: string } };
  const items = ((await pending.json()) as { items: Item[] }).items;
  const up = items.find((p) => p.direction === "up");
  const down = items.find((p) => p.direction === "down");
  expect(up, "a pending move up in the demo").toBeTruthy();
  expect(down, "a pending step down in the demo").toBeTruthy();

  await expect(proposals.getByRole("link", { name: up!.athlete.name }).first()).toBeVisible();
  await expect(proposals.getByText(/Ready to move up: \d of \d sessions met/).first()).toBeVisible();
  await expect(proposals.getByText(/step down proposed/).first()).toBeVisible();
  await expect(proposals.getByRole("button", { name: `Approve for ${up!.athlete.name}` }).first()).toBeEnabled();

  await page.goto(`/coach/ladders/${up!.ladder.id}/rungs/${up!.fromRung.id}/what-if`);
  await expect(page.getByRole("heading", { name: `What if: ${up!.fromRung.name}` })).toBeVisible();
  const replay = page.getByRole("region", { name: "Replay" });
  await expect(replay.getByRole("cell", { name: up!.athlete.name })).toBeVisible();

  await page.getByLabel("Value per set").fill("");
  await page.getByRole("button", { name: "Replay" }).click();
  await expect(page.getByText("Enter the value per set.")).toBeVisible();
  await page.getByLabel("Value per set").fill("50");
  await page.getByRole("button", { name: "Replay" }).click();
  await expect(replay.getByText(/at least 50/).first()).toBeVisible();
  await expect(replay.getByRole("row", { name: new RegExp(up!.athlete.name) })).toBeVisible();
});
