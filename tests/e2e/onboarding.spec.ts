import { expect, test } from "@playwright/test";
import { uniqueEmail, waitForLink } from "./support/mail";

test("a coach signs up, invites an athlete, and the athlete joins from a phone", async ({ page, browser }) => {
  const coachEmail = uniqueEmail("coach");
  const athleteEmail = uniqueEmail("athlete");

  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Wren Abara");
  await page.getByLabel("Club or business name").fill("Quayside Balance Studio");
  await page.getByLabel("E-mail").fill(coachEmail);
  await page.getByLabel("Password").fill("quayside-strong-pass");
  await page.getByLabel("Time zone").fill("Europe/Lisbon");
  await page.getByRole("button", { name: "Create my team" }).click();

  await expect(page).toHaveURL(/\/coach/);
  // The coach's home is the weekly table; the roster is one click away.
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Athletes" }).click();
  await expect(page.getByRole("heading", { name: "Athletes" })).toBeVisible();
  await expect(page.getByText("No athletes yet")).toBeVisible();

  test.setTimeout(180_000); // a long journey across two browsers
  const form = page.getByRole("complementary");
  await form.getByLabel("Name").fill("Milo Fenn");
  await form.getByLabel("E-mail (optional)").fill(athleteEmail);
  await form.getByRole("button", { name: "Add athlete" }).click();
  await expect(page.getByText("Milo Fenn added; the invite is on its way.")).toBeVisible();
  await expect(page.getByRole("link", { name: /Milo Fenn/ })).toContainText("Invite sent");

  const invite = await waitForLink(athleteEmail, "/invite/");
  const phone = await browser.newContext({ viewport: { width: 375, height: 812 }, isMobile: true, hasTouch: true });
  const athletePage = await phone.newPage();
  await athletePage.goto(invite);
  await expect(athletePage.getByRole("heading", { name: "Join Quayside Balance Studio" })).toBeVisible();
  await expect(athletePage.getByLabel("Your name")).toHaveValue("Milo Fenn");
  await athletePage.getByLabel("Choose a password").fill("short");
  await athletePage.getByRole("button", { name: "Join and sign in" }).click();
  await expect(athletePage.getByText("Use at least 10 characters.")).toBeVisible();
  await athletePage.getByLabel("Choose a password").fill("milo-fenn-strong");
  await athletePage.getByRole("button", { name: "Join and sign in" }).click();

  await expect(athletePage).toHaveURL(/\/today$/);
  await expect(athletePage.getByRole("heading", { name: "Hi Milo" })).toBeVisible();
  await expect(athletePage.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Today" })).toBeVisible();
  await expect(athletePage.getByRole("contentinfo").getByText(/does not replace a qualified coach/)).toBeVisible();

  await athletePage.getByRole("button", { name: "Sign out" }).click();
  await expect(athletePage).toHaveURL(/\/sign-in/);
  await expect(athletePage.getByText("You're signed out.")).toBeVisible();
  await athletePage.goto("/today");
  await expect(athletePage).toHaveURL(/\/sign-in/);
  await phone.close();

  // The coach sees the athlete's account is now linked.
  await page.reload();
  await expect(page.getByRole("link", { name: /Milo Fenn/ })).toContainText("Signs in");
});

test("the demo coach signs in with the printed demo sign-in", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill("coach@rungwise.test");
  await page.getByLabel("Password").fill("wrong-password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByText("That e-mail and password don't match an account.")).toBeVisible();
  await page.getByLabel("Password").fill("rungwise-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/coach/);
  await expect(page.getByText("Priya Dalgaard")).toBeVisible();
});
