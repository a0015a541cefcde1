import { and, eq, gt, max } from "drizzle-orm";
import { addDays, daysBetween } from "@/lib/engine/calendar-date";
import { localDateOf } from "@/lib/engine/local-date";
import { athletePositions, logEntries, logs, promotions, rungs, standards } from "../../schema";
import { DEMO_CLUB, type DemoAthleteKey } from "../demo-cast";
import { demoTeam } from "../demo-team";
import type { SeedStep } from "../step";

/** How each demo position looks on the coach's weekly table (stored figures the table sorts on). */
type Story = "steady" | "ready" | "stalled" | "pain" | "quiet";
const STORIES: Partial<Record<DemoAthleteKey, Partial<Record<string, Story>>>> = {
  jonas: { "press-to-handstand": "ready" },
  sol: { "l-sit-to-v-sit": "ready" },
  felix: { "front-lever": "stalled" },
  amara: { "ring-muscle-up": "pain" },
};
/** Athletes trained in person who have not been in this fortnight. */
const QUIET: DemoAthleteKey[] = ["hugo", "lotte"];
const HISTORY_DAYS = 42;

/** A small deterministic wobble (no randomness: the seed gives the same club every time). */
function wobble(a: number, b: number): number {
  return ((a * 7919 + b * 104729) % 11) / 10 - 0.5;
}

/**
 * Six weeks of sessions for the demo club, so the weekly readiness table, the progress charts and
 * the training-load figures have something to show: rising bests toward each rung's standard, two
 * promotions waiting for approval, one athlete stalled on a rung and one pain flag this week.
 */
export const reviewWeek: SeedStep = {
  name: "004-review-week",
  async run(tx, { now }) {
    const team = await demoTeam(tx);
    const today = localDateOf(now, DEMO_CLUB.timeZone);
    const keyOf = new Map(Object.entries(team.athleteIds).map(([key, id]) => [id, key as DemoAthleteKey]));
    const ladderKeyOf = new Map(Object.entries(team.ladderIds).map(([key, id]) => [id, key]));
    const positions = await tx
      .select({
        id: athletePositions.id,
        athleteId: athletePositions.athleteId,
        ladderId: athletePositions.ladderId,
        rungId: athletePositions.rungId,
        rungPosition: rungs.position,
        since: athletePositions.since,
        minValue: standards.minValue,
      })
      .from(athletePositions)
      .innerJoin(rungs, eq(rungs.id, athletePositions.rungId))
      .innerJoin(standards, eq(standards.rungId, athletePositions.rungId))
      .where(eq(athletePositions.teamId, team.teamId));

    const athleteIds = [...new Set(positions.map((p) => p.athleteId))];
    for (const [a, athleteId] of athleteIds.entries()) {
      const key = keyOf.get(athleteId);
      if (!key || QUIET.includes(key)) continue;
      const mine = positions.filter((p) => p.athleteId === athleteId);
      for (let back = HISTORY_DAYS; back >= 0; back -= 1) {
        const day = addDays(today, -back);
        const story = (ladder: string) => STORIES[key]?.[ladderKeyOf.get(ladder) ?? ""] ?? "steady";
        const painToday = back === 0 && mine.some((p) => story(p.ladderId) === "pain");
        if ((back + a) % 3 !== 0 && !painToday) continue;
        const onRung = mine.filter((p) => p.since <= day);
        if (onRung.length === 0) continue;
        const [log] = await tx
          .insert(logs)
          .values({
            teamId: team.teamId,
            athleteId,
            performedOn: day,
            sessionRpe: 6 + ((back + a) % 3),
            durationMinutes: 45 + ((back * 5 + a * 3) % 20),
            enteredById: team.ownerId,
          })
          .returning({ id: logs.id });
        for (const p of onRung) {
          const kind = story(p.ladderId);
          const progress = Math.min(1, daysBetween(p.since, day) / Math.max(1, daysBetween(p.since, today)));
          const share = kind === "stalled" ? 0.6 : kind === "ready" ? 0.75 + 0.35 * progress : 0.55 + 0.35 * progress;
          const best = Math.max(1, Math.round(p.minValue * (share + 0.05 * wobble(back, a))));
          const pain = kind === "pain" && back === 0;
          await tx.insert(logEntries).values({
            teamId: team.teamId,
            logId: log!.id,
            athleteId,
            ladderId: p.ladderId,
            rungId: p.rungId,
            performedOn: day,
            sets: [{ value: best, rpe: 7 }, { value: Math.max(1, best - 1), rpe: 7 }, { value: Math.max(1, best - 2), rpe: 8 }],
            bestValue: best,
            pain,
            note: pain ? "Sharp twinge in the left wrist on the last set; stopped early." : null,
          });
        }
      }
    }

    // The stored figures the table sorts and filters on, as the engine would have left them.
    for (const p of positions) {
      const key = keyOf.get(p.athleteId);
      const kind = key ? (STORIES[key]?.[ladderKeyOf.get(p.ladderId) ?? ""] ?? "steady") : "steady";
      const [last] = await tx
        .select({ on: max(logEntries.performedOn) })
        .from(logEntries)
        .where(and(eq(logEntries.athleteId, p.athleteId), eq(logEntries.ladderId, p.ladderId)));
      const days = daysBetween(p.since, today);
      const readiness = kind === "ready" ? 100 : kind === "stalled" ? 35 : kind === "pain" ? 40 : Math.min(85, 20 + days * 3);
      await tx
        .update(athletePositions)
        .set({
          readiness,
          status: kind === "ready" ? "pending_approval" : "not_yet",
          lastSessionOn: last?.on ?? null,
          lastPainOn: kind === "pain" ? today : null,
          sessionsMet: kind === "ready" ? 2 : 0,
        })
        .where(eq(athletePositions.id, p.id));
      if (kind !== "ready") continue;
      const [next] = await tx
        .select({ id: rungs.id })
        .from(rungs)
        .where(and(eq(rungs.ladderId, p.ladderId), gt(rungs.position, p.rungPosition)))
        .orderBy(rungs.position)
        .limit(1);
      if (!next) continue;
      await tx.insert(promotions).values({
        teamId: team.teamId,
        athleteId: p.athleteId,
        ladderId: p.ladderId,
        positionId: p.id,
        fromRungId: p.rungId,
        toRungId: next.id,
        status: "pending",
        verdict: { status: "met", readiness: 100, clauses: [], explanation: "2 of 3 sessions met; enough days on the rung; pain-free." },
        effectiveOn: addDays(today, -1),
      });
    }
  },
};
