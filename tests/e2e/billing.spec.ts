import { expect, test } from "@playwright/test";
import { uniqueEmail, waitForLink } from "./support/mail";

test("the owner sells an offer; an invited athlete pays on the test checkout and sees the membership", async ({ page, browser }) => {
  test.setTimeout(180_000); // sign-up, invite and checkout across two browsers on a shared machine
  const athleteEmail = uniqueEmail("billing-athlete");
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Ansel Ward");
  await page.getByLabel("Club or business name").fill("Northgate Rings Club");
  await page.getByLabel("E-mail").fill(uniqueEmail("billing-owner"));
  await page.getByLabel("Password").fill("northgate-strong-pass");
  await page.getByLabel("Time zone").fill("Europe/Dublin");
  await page.getByRole("button", { name: "Create my team" }).click();
  await expect(page).toHaveURL(/\/coach/, { timeout: 45_000 });
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Athletes" }).click();
  await expect(page.getByRole("heading", { name: "Athletes" })).toBeVisible();

  // Offer: an absurd price is refused next to the field, then a real one is created.
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Billing" }).click();
  await expect(page.getByText("Test mode: payments go to a development fake")).toBeVisible();
  await expect(page.getByText("No offers yet")).toBeVisible();
  await expect(page.getByText("No memberships yet")).toBeVisible();
  await page.getByRole("button", { name: "New offer" }).click();
  const offerForm = page.getByRole("complementary");
  await offerForm.getByLabel("Name").fill("Rings monthly");
  await offerForm.getByLabel("Monthly price (smallest unit)").fill("-5");
  await offerForm.getByRole("button", { name: "Create offer" }).click();
  await expect(offerForm.getByText("The price must be at least 1.")).toBeVisible();
  await offerForm.getByLabel("Monthly price (smallest unit)").fill("3900");
  await expect(offerForm.getByText("Shown as €39.00 per month")).toBeVisible();
  await offerForm.getByLabel("What it includes").fill("A weekly plan review");
  await offerForm.getByRole("button", { name: "Create offer" }).click();
  await expect(page.getByRole("listitem").filter({ hasText: "Rings monthly" })).toContainText("€39.00 / month");

  // Invite an athlete, who joins on a phone.
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Athletes" }).click();
  const addForm = page.getByRole("complementary");
  await addForm.getByLabel("Name").fill("Sana Holm");
  await addForm.getByLabel("E-mail (optional)").fill(athleteEmail);
  await addForm.getByRole("button", { name: "Add athlete" }).click();
  await expect(page.getByText("Sana Holm added; the invite is on its way.")).toBeVisible();
  const invite = await waitForLink(athleteEmail, "/invite/");
  const phone = await browser.newContext({ viewport: { width: 375, height: 812 }, isMobile: true, hasTouch: true });
  const athletePage = await phone.newPage();
  await athletePage.goto(invite);
  await athletePage.getByLabel("Choose a password").fill("sana-holm-strong");
  await athletePage.getByRole("button", { name: "Join and sign in" }).click();
  await expect(athletePage).toHaveURL(/\/today$/);

  // Membership → Pay → the fake's hosted checkout → back on the membership page, active.
  await athletePage.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Member" }).click(); // the phone tab bar shows short labels
  await expect(athletePage.getByText("Test mode: payments go to a development fake")).toBeVisible();
  await expect(athletePage.getByText("Rings monthly")).toBeVisible();
  await athletePage.getByRole("button", { name: "Pay" }).click();
  await expect(athletePage).toHaveURL(/\/checkout\/cs_test_/);
  await expect(athletePage.getByText("Test mode: development payments fake")).toBeVisible();
  await athletePage.getByRole("button", { name: "Pay" }).click();
  await expect(athletePage).toHaveURL(/\/billing\?checkout=cs_test_/);
  await expect(athletePage.getByText("Active", { exact: true })).toBeVisible();
  await expect(athletePage.getByText(/Next charge on/)).toBeVisible();
  await athletePage.getByRole("button", { name: "Cancel at period end" }).click();
  await expect(athletePage.getByText(/Ends on .*nothing more is charged/)).toBeVisible();
  await phone.close();

  // The owner sees the membership and the money.
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Billing" }).click();
  const row = page.getByRole("row").filter({ hasText: "Sana Holm" });
  await expect(row).toContainText("Active");
  await expect(row).toContainText("ends at period end");
  await expect(page.getByRole("region", { name: "Revenue this month" })).toContainText("€39.00");
});
