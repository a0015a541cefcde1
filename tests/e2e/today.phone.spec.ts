import { expect, test, type Page } from "@playwright/test";

// The demo athlete (seeded): nothing is planned for her, so she logs through "Log a rung anyway".
const ATHLETE = { email: "athlete@rungwise.test", password: "rungwise-demo" };

interface TodayData {
  date: string;
  positions: { rungId: string; rungName: string; measure: string; logged: { sets: unknown[] }[] }[];
}

async function today(page: Page): Promise<TodayData> {
  const res = await page.request.get("/api/v1/me/today");
  expect(res.status()).toBe(200);
  return (await res.json()) as TodayData;
}

function setsOn(data: TodayData, rungId: string) {
  const rung = data.positions.find((p) => p.rungId === rungId)!;
  return { entries: rung.logged.length, sets: rung.logged.reduce((n, e) => n + e.sets.length, 0) };
}

async function logHeldSet(page: Page, card: ReturnType<Page["getByTestId"]>, seconds?: string) {
  if (seconds) {
    await card.getByLabel("Seconds", { exact: true }).fill(seconds);
  } else {
    await card.getByRole("button", { name: "Start hold timer" }).click();
    await page.waitForTimeout(1200);
    await card.getByRole("button", { name: "Stop hold timer" }).click();
    await expect(card.getByLabel("Seconds", { exact: true })).not.toHaveValue("");
  }
  await card.getByLabel("RPE (1–10)").selectOption("7");
  await card.getByRole("button", { name: "Log set" }).click();
}

test("an athlete logs sets with the timer, keeps logging offline through a reload, and every set lands once", async ({ page, context }) => {
  test.setTimeout(180_000); // a long journey: sign-in, service worker install, eight writes, two reloads
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(ATHLETE.email);
  await page.getByLabel("Password").fill(ATHLETE.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  // Signed in once the session cookie is set; then open Today directly.
  await expect.poll(async () => (await context.cookies()).some((c) => c.name.endsWith("authjs.session-token")), { timeout: 30_000 }).toBe(true);
  await page.goto("/today");
  await expect(page.getByTestId("verdict-explanation").first()).not.toBeEmpty();
  await expect(page).toHaveURL(/\/today$/);
  await expect(page.getByRole("heading", { name: /^Hi / })).toBeVisible();
  await expect(page.getByText(/does not replace a qualified coach/).first()).toBeVisible();

  const before = await today(page);
  const hold = before.positions.find((p) => p.measure === "hold_seconds")!;
  expect(hold).toBeTruthy();
  const start = setsOn(before, hold.rungId);

  // The service worker takes control; one more online load puts the page and its API in its cache.
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  await page.reload();
  await expect
    .poll(() => page.evaluate(async () => Boolean((await caches.match("/api/v1/me/today")) && (await caches.match("/today")))), { timeout: 15_000 })
    .toBe(true);

  const open = async () => {
    await page.getByRole("button", { name: "Log a rung anyway" }).click();
    // The "anyway" list comes last; a planned slot on the same rung shows the same sets above it.
    return page.getByTestId(`rung-${hold.rungId}`).last();
  };
  let card = await open();
  await expect(card.getByRole("heading", { name: hold.rungName })).toBeVisible();
  for (let i = 1; i <= 3; i += 1) {
    await logHeldSet(page, card);
    await expect(card.locator('[data-state="logged"]')).toHaveCount(start.sets + i);
  }

  await context.setOffline(true);
  await logHeldSet(page, card, "21");
  await logHeldSet(page, card, "22");
  await expect(card.locator('[data-state="pending"]')).toHaveCount(2);
  await expect(page.getByTestId("pending-count")).toHaveText("2");

  const dump = () => page.evaluate(() => new Promise<string>((resolve) => {
    const req = indexedDB.open("rungwise-offline");
    req.onsuccess = () => {
      const tx = req.result.transaction("pending", "readonly");
      const all = tx.objectStore("pending").getAll();
      all.onsuccess = () => resolve(JSON.stringify(all.result));
      all.onerror = () => resolve("err");
    };
    req.onerror = () => resolve("open err");
  }));
  // The unsent sets are on the device, not only on screen.
  expect(JSON.parse(await dump())).toHaveLength(2);
  await page.reload();
  card = await open();

  await expect(card.locator('[data-state="pending"]')).toHaveCount(2);
  await expect(card.locator('[data-state="logged"]')).toHaveCount(start.sets + 3);

  await context.setOffline(false);
  await expect(card.locator('[data-state="pending"]')).toHaveCount(0, { timeout: 30_000 });
  await expect(card.locator('[data-state="logged"]')).toHaveCount(start.sets + 5);

  const after = setsOn(await today(page), hold.rungId);
  expect(after).toEqual({ entries: start.entries + 5, sets: start.sets + 5 });

  // Signing out drops the personal pages kept for offline use (a shared phone shows them to nobody).
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  const kept = await page.evaluate(async () => ({
    pageCaches: (await caches.keys()).filter((k) => k.startsWith("rungwise-pages-")).length,
    today: Boolean(await caches.match("/today")),
  }));
  expect(kept).toEqual({ pageCaches: 0, today: false });
});
