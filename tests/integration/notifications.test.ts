import { eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { POST as previewRoute } from "@/app/api/v1/digests/preview/route";
import { POST as runRoute } from "@/app/api/v1/digests/run/route";
import { db, getPool } from "@/db/client";
import { athletePositions, promotions } from "@/db/schema";
import { SimulatedCrash } from "@/lib/server/jobs/process-mail-batch";
import { approvalLinkState, approveByLink } from "@/lib/server/notifications/approval-link";
import { buildCoachDigest } from "@/lib/server/notifications/build-coach-digest";
import { enqueueNotice } from "@/lib/server/notifications/enqueue-notice";
import { unsubscribe } from "@/lib/server/notifications/unsubscribe";
import { DEFAULT_PREFERENCES } from "@/lib/server/notifications/preferences";
import { updatePreferences } from "@/lib/server/notifications/update-preferences";
import { bearerFor, createMember, createTeam } from "../support/factories";
import { call } from "../support/http";
import { firstLink, mailTo, waitForMail } from "../support/mail";
import { firstLadder, logSession, placeAthlete, seedPromotion, setPrimaryCoach } from "../support/notification-factories";
import { drainQueue } from "../support/queue";

const APP_URL = process.env.APP_URL ?? "http://localhost:3000";

/** A team with a coach and a signed-up athlete placed on the first rung of a starter ladder. */
async function squad() {
  const { teamId, owner } = await createTeam();
  const coach = await createMember(teamId, "coach", "Coach Ilse");
  const athlete = await createMember(teamId, "athlete", "Tomas Brandt");
  const athleteId = athlete.actor.athleteId!;
  await setPrimaryCoach(athleteId, coach.actor.userId);
  const { ladder, rungs } = await firstLadder(teamId);
  const positionId = await placeAthlete({ teamId, athleteId, ladderId: ladder.id, rungId: rungs[0]!.id, since: "2026-11-01" });
  return { teamId, owner, coach, athlete, athleteId, ladder, rungs, positionId };
}

async function promote(s: Awaited<ReturnType<typeof squad>>, status: "auto" | "pending") {
  return seedPromotion({
    teamId: s.teamId,
    athleteId: s.athleteId,
    ladderId: s.ladder.id,
    positionId: s.positionId,
    fromRungId: s.rungs[0]!.id,
    toRungId: s.rungs[1]!.id,
    status,
    effectiveOn: "2026-11-24",
  });
}

describe("promotion notices", () => {
  it("sends exactly one notice to the athlete and one copy to the primary coach", async () => {
    const s = await squad();
    const promotionId = await promote(s, "auto");
    await db.transaction((tx) => enqueueNotice(tx, { kind: "promotion", promotionId }));
    await drainQueue();
    // Enqueued twice (e.g. a retried log): still one each.
    await db.transaction((tx) => enqueueNotice(tx, { kind: "promotion", promotionId }));
    await drainQueue();

    const toAthlete = await waitForMail(s.athlete.email);
    const toCoach = await waitForMail(s.coach.email);
    expect(toAthlete).toHaveLength(1);
    expect(toCoach).toHaveLength(1);
    expect(toAthlete[0]!.subject).toBe(`You moved up to ${s.rungs[1]!.name}`);
    expect(toCoach[0]!.subject).toBe(`Tomas Brandt moved up to ${s.rungs[1]!.name}`);
    if (s.rungs[1]!.cues) expect(toAthlete[0]!.text).toContain(s.rungs[1]!.cues.slice(0, 20));
    expect(toAthlete[0]!.text).toContain("stop on sharp pain");
    expect(toAthlete[0]!.html).toContain("<");
    // One-click unsubscribe headers, absolute and signed.
    const header = toAthlete[0]!.headers["list-unsubscribe"] ?? "";
    expect(header.startsWith(`<${APP_URL}/api/unsubscribe/`)).toBe(true);
    expect(toAthlete[0]!.headers["list-unsubscribe-post"]).toBe("List-Unsubscribe=One-Click");
  });

  it("enqueues nothing when the transaction rolls back", async () => {
    const s = await squad();
    const promotionId = await promote(s, "auto");
    await expect(
      db.transaction(async (tx) => {
        await enqueueNotice(tx, { kind: "promotion", promotionId });
        throw new Error("log failed");
      }),
    ).rejects.toThrow("log failed");
    await drainQueue();
    expect(await waitForMail(s.athlete.email, 1, 800)).toHaveLength(0);
  });

  it("sends nothing to an athlete who opted out (the coach still gets the copy)", async () => {
    const s = await squad();
    await updatePreferences(s.athlete.actor, { ...DEFAULT_PREFERENCES, promotionNotices: false });
    const promotionId = await promote(s, "auto");
    await db.transaction((tx) => enqueueNotice(tx, { kind: "promotion", promotionId }));
    await drainQueue();
    expect(await waitForMail(s.coach.email)).toHaveLength(1);
    expect(await mailTo(s.athlete.email)).toHaveLength(0);
  });

  it("unsubscribes through the signed link and refuses a tampered one", async () => {
    const s = await squad();
    await db.transaction(async (tx) => enqueueNotice(tx, { kind: "promotion", promotionId: await promote(s, "auto") }));
    await drainQueue();
    const [mail] = await waitForMail(s.athlete.email);
    const link = firstLink(mail!, "/unsubscribe/");
    expect(link.startsWith(`${APP_URL}/unsubscribe/`)).toBe(true);
    const token = decodeURIComponent(link.split("/unsubscribe/")[1]!);
    const tampered = token.replace(/.$/, (c) => (c === "A" ? "B" : "A"));
    expect(await unsubscribe(tampered)).toBeNull();
    expect(await unsubscribe(token)).toMatchObject({ email: s.athlete.email, kind: "promotion" });

    // The next promotion reaches only the coach.
    await db.transaction(async (tx) => {
      const [second] = await tx
        .insert(promotions)
        .values({
          teamId: s.teamId,
          athleteId: s.athleteId,
          ladderId: s.ladder.id,
          positionId: s.positionId,
          fromRungId: s.rungs[1]!.id,
          toRungId: s.rungs[2]!.id,
          status: "auto",
          verdict: {},
          effectiveOn: "2026-11-30",
        })
        .returning({ id: promotions.id });
      await enqueueNotice(tx, { kind: "promotion", promotionId: second!.id });
    });
    await drainQueue();
    expect(await waitForMail(s.coach.email, 2)).toHaveLength(2);
    expect(await mailTo(s.athlete.email)).toHaveLength(1);
  });
});

describe("approval links", () => {
  it("asks the coach with a signed link whose page approves once on POST, then says it was used", async () => {
    const s = await squad();
    const promotionId = await promote(s, "pending");
    await db.transaction((tx) => enqueueNotice(tx, { kind: "approval_needed", promotionId }));
    await drainQueue();
    const [mail] = await waitForMail(s.coach.email);
    const link = firstLink(mail!, "/approve/");
    expect(link.startsWith(`${APP_URL}/approve/`)).toBe(true); // absolute
    const token = decodeURIComponent(link.split("/approve/")[1]!);

    // GET (the page) changes nothing.
    expect(await approvalLinkState(token)).toMatchObject({ state: "ready", athleteName: "Tomas Brandt", toRungName: s.rungs[1]!.name });
    expect(await approvalLinkState(token)).toMatchObject({ state: "ready" });

    // Tampered or wrong-purpose tokens are refused.
    const [body, sig] = token.split(".");
    const forged = `${Buffer.from(JSON.stringify({ purpose: "approve", subject: `${promotionId}|${s.coach.actor.userId}`, exp: 9999999999, nonce: "x" })).toString("base64url")}.${sig}`;
    expect(await approvalLinkState(forged)).toEqual({ state: "invalid" });
    expect(await approveByLink(`${body}.${sig!.slice(1)}A`)).toBe("invalid");

    expect(await approveByLink(token)).toBe("approved");
    const [row] = await db.select({ status: promotions.status, decidedById: promotions.decidedById }).from(promotions).where(eq(promotions.id, promotionId));
    expect(row).toEqual({ status: "approved", decidedById: s.coach.actor.userId });
    const [position] = await db.select({ rungId: athletePositions.rungId }).from(athletePositions).where(eq(athletePositions.id, s.positionId));
    expect(position?.rungId).toBe(s.rungs[1]!.id);

    expect(await approveByLink(token)).toBe("used");
    expect(await approvalLinkState(token)).toEqual({ state: "used" });

    // The approval queued the athlete's promotion notice.
    await drainQueue();
    expect(await waitForMail(s.athlete.email)).toHaveLength(1);
  });

  it("refuses an expired link", async () => {
    const { approvalLink } = await import("@/lib/server/notifications/approval-link");
    const s = await squad();
    const promotionId = await promote(s, "pending");
    const old = approvalLink(promotionId, s.coach.actor.userId, new Date(Date.now() - 8 * 86_400_000));
    expect(await approvalLinkState(decodeURIComponent(old.split("/approve/")[1]!))).toEqual({ state: "invalid" });
  });
});

describe("weekly digest", () => {
  it("counts a hand-worked week", async () => {
    // Week 2026-W48 is Monday 2026-11-23 … Sunday 2026-11-29 (ISO 8601; cross-checked with date-fns below).
    // Coach Ilse's athletes:
    //   Ana   — promoted (auto) on Tue 11-24, trained 11-24            → promotions 1
    //   Bo    — pending approval, trained 11-25 with a pain flag        → pending 1, pain 1
    //   Cy    — on the same rung since 2026-10-01 (≤ 11-29 − 28 days = 11-01), no session → stalled 1, no sessions 1
    //   Dee   — trained 11-27 (no pain), on the rung since 11-20         → nothing to report
    // Another coach's athlete with pain on 11-25 must not appear; a promotion dated 11-30 (next week) must not count.
    // Expected: promotions 1, pending approvals 1, pain flags 1, stalled 1 (Cy), no sessions 1 (Cy).
    const { getISOWeek, getISOWeekYear } = await import("date-fns");
    expect(`${getISOWeekYear(new Date(2026, 10, 23))}-W${getISOWeek(new Date(2026, 10, 23))}`).toBe("2026-W48");
    expect(getISOWeek(new Date(2026, 10, 29))).toBe(48);

    const { teamId } = await createTeam();
    const ilse = await createMember(teamId, "coach", "Coach Ilse");
    const other = await createMember(teamId, "coach", "Coach Olaf");
    const { ladder, rungs } = await firstLadder(teamId);
    const make = async (name: string, coachId: string, since: string) => {
      const a = await createMember(teamId, "athlete", name);
      await setPrimaryCoach(a.actor.athleteId!, coachId);
      const positionId = await placeAthlete({ teamId, athleteId: a.actor.athleteId!, ladderId: ladder.id, rungId: rungs[0]!.id, since });
      return { id: a.actor.athleteId!, positionId };
    };
    const ana = await make("Ana", ilse.actor.userId, "2026-11-24");
    const bo = await make("Bo", ilse.actor.userId, "2026-11-10");
    await make("Cy", ilse.actor.userId, "2026-10-01");
    const dee = await make("Dee", ilse.actor.userId, "2026-11-20");
    const olafs = await make("Olafs athlete", other.actor.userId, "2026-11-20");
    const base = { teamId, ladderId: ladder.id, fromRungId: rungs[0]!.id, toRungId: rungs[1]!.id };
    await seedPromotion({ ...base, athleteId: ana.id, positionId: ana.positionId, status: "auto", effectiveOn: "2026-11-24" });
    await seedPromotion({ ...base, athleteId: dee.id, positionId: dee.positionId, status: "auto", effectiveOn: "2026-11-30" });
    await seedPromotion({ ...base, athleteId: bo.id, positionId: bo.positionId, status: "pending", effectiveOn: "2026-11-25" });
    const entry = { teamId, ladderId: ladder.id, rungId: rungs[0]!.id };
    await logSession({ ...entry, athleteId: ana.id, performedOn: "2026-11-24" });
    await logSession({ ...entry, athleteId: bo.id, performedOn: "2026-11-25", pain: true });
    await logSession({ ...entry, athleteId: dee.id, performedOn: "2026-11-27" });
    await logSession({ ...entry, athleteId: olafs.id, performedOn: "2026-11-25", pain: true });

    const digest = await buildCoachDigest(db, { teamId, userId: ilse.actor.userId, week: "2026-W48" });
    expect(digest?.promotions.map((p) => p.athleteName)).toEqual(["Ana"]);
    expect(digest?.pendingApprovals.map((p) => p.athleteName)).toEqual(["Bo"]);
    expect(digest?.painFlags.map((p) => `${p.athleteName} ${p.on}`)).toEqual(["Bo 2026-11-25"]);
    expect(digest?.stalled.map((p) => p.athleteName)).toEqual(["Cy"]);
    expect(digest?.noSessions.map((p) => p.athleteName)).toEqual(["Cy"]);

    const res = await call(previewRoute, { token: await bearerFor(ilse.actor), json: { week: "2026-W48" } });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain("text/html");
    const html = typeof res.data === "string" ? res.data : "";
    for (const heading of ["Promotions (1)", "Waiting for your approval (1)", "Pain flags (1)", "No sessions this week (1)"]) {
      expect(html).toContain(heading);
    }
    expect(html).toContain("Stalled (no move up in 4 weeks) (1)");
    expect((await call(previewRoute, { token: await bearerFor(ilse.actor), json: { week: "2026-W60" } })).status).toBe(422);
  });

  it("runs twice for the same week and still sends one per coach; athletes may not run it", async () => {
    const { teamId, owner, ownerEmail } = await createTeam();
    const coach = await createMember(teamId, "coach");
    const athlete = await createMember(teamId, "athlete");
    const token = await bearerFor(coach.actor);
    expect((await call(runRoute, { token: await bearerFor(athlete.actor), path: "/api/v1/digests/run?week=2026-W48" })).status).toBe(403);
    const first = await call(runRoute, { token, path: "/api/v1/digests/run?week=2026-W48" });
    expect(first.status).toBe(202);
    expect(first.data).toEqual({ enqueued: 3 }); // owner + coach digests, one athlete summary
    await drainQueue();
    expect((await call(runRoute, { token: await bearerFor(owner), path: "/api/v1/digests/run?week=2026-W48" })).status).toBe(202);
    await drainQueue();
    expect(await waitForMail(coach.email)).toHaveLength(1);
    expect(await mailTo(ownerEmail)).toHaveLength(1);
    expect(await mailTo(athlete.email)).toHaveLength(1);
    expect((await mailTo(athlete.email))[0]!.subject).toBe("Your week 2026-W48: 0 training days");
  });

  it("sends the rest without duplicates after the worker dies mid-batch", async () => {
    const { teamId, owner } = await createTeam();
    const coaches = await Promise.all(Array.from({ length: 5 }, (_, i) => createMember(teamId, "coach", `Coach ${i}`)));
    await call(runRoute, { token: await bearerFor(owner), path: "/api/v1/digests/run?week=2026-W47" });
    await expect(drainQueue({ crashAfter: 2 })).rejects.toBeInstanceOf(SimulatedCrash);
    const early = (await Promise.all(coaches.map((c) => mailTo(c.email)))).flat().length;
    expect(early).toBeLessThan(coaches.length);
    // Restart: pg-boss hands the dead worker's active jobs out again (as on expiry), and the
    // scheduler fires once more.
    await getPool().query("UPDATE pgboss.job SET state = 'retry', start_after = now() WHERE name = 'mail' AND state = 'active'");
    await call(runRoute, { token: await bearerFor(owner), path: "/api/v1/digests/run?week=2026-W47" });
    await drainQueue();
    for (const coach of coaches) expect(await waitForMail(coach.email)).toHaveLength(1);
    const [{ count }] = (await db.execute<{ count: number }>(sql`select count(*)::int as count from mail_deliveries where team_id = ${teamId} and kind = 'digest'`)).rows as [{ count: number }];
    expect(count).toBe(6); // five coaches and the owner
  });

  it("skips people who turned the digest off", async () => {
    const { teamId, owner } = await createTeam();
    const coach = await createMember(teamId, "coach");
    await updatePreferences(coach.actor, { ...DEFAULT_PREFERENCES, weeklyDigest: false });
    await call(runRoute, { token: await bearerFor(owner), path: "/api/v1/digests/run?week=2026-W46" });
    await drainQueue();
    expect(await waitForMail(coach.email, 1, 800)).toHaveLength(0);
  });
});
