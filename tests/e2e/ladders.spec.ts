import fs from "node:fs";
import { expect, test, type Page } from "@playwright/test";
import { uniqueEmail } from "./support/mail";

async function signUpFreshTeam(page: Page) {
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Tove Arnesen");
  await page.getByLabel("Club or business name").fill("Harbour Rings Club");
  await page.getByLabel("E-mail").fill(uniqueEmail("ladders"));
  await page.getByLabel("Password").fill("harbour-rings-pass");
  await page.getByLabel("Time zone").fill("Europe/Oslo");
  await page.getByRole("button", { name: "Create my team" }).click();
  // Sign-up hashes a password and installs the starter library: allow a slow shared machine.
  await expect(page).toHaveURL(/\/coach/, { timeout: 30_000 });
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Athletes" }).click();
  await expect(page.getByRole("heading", { name: "Athletes" })).toBeVisible();
}

async function signInAsDemoCoach(page: Page) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill("coach@rungwise.test");
  await page.getByLabel("Password").fill("rungwise-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/coach/);
}

async function addRung(page: Page, name: string, numbers: { target?: string; sets?: string } = {}) {
  await page.getByRole("button", { name: "Add rung" }).first().click();
  const form = page.getByRole("form", { name: "New rung" });
  await form.getByLabel("Rung name").fill(name);
  if (numbers.target) await form.getByLabel("Target (seconds per set)").fill(numbers.target);
  if (numbers.sets) await form.getByLabel("Sets", { exact: true }).fill(numbers.sets);
  await form.getByRole("button", { name: "Add rung" }).click();
  await expect(form).toBeHidden();
}

test("a coach builds a ladder, reorders it, exports it, imports a copy and places an athlete", async ({ page }) => {
  await signUpFreshTeam(page);

  // An athlete trained in person, without a sign-in.
  const aside = page.getByRole("complementary");
  await aside.getByLabel("Name").fill("Ola Brandt");
  await aside.getByLabel("E-mail them an invite to sign in").uncheck();
  await aside.getByRole("button", { name: "Add athlete" }).click();
  await expect(page.getByText("Ola Brandt added.")).toBeVisible();

  // The library shows the starter ladders and their notice.
  await page.getByRole("navigation").getByRole("link", { name: "Ladders" }).click();
  await expect(page.getByRole("heading", { name: "Ladders" })).toBeVisible();
  await expect(page.getByText(/These ladders are general starting points/)).toBeVisible();
  await expect(page.getByText("Starter", { exact: true }).first()).toBeVisible();
  await page.getByLabel("Search ladders").fill("no such ladder anywhere");
  await expect(page.getByText("No ladder matches")).toBeVisible();
  await page.getByLabel("Search ladders").fill("");

  // A new ladder with three rungs.
  const create = page.getByRole("complementary").first();
  await create.getByLabel("Ladder name").fill("Planche line");
  await create.getByLabel("Target skill").fill("Straddle planche");
  await create.getByRole("button", { name: "Create and add rungs" }).click();
  await expect(page.getByRole("heading", { name: "Planche line" })).toBeVisible();
  await expect(page.getByText("No rungs yet")).toBeVisible();

  // The standard is shown in plain words as the coach types, and bad numbers are named at the field.
  await page.getByRole("button", { name: "Add rung" }).first().click();
  const first = page.getByRole("form", { name: "New rung" });
  await first.getByLabel("Rung name").fill("Frog stand");
  // A rung not saved yet has no past sessions to replay: a note, no table.
  await expect(first.getByText("Once the rung is saved, editing it replays past sessions")).toBeVisible();
  await expect(first.getByRole("region", { name: "Past sessions under this standard" })).toHaveCount(0);
  await expect(first.getByTestId("standard-preview")).toContainText(
    "3 sets of at least 20 s at RPE 7 or easier, in 2 of the last 3 sessions, at least 7 days on this rung, pain-free",
  );
  await first.getByLabel("Sets", { exact: true }).fill("0");
  await first.getByRole("button", { name: "Add rung" }).click();
  await expect(first.getByText("Sets must be at least 1.")).toBeVisible();
  await first.getByLabel("Sets", { exact: true }).fill("3");
  await first.getByLabel("Caution (athletes see this)").fill("Warm up your wrists first.");
  // Step-down proposals: on with the usual rule, said in words; switched off for this rung.
  await expect(first.getByTestId("step-down-preview")).toContainText("pain is flagged in 2 of the last 3 sessions");
  await first.getByLabel("Propose a step down when it hurts or slips").uncheck();
  await expect(first.getByTestId("step-down-preview")).toHaveText("No step-down proposals on this rung.");
  await first.getByRole("button", { name: "Add rung" }).click();
  await expect(first).toBeHidden();

  await addRung(page, "Tuck planche", { target: "15" });
  await addRung(page, "Advanced tuck planche", { target: "10", sets: "4" });
  const rungs = page.getByRole("listitem").filter({ has: page.getByText("Ready when:") });
  await expect(rungs).toHaveCount(3);
  await expect(rungs.nth(1)).toContainText("3 sets of at least 15 s");
  const ladderId = new URL(page.url()).pathname.split("/").pop()!;
  const saved = (await (await page.request.get(`/api/v1/ladders/${ladderId}`)).json()) as { rungs: { name: string; standard: { stepDown: unknown } }[] };
  const stepDownOf = (name: string) => saved.rungs.find((r) => r.name === name)?.standard.stepDown;
  expect(stepDownOf("Frog stand")).toBeNull();
  expect(stepDownOf("Tuck planche")).toEqual({ painSessions: 2, painWindow: 3, dropBelowPct: 70, dropSessions: 2 });
  await expect(rungs.nth(0)).toContainText("Warm up your wrists first.");

  // Reorder with the keyboard-reachable buttons; the order survives a reload.
  await page.getByRole("button", { name: "Move Tuck planche up" }).focus();
  await page.keyboard.press("Enter");
  await expect(rungs.nth(0)).toContainText("Tuck planche");
  await expect(rungs.nth(1)).toContainText("Frog stand");
  await page.reload();
  await expect(rungs.nth(0)).toContainText("Tuck planche");
  await expect(rungs.nth(2)).toContainText("Advanced tuck planche");

  // Export as a file.
  const downloading = page.waitForEvent("download");
  await page.getByRole("link", { name: "Export file" }).click();
  const download = await downloading;
  expect(download.suggestedFilename()).toBe("planche-line.rungwise.json");
  const file = test.info().outputPath("planche-line.rungwise.json");
  await download.saveAs(file);
  const doc = JSON.parse(fs.readFileSync(file, "utf8")) as { format: string; rungs: { name: string }[] };
  expect(doc.format).toBe("rungwise.ladder");
  expect(doc.rungs.map((r) => r.name)).toEqual(["Tuck planche", "Frog stand", "Advanced tuck planche"]);

  // Import a copy by file upload.
  await page.getByRole("link", { name: "← All ladders" }).click();
  await page.getByLabel("Ladder file").setInputFiles(file);
  await page.getByRole("button", { name: "Import", exact: true }).click();
  await expect(page.getByText("Ladder imported.")).toBeVisible();
  await expect(page.getByText(/already has a ladder with this name/)).toBeVisible();
  await expect(page.getByRole("listitem").filter({ has: page.getByText("Ready when:") })).toHaveCount(3);
  await expect(page.getByRole("listitem").filter({ has: page.getByText("Ready when:") }).nth(1)).toContainText("Frog stand");

  // Place the athlete on a rung from their page.
  await page.getByRole("navigation").getByRole("link", { name: "Athletes" }).click();
  await page.getByRole("link", { name: /Ola Brandt/ }).click();
  await expect(page.getByText("Not on any ladder yet")).toBeVisible();
  const placement = page.getByRole("region", { name: "Ladder positions" });
  await placement.getByLabel("Ladder", { exact: true }).selectOption({ label: "Planche line" });
  await placement.getByLabel("Rung", { exact: true }).selectOption({ label: "1. Tuck planche" });
  await placement.getByRole("button", { name: "Place athlete" }).click();
  await expect(page.getByText("Placed on Planche line: Tuck planche.")).toBeVisible();
  await expect(placement.getByText(/Rung 1: Tuck planche · since \d{4}-\d{2}-\d{2}/)).toBeVisible();
});

// Read-only over the demo club: the form is cancelled, so the seeded standard stays as other specs expect.
test("editing a rung with history replays the standard as typed beside its fields", async ({ page }) => {
  await signInAsDemoCoach(page);
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Ladders" }).click();
  await page.getByRole("link", { name: /^Press to handstand/ }).click();
  await expect(page.getByRole("heading", { name: "Press to handstand" })).toBeVisible();

  const rungName = "Straddle leg lifts, hands in front";
  await page.getByRole("listitem", { name: new RegExp(`^Rung \\d+: ${rungName}$`) }).getByRole("button", { name: "Edit" }).click();
  const form = page.getByRole("form", { name: `Edit ${rungName}` });
  const replay = form.getByRole("region", { name: "Past sessions under this standard" });

  // Demo seed steps 002, 004 and 005: Ines reached this rung 16 days before the seed and has logged
  // pain-free sessions on it since, at RPE 7 or easier, so 1 rep a set is met and 99 never is.
  const ines = replay.getByRole("row", { name: /Ines Brodeur/ });
  const underThisStandard = ines.getByRole("cell").nth(2);
  await expect(ines).toBeVisible();

  // Beside the standard fields on a laptop, not somewhere further down the form.
  const fields = await form.getByRole("group", { name: "Readiness standard" }).boundingBox();
  const table = await replay.boundingBox();
  expect(table!.x).toBeGreaterThanOrEqual(fields!.x + fields!.width);
  expect(table!.y).toBeLessThan(fields!.y + fields!.height);

  // The numbers as typed are what gets replayed: an easy target is met on a date...
  const target = form.getByLabel("Target (reps per set)");
  const replayedWith = (minValue: number) =>
    page.waitForRequest((r) => r.url().endsWith("/backtest") && (r.postDataJSON() as { standard: { minValue: number } }).standard.minValue === minValue);
  let replayed = replayedWith(1);
  await target.fill("1");
  await replayed;
  await expect(underThisStandard).toHaveText(/^\d{4}-\d{2}-\d{2}/);
  await expect(ines).not.toContainText("Not met");

  // ...and one nobody has reached is not.
  replayed = replayedWith(99);
  await target.fill("99");
  await replayed;
  await expect(underThisStandard).toHaveText(/^never, so far/);
  await expect(ines).toContainText("Not met");

  // A half-typed standard is not replayed: a note says so and the last good table stays up.
  await target.fill("");
  await expect(replay.getByText("Finish the standard to replay it. Until then this shows the last complete one.")).toBeVisible();
  await expect(ines).toContainText("Not met");

  await form.getByRole("button", { name: "Cancel" }).click();
  await expect(form).toBeHidden();
});
