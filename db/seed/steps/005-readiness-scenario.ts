import { and, eq } from "drizzle-orm";
import { addDays, localDateOf, type SetEntry } from "@/lib/engine";
import { evaluatePosition } from "@/lib/server/promotions/evaluate-position";
import type { Tx } from "../../client";
import { athletePositions, logEntries, logs } from "../../schema";
import { DEMO_CLUB, type DemoAthleteKey } from "../demo-cast";
import { demoTeam } from "../demo-team";
import type { SeedStep } from "../step";

const sets = (count: number, entry: SetEntry): SetEntry[] => Array.from({ length: count }, () => ({ ...entry }));

interface ScenarioSession {
  daysAgo: number;
  sets: SetEntry[];
  pain?: boolean;
  note?: string;
}

/**
 * [athlete, ladder, rung, sessions]: the readiness stories the demo shows. They are the most recent
 * sessions on the rung; a date that already has an entry there (from the history step) is left alone.
 */
const SCENARIO: [DemoAthleteKey, string, string, ScenarioSession[]][] = [
  // Waits for the coach: two good sessions on an approve ladder → one pending proposal.
  [
    "ines",
    "press-to-handstand",
    "straddle-leg-lift",
    [
      { daysAgo: 6, sets: sets(3, { value: 9, rpe: 6 }) },
      { daysAgo: 3, sets: sets(3, { value: 9, rpe: 6 }) },
    ],
  ],
  // Pain in 2 of the last 3 sessions → a step-down proposal, never applied by itself.
  [
    "felix",
    "handstand-push-up",
    "wall-hspu-lowering",
    [
      { daysAgo: 8, sets: sets(3, { value: 5, reps: 3, rpe: 7 }) },
      { daysAgo: 5, sets: sets(3, { value: 5, reps: 3, rpe: 8 }), pain: true, note: "Wrist twinge on the last lowering" },
      { daysAgo: 2, sets: sets(2, { value: 4, reps: 3, rpe: 8 }), pain: true, note: "Same wrist; stopped after two sets" },
    ],
  ],
  // Stalled: weeks of sessions at about 80 % of the standard, none meeting it.
  [
    "sol",
    "l-sit-to-v-sit",
    "high-l-sit",
    [28, 21, 14, 10, 6, 2].map((daysAgo) => ({ daysAgo, sets: sets(3, { value: 8, rpe: 8 }) })),
  ],
  // One session from promotion: one good session, days on the rung already enough.
  ["priya", "l-sit-to-v-sit", "l-sit-floor", [{ daysAgo: 4, sets: sets(3, { value: 16, rpe: 6 }) }]],
];

/** Demo readiness stories, then one evaluation of every demo position so the figures are current. */
export const readinessScenario: SeedStep = {
  name: "005-readiness-scenario",
  async run(tx, { now }) {
    const team = await demoTeam(tx);
    const today = localDateOf(now, DEMO_CLUB.timeZone);
    for (const [athlete, ladder, rung, sessions] of SCENARIO) {
      const athleteId = team.athleteIds[athlete];
      const ladderId = team.ladderIds[ladder];
      if (!athleteId || !ladderId) continue;
      const rungId = team.rungId(ladder, rung);
      for (const session of sessions) {
        const date = addDays(today, -session.daysAgo);
        if (await hasEntryOn(tx, athleteId, rungId, date)) continue;
        await writeSession(tx, { teamId: team.teamId, athleteId, ladderId, rungId, enteredById: team.ownerId }, date, session);
      }
    }

    const positions = await tx
      .select({ id: athletePositions.id })
      .from(athletePositions)
      .where(eq(athletePositions.teamId, team.teamId))
      .orderBy(athletePositions.athleteId, athletePositions.ladderId);
    for (const position of positions) await evaluatePosition(tx, { positionId: position.id, asOf: now, actor: "system" });
  },
};

async function hasEntryOn(tx: Tx, athleteId: string, rungId: string, date: string): Promise<boolean> {
  const [row] = await tx
    .select({ id: logEntries.id })
    .from(logEntries)
    .where(and(eq(logEntries.athleteId, athleteId), eq(logEntries.rungId, rungId), eq(logEntries.performedOn, date)))
    .limit(1);
  return row !== undefined;
}

async function writeSession(
  tx: Tx,
  where: { teamId: string; athleteId: string; ladderId: string; rungId: string; enteredById: string },
  date: string,
  session: ScenarioSession,
) {
  const [log] = await tx
    .insert(logs)
    .values({ teamId: where.teamId, athleteId: where.athleteId, performedOn: date, enteredById: where.enteredById })
    .returning({ id: logs.id });
  const best = Math.max(...session.sets.map((s) => s.value ?? 0));
  await tx.insert(logEntries).values({
    teamId: where.teamId,
    logId: log!.id,
    athleteId: where.athleteId,
    ladderId: where.ladderId,
    rungId: where.rungId,
    performedOn: date,
    sets: session.sets,
    bestValue: best,
    pain: session.pain ?? false,
    note: session.note ?? null,
  });
}
