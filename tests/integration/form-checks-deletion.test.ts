import "../support/object-store";
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { DELETE as deleteRoute, GET as getRoute } from "@/app/api/v1/form-checks/[id]/route";
import { db } from "@/db/client";
import { storageDeletions, uploads } from "@/db/schema";
import { purgeAthleteMedia } from "@/lib/server/form-checks/purge-athlete-media";
import { drainStorageDeletions, retryDelayMs } from "@/lib/server/storage/drain-storage-deletions";
import { enqueueStorageDeletion } from "@/lib/server/storage/enqueue-storage-deletion";
import { listKeys, putObject } from "@/lib/server/storage/object-store";
import { sweepAbandonedUploads } from "@/lib/server/uploads/sweep-abandoned-uploads";
import { bearerFor, createMember, createTeam } from "../support/factories";
import { createFormCheckFor, fileOf, presign, putTo, type UploadTicket } from "../support/form-check-factories";
import { call } from "../support/http";

async function setUp() {
  const team = await createTeam();
  const athlete = await createMember(team.teamId, "athlete", "Del Athlete");
  return { ...team, athlete: athlete.actor, athleteToken: await bearerFor(athlete.actor), staffToken: await bearerFor(team.owner) };
}

describe("deleting form checks and their files", () => {
  it("lets the athlete or a coach delete; the file leaves storage", async () => {
    const t = await setUp();
    const mine = await createFormCheckFor(t.athleteToken);
    const coached = await createFormCheckFor(t.athleteToken);
    expect(await listKeys(`form-checks/${t.teamId}/`)).toHaveLength(2);

    expect((await call(deleteRoute, { token: t.athleteToken, params: { id: mine }, method: "DELETE" })).status).toBe(204);
    expect((await call(deleteRoute, { token: t.staffToken, params: { id: coached }, method: "DELETE" })).status).toBe(204);
    expect((await call(getRoute, { token: t.staffToken, params: { id: mine } })).status).toBe(404);
    expect((await call(deleteRoute, { token: t.staffToken, params: { id: mine }, method: "DELETE" })).status).toBe(404);
    expect(await listKeys(`form-checks/${t.teamId}/`)).toEqual([]);
  });

  it("retries a failed removal later with backoff, then drains it", async () => {
    const key = `form-checks/drain-test/${crypto.randomUUID()}.webm`;
    await putObject(key, fileOf("video/webm", 100), "video/webm");
    const [id] = await enqueueStorageDeletion(db, [key]);
    // A second ahead: the row is due at the database's now() (microseconds), which a JS Date taken in
    // the same millisecond (milliseconds) could otherwise fall just short of.
    const now = new Date(Date.now() + 1_000);
    const failing = await drainStorageDeletions({ ids: [id!], now, remove: async () => Promise.reject(new Error("storage is down")) });
    expect(failing).toEqual({ removed: 0, failed: 1 });
    const [row] = await db.select().from(storageDeletions).where(eq(storageDeletions.id, id!));
    expect(row).toMatchObject({ attempts: 1, lastError: "storage is down" });
    expect(row!.nextAttemptAt.getTime()).toBe(now.getTime() + retryDelayMs(1));
    // Not due yet: nothing happens.
    expect(await drainStorageDeletions({ ids: [id!], now })).toEqual({ removed: 0, failed: 0 });
    expect(await listKeys(key)).toEqual([key]);
    // Due: the real remover takes it away and the row is gone.
    expect(await drainStorageDeletions({ ids: [id!], now: new Date(now.getTime() + retryDelayMs(1)) })).toEqual({ removed: 1, failed: 0 });
    expect(await listKeys(key)).toEqual([]);
    expect(await db.select().from(storageDeletions).where(eq(storageDeletions.id, id!))).toEqual([]);
  });

  it("backs off 30 s, 1 min, 2 min… up to 6 hours", () => {
    // common practice, no source: exponential backoff with a cap
    expect([1, 2, 3, 4].map(retryDelayMs)).toEqual([30_000, 60_000, 120_000, 240_000]);
    expect(retryDelayMs(30)).toBe(6 * 3600 * 1000);
  });

  it("purges every file of a removed athlete", async () => {
    const t = await setUp();
    await createFormCheckFor(t.athleteToken);
    const stray = await presign(t.athleteToken, { contentType: "image/png", size: 200 });
    await putTo(stray.data as unknown as UploadTicket, fileOf("image/png", 200));
    expect(await listKeys(`form-checks/${t.teamId}/`)).toHaveLength(1);
    expect(await listKeys(`staging/${t.teamId}/`)).toHaveLength(1);

    const outbox = await db.transaction((tx) => purgeAthleteMedia(tx, t.teamId, t.athlete.athleteId!));
    expect(outbox.length).toBeGreaterThanOrEqual(2);
    await drainStorageDeletions({ ids: outbox });
    expect(await listKeys(`form-checks/${t.teamId}/`)).toEqual([]);
    expect(await listKeys(`staging/${t.teamId}/`)).toEqual([]);
    expect(await db.select().from(uploads).where(eq(uploads.athleteId, t.athlete.athleteId!))).toEqual([]);
  });

  it("gives up uploads never completed and removes what reached staging", async () => {
    const t = await setUp();
    const ticket = await presign(t.athleteToken, { contentType: "image/png", size: 300 });
    await putTo(ticket.data as unknown as UploadTicket, fileOf("image/png", 300));
    const later = new Date(Date.now() + 25 * 3600 * 1000);
    expect(await sweepAbandonedUploads(later)).toBeGreaterThanOrEqual(1);
    await drainStorageDeletions({ now: later });
    expect(await listKeys(`staging/${t.teamId}/`)).toEqual([]);
    const [row] = await db.select({ state: uploads.state }).from(uploads).where(eq(uploads.id, ticket.data.uploadId as string));
    expect(row?.state).toBe("rejected");
  });
});
