import { and, eq } from "drizzle-orm";
import { addDays, daysBetween } from "@/lib/engine/calendar-date";
import { localDateOf } from "@/lib/engine/local-date";
import { isEachSide } from "@/lib/engine/set-value";
import { sessionBest } from "@/lib/engine/session-assessment";
import type { Measure, SetEntry } from "@/lib/engine/types";
import type { Tx } from "../../client";
import { athletePositions, athletes, logEntries, logs, rungs, standards } from "../../schema";
import { DEMO_ATHLETES, DEMO_CLUB, type DemoAthleteKey } from "../demo-cast";
import { demoTeam } from "../demo-team";
import type { SeedStep } from "../step";

const HISTORY_DAYS = 42;

/**
 * How each athlete's last six weeks went, as a share of the current rung's target per session:
 * `(sessionIndexFromOldest, sessionsOnRung) => share`. Values before `since` are logged on the rung
 * below (the athlete's previous rung), at the level that got them promoted.
 */
type Story = { share: (i: number, n: number) => number; painDaysAgo?: number[]; skip?: number };
const STORIES: Record<DemoAthleteKey, Story> = {
  // One session from promotion: the latest session met the standard, the two before fell just short.
  jonas: { share: (i, n) => (i === n - 1 ? 1.1 : i >= n - 3 ? 0.92 : 0.75 + (0.15 * i) / Math.max(1, n)) },
  // Steady on the rung, then a pain flag last week.
  amara: { share: (i, n) => 0.7 + (0.2 * i) / Math.max(1, n), painDaysAgo: [5] },
  // Stalled: the same two-thirds of the target for over four weeks.
  felix: { share: (i) => 0.66 + (i % 2 === 0 ? 0.02 : -0.02) },
  // Improving steadily toward the target.
  sol: { share: (i, n) => 0.6 + (0.35 * (i + 1)) / Math.max(1, n) },
  priya: { share: (i, n) => 0.65 + (0.25 * i) / Math.max(1, n) },
  ines: { share: (i, n) => 0.7 + (0.2 * i) / Math.max(1, n), skip: 2 },
  hugo: { share: (i, n) => 0.7 + (0.2 * i) / Math.max(1, n) },
  lotte: { share: (i, n) => 0.75 + (0.15 * i) / Math.max(1, n) },
};

interface RungFacts {
  id: string;
  ladderId: string;
  position: number;
  measure: Measure;
  sets: number;
  minValue: number;
  minReps: number | null;
  maxRpe: number | null;
  minRir: number | null;
}

/** Whole reps and whole seconds, at least 1. */
function round(value: number): number {
  return Math.max(1, Math.round(value));
}

/** The sets of one session at a share of the target, with effort on the rung's scale. */
function setsAt(rung: RungFacts, share: number, hard: boolean): SetEntry[] {
  const out: SetEntry[] = [];
  for (let s = 0; s < rung.sets; s += 1) {
    const fade = 1 - s * 0.04; // later sets a little weaker (common practice, no source)
    const amount = round(rung.minValue * share * fade);
    const set: SetEntry = isEachSide(rung.measure) ? { left: amount, right: round(amount * 0.95) } : { value: amount };
    if (rung.measure === "eccentric_seconds") set.reps = rung.minReps ?? 3;
    if (rung.minRir !== null) set.rir = hard ? Math.max(0, rung.minRir - 1) : rung.minRir + (share >= 1 ? 0 : 1);
    else set.rpe = hard ? Math.min(10, (rung.maxRpe ?? 7) + 1.5) : Math.min(rung.maxRpe ?? 7, 7);
    out.push(set);
  }
  return out;
}

async function rungFacts(tx: Tx, teamId: string): Promise<RungFacts[]> {
  return tx
    .select({
      id: rungs.id,
      ladderId: rungs.ladderId,
      position: rungs.position,
      measure: rungs.measure,
      sets: standards.sets,
      minValue: standards.minValue,
      minReps: standards.minReps,
      maxRpe: standards.maxRpe,
      minRir: standards.minRir,
    })
    .from(rungs)
    .innerJoin(standards, eq(standards.rungId, rungs.id))
    .where(eq(rungs.teamId, teamId));
}

/** About six weeks of logs for the demo athletes, ending yesterday in the club's zone. */
export const trainingHistory: SeedStep = {
  name: "004-training-history",
  async run(tx, { now }) {
    const team = await demoTeam(tx);
    const today = localDateOf(now, DEMO_CLUB.timeZone);
    const facts = await rungFacts(tx, team.teamId);
    const people = await tx
      .select({ id: athletes.id, userId: athletes.userId, coachId: athletes.primaryCoachId })
      .from(athletes)
      .where(eq(athletes.teamId, team.teamId));

    for (const [index, cast] of DEMO_ATHLETES.entries()) {
      const athleteId = team.athleteIds[cast.key];
      const person = people.find((p) => p.id === athleteId);
      if (!athleteId || !person) continue;
      const story = STORIES[cast.key];
      const positions = await tx
        .select({ ladderId: athletePositions.ladderId, rungId: athletePositions.rungId, since: athletePositions.since })
        .from(athletePositions)
        .where(and(eq(athletePositions.teamId, team.teamId), eq(athletePositions.athleteId, athleteId)));
      // Three training days a week, on a weekly rhythm of its own per athlete.
      const days: string[] = [];
      for (let d = HISTORY_DAYS; d >= 1; d -= 1) {
        const dayIndex = (d + index) % 7;
        if ((dayIndex === 0 || dayIndex === 2 || dayIndex === 4) && !(story.skip && d % (7 * story.skip) < 3)) days.push(addDays(today, -d));
      }
      // A pain flag lands on the training day nearest each story date.
      const painDates = (story.painDaysAgo ?? []).map((ago) =>
        days.reduce((best, d) => (Math.abs(daysBetween(d, today) - ago) < Math.abs(daysBetween(best, today) - ago) ? d : best), days[0]!),
      );
      for (const [dayNo, date] of days.entries()) {
        const [log] = await tx
          .insert(logs)
          .values({
            teamId: team.teamId,
            athleteId,
            performedOn: date,
            durationMinutes: 40 + ((dayNo * 7 + index * 3) % 25),
            sessionRpe: 6 + ((dayNo + index) % 3),
            enteredById: person.userId ?? person.coachId,
          })
          .returning({ id: logs.id });
        for (const position of positions) {
          const current = facts.find((f) => f.id === position.rungId);
          if (!current) continue;
          const onCurrent = date >= position.since;
          const rung = onCurrent ? current : facts.find((f) => f.ladderId === current.ladderId && f.position === current.position - 1);
          if (!rung) continue;
          const sessionsOnRung = days.filter((d) => d >= position.since).length;
          const i = days.filter((d) => d >= position.since && d < date).length;
          const share = onCurrent ? story.share(i, sessionsOnRung) : 1.05;
          const pain = onCurrent && painDates.includes(date);
          const sets = setsAt(rung, share, pain);
          await tx.insert(logEntries).values({
            teamId: team.teamId,
            logId: log!.id,
            athleteId,
            ladderId: rung.ladderId,
            rungId: rung.id,
            performedOn: date,
            sets,
            bestValue: sessionBest(rung.measure, { date, sets, pain }),
            pain,
            note: pain ? "Sharp twinge in the left wrist on the last set; stopped there." : null,
          });
        }
      }
    }
  },
};
