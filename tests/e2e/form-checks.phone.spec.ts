import path from "node:path";
import { expect, test, type Page } from "@playwright/test";
import { uniqueEmail, waitForLink } from "./support/mail";

const CLIP = path.join(import.meta.dirname, "fixtures", "form-check.webm");

/** Waits for the session cookie, then opens `next` directly (independent of the post-sign-in redirect). */
async function afterSession(page: Page, next: string) {
  await expect
    .poll(async () => (await page.context().cookies()).some((c) => c.name.endsWith("authjs.session-token")), { timeout: 20_000 })
    .toBe(true);
  await page.goto(next);
}

async function signIn(page: Page, email: string, password: string, next: string) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click({ noWaitAfter: true });
  await afterSession(page, next);
}

const currentTime = (page: Page) => page.locator("video").evaluate((v: HTMLVideoElement) => v.currentTime);

test("an athlete sends a clip from the phone, the coach comments at 00:02, the athlete jumps to it", async ({ page, browser, request }) => {
  test.setTimeout(180_000); // two people, an upload and a review: a long journey on a shared machine
  const coachEmail = uniqueEmail("fc-coach");
  const athleteEmail = uniqueEmail("fc-athlete");
  const signUp = await request.post("/api/v1/signup", {
    data: { email: coachEmail, password: "form-check-coach-pass", name: "Oona Brisk", teamName: "Harbour Levers", timeZone: "Europe/Dublin" },
  });
  expect(signUp.status()).toBe(201);

  const laptop = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  const coach = await laptop.newPage();
  await signIn(coach, coachEmail, "form-check-coach-pass", "/coach/form-checks");
  await expect(coach.getByRole("heading", { name: "Form checks" })).toBeVisible();
  await expect(coach.getByText("No form checks yet")).toBeVisible();
  const added = await coach.request.post("/api/v1/athletes", { data: { name: "Tam Reyes", email: athleteEmail, invite: true } });
  expect(added.status()).toBe(201);

  // The athlete joins on the phone and sends a clip.
  await page.goto(await waitForLink(athleteEmail, "/invite/"));
  await page.getByLabel("Choose a password").fill("tam-reyes-strong");
  await page.getByRole("button", { name: "Join and sign in" }).click({ noWaitAfter: true });
  await afterSession(page, "/today");
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Form" }).click();
  await expect(page.getByRole("heading", { name: "Form checks" })).toBeVisible();
  await expect(page.getByText("No form checks yet")).toBeVisible();

  await page.getByRole("button", { name: "Send for review" }).click();
  await expect(page.getByText("Choose a video or photo first.")).toBeVisible();
  await page.getByLabel("Video or photo").setInputFiles(CLIP);
  await page.getByLabel("Note for your coach (optional)").fill("Tuck to straddle, second set");
  await page.getByRole("button", { name: "Send for review" }).click();
  await expect(page).toHaveURL(/\/form-checks\/[0-9a-f-]{36}$/, { timeout: 30_000 });
  await expect(page.getByText("Your coach hasn't commented yet.")).toBeVisible();
  await expect(page.locator("video")).toHaveAttribute("src", /X-Amz-Signature=/);

  // The coach reviews on the laptop: slow motion, frame step, and a comment pinned at 00:02.
  await coach.reload();
  const item = coach.getByRole("link", { name: /Tam Reyes/ });
  await expect(item).toContainText("Awaiting review");
  await item.click();
  await expect(coach.getByRole("heading", { name: "Review form check" })).toBeVisible();
  const video = coach.locator("video");
  await expect.poll(() => video.evaluate((v: HTMLVideoElement) => v.readyState)).toBeGreaterThanOrEqual(1);
  await video.evaluate((v: HTMLVideoElement) => {
    v.currentTime = 2;
  });
  await expect(coach.getByRole("button", { name: "Comment at 00:02" })).toBeVisible();
  await coach.getByRole("textbox", { name: "Comment" }).fill("Hips drift past the hands here: press the floor away");
  await coach.getByRole("button", { name: "Comment at 00:02" }).click();
  await expect(coach.getByRole("button", { name: /00:02 Hips drift past the hands/ })).toBeVisible();

  await coach.getByRole("button", { name: "0.5×" }).click();
  expect(await video.evaluate((v: HTMLVideoElement) => v.playbackRate)).toBe(0.5);
  const before = await currentTime(coach);
  await coach.getByRole("button", { name: "Forward one frame" }).click();
  await expect.poll(() => currentTime(coach)).toBeCloseTo(before + 1 / 30, 2);
  await laptop.close();

  // The athlete sees the comment and jumps to its moment.
  await page.reload();
  const comment = page.getByRole("button", { name: /00:02 Hips drift past the hands/ });
  await expect(comment).toBeVisible();
  await expect.poll(() => page.locator("video").evaluate((v: HTMLVideoElement) => v.readyState)).toBeGreaterThanOrEqual(1);
  await comment.click();
  await expect.poll(() => currentTime(page)).toBeCloseTo(2, 1);

  await page.getByRole("link", { name: "← All form checks" }).click();
  await expect(page.getByRole("link", { name: /Tuck to straddle/ })).toContainText("1 comment");
});
