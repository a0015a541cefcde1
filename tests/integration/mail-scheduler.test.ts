import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { dailyEvaluations } from "@/db/schema";
import { enqueueDueDigests } from "@/lib/server/jobs/enqueue-due-digests";
import { runDailyEvaluation } from "@/lib/server/jobs/run-daily-evaluations";
import { DEFAULT_PREFERENCES } from "@/lib/server/notifications/preferences";
import { updatePreferences } from "@/lib/server/notifications/update-preferences";
import { createMember, createTeam } from "../support/factories";
import { mailTo, waitForMail } from "../support/mail";
import { firstLadder, placeAthlete } from "../support/notification-factories";
import { drainQueue } from "../support/queue";

describe("digest scheduler", () => {
  it("sends each coach one digest for the week even when the tick fires twice", async () => {
    const { teamId } = await createTeam({ timeZone: "Europe/Amsterdam" });
    const coach = await createMember(teamId, "coach");
    const late = await createMember(teamId, "coach");
    await updatePreferences(late.actor, { ...DEFAULT_PREFERENCES, digestWeekday: 5, digestHour: 17 });
    // Tuesday 2026-12-01 13:00 in Amsterdam: Monday 07:00 has passed (→ week 2026-W48), Friday 17:00 has not.
    const tuesday = new Date("2026-12-01T12:00:00Z");
    await enqueueDueDigests(tuesday);
    await enqueueDueDigests(tuesday);
    await drainQueue();
    await enqueueDueDigests(new Date("2026-12-01T12:10:00Z"));
    await drainQueue();
    const mails = await waitForMail(coach.email);
    expect(mails).toHaveLength(1);
    expect(mails[0]!.subject).toMatch(/^Week 2026-W48:/);
    expect(await mailTo(late.email)).toHaveLength(0);

    // Friday 17:00 Amsterdam: the later coach's digest covers the week of Thursday (2026-W49).
    await enqueueDueDigests(new Date("2026-12-04T16:00:00Z"));
    await drainQueue();
    const lateMails = await waitForMail(late.email);
    expect(lateMails.map((m) => m.subject.slice(0, 13))).toEqual(["Week 2026-W49"]);
    expect(await mailTo(coach.email)).toHaveLength(1);
  });
});

describe("daily re-evaluation", () => {
  it("runs once per team and local date", async () => {
    const { teamId } = await createTeam({ timeZone: "Pacific/Auckland" });
    const athlete = await createMember(teamId, "athlete");
    const { ladder, rungs } = await firstLadder(teamId);
    await placeAthlete({ teamId, athleteId: athlete.actor.athleteId!, ladderId: ladder.id, rungId: rungs[0]!.id, since: "2026-11-25" });
    // 2026-12-01 12:00 UTC is already 2 December in Auckland (UTC+13 in summer).
    const first = await runDailyEvaluation(teamId, new Date("2026-12-01T12:00:00Z"));
    expect(first).toMatchObject({ localDate: "2026-12-02", evaluated: 1 });
    expect(await runDailyEvaluation(teamId, new Date("2026-12-01T20:00:00Z"))).toBeNull();
    const rows = await db.select().from(dailyEvaluations).where(and(eq(dailyEvaluations.teamId, teamId), eq(dailyEvaluations.localDate, "2026-12-02")));
    expect(rows).toHaveLength(1);
    expect(await runDailyEvaluation(teamId, new Date("2026-12-02T12:00:00Z"))).toMatchObject({ localDate: "2026-12-03" });
  });
});
