import { expect, test } from "@playwright/test";
import { uniqueEmail } from "./support/mail";

test("a coach builds a squad, a block, a plan, and gives the plan to the squad", async ({ page }) => {
  // A long journey through four screens; the shared test machine can be slow.
  test.setTimeout(180_000);
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Odile Marsh");
  await page.getByLabel("Club or business name").fill("Harbourside Levers");
  await page.getByLabel("E-mail").fill(uniqueEmail("plans-coach"));
  await page.getByLabel("Password").fill("harbourside-strong-pass");
  await page.getByLabel("Time zone").fill("Europe/Lisbon");
  await page.getByRole("button", { name: "Create my team" }).click();
  // Sign-up hashes the password and installs the starter ladders: allow it longer on a busy machine.
  await expect(page).toHaveURL(/\/coach/, { timeout: 45_000 });
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Athletes" }).click();
  await expect(page.getByRole("heading", { name: "Athletes" })).toBeVisible();

  // Two athletes trained in person (no e-mail).
  const addForm = page.getByRole("complementary");
  for (const name of ["Tove Lind", "Jun Sato"]) {
    await addForm.getByLabel("Name").fill(name);
    await addForm.getByLabel("E-mail them an invite to sign in").uncheck();
    await addForm.getByRole("button", { name: "Add athlete" }).click();
    await expect(page.getByText(`${name} added.`)).toBeVisible();
  }

  // Squad
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Squads" }).click();
  await expect(page.getByText("No squads yet")).toBeVisible();
  await page.getByRole("button", { name: "New squad" }).click();
  const squadForm = page.getByRole("complementary");
  await squadForm.getByRole("button", { name: "Create squad" }).click();
  await expect(squadForm.getByText("Enter a name.")).toBeVisible();
  await squadForm.getByLabel("Name", { exact: true }).fill("Thursday levers");
  await squadForm.getByLabel("Tove Lind").check();
  await squadForm.getByLabel("Jun Sato").check();
  await squadForm.getByRole("button", { name: "Create squad" }).click();
  await expect(page.getByRole("listitem").filter({ hasText: "Thursday levers" })).toContainText("2 athletes");

  // Block: handstand first, then rings — the live estimate and a pairing warning show while editing.
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Blocks" }).click();
  await expect(page.getByText("No blocks yet")).toBeVisible();
  await page.getByRole("link", { name: "New block" }).first().click();
  await page.getByLabel("Block name").fill("Balance into rings");
  await page.getByRole("region", { name: "Slots" }).getByLabel("Ladder").nth(0).selectOption({ label: "Freestanding handstand" });
  await page.getByRole("region", { name: "Slots" }).getByLabel("Ladder").nth(1).selectOption({ label: "Ring muscle-up" });
  // First rungs: a 30 s pike hold and a 30 s ring support hold; 3 rounds, 60 s between slots, 120 s
  // between rounds → 3 × (30 + 60 + 30) + 2 × 120 = 600 s (lib/engine/duration.ts).
  await expect(page.getByTestId("block-duration")).toHaveText("10 min");
  const warnings = page.getByRole("list", { name: "Pairing warnings" });
  await expect(warnings).toContainText("grip-heavy ring work right after long hand-support work");
  // Live: one more round adds 30 + 60 + 30 + 120 = 240 s → 840 s = 14 min.
  await page.getByLabel("Rounds", { exact: true }).fill("4");
  await expect(page.getByTestId("block-duration")).toHaveText("14 min");
  await page.getByRole("button", { name: "Create block" }).click();
  await expect(page.getByRole("heading", { name: "Balance into rings" })).toBeVisible();
  await expect(page.getByTestId("block-duration")).toHaveText("14 min");

  // Plan: the block on Monday and Thursday.
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Plans" }).click();
  await expect(page.getByText("No plans yet")).toBeVisible();
  await page.getByRole("link", { name: "New plan" }).first().click();
  await page.getByLabel("Plan name").fill("Levers base");
  await page.getByLabel("Weeks").fill("4");
  await page.getByLabel("Warm-up (optional)").fill("Wrist circles and scapula push-ups");
  await page.getByLabel("Add a block on Monday").selectOption({ label: "Balance into rings" });
  await page.getByLabel("Add a block on Thursday").selectOption({ label: "Balance into rings" });
  await expect(page.getByTestId("day-estimate-Monday")).toHaveText("≈ 14 min");
  await expect(page.getByTestId("day-estimate-Tuesday")).toHaveText("Rest");
  await page.getByRole("button", { name: "Create plan" }).click();
  await expect(page.getByRole("heading", { name: "Levers base" })).toBeVisible();

  // Assign to the squad.
  await page.getByRole("button", { name: "Assign", exact: true }).click();
  const dialog = page.getByRole("dialog", { name: "Assign Levers base" });
  await dialog.getByLabel("Squad", { exact: true }).selectOption({ label: "Thursday levers (2)" });
  await dialog.getByLabel("Starts on").fill("2030-01-07");
  await dialog.getByLabel("Ends on (optional)").fill("2030-01-01");
  await dialog.getByRole("button", { name: "Assign", exact: true }).click();
  await expect(dialog.getByText("The end date can't be before the start date.")).toBeVisible();
  await dialog.getByLabel("Ends on (optional)").fill("");
  await dialog.getByRole("button", { name: "Assign", exact: true }).click();
  await expect(dialog.getByText(/Assigned to 2 athletes\. 4 new starting rungs set/)).toBeVisible();
});
