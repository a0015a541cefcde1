// Factories for readiness tests: a small ladder with standards, placements, and logged sessions
// written straight into logs + log_entries (the logging API is tested on its own).
import { randomUUID } from "node:crypto";
import { db, type Queryable, type Tx } from "@/db/client";
import { ladders, logEntries, logs, rungPrerequisites, rungs, standards } from "@/db/schema";
import { addDays, defaultStandard, localDateOf, type Measure, type SetEntry, type Standard } from "@/lib/engine";
import type { Actor } from "@/lib/server/actor";
import { writePlacement } from "@/lib/server/positions/write-placement";
import { currentPositions, lockPlacedRungs } from "@/lib/server/logs/log-rungs";
import { evaluateAfterLog } from "@/lib/server/promotions/evaluate-after-log";

export const TEST_ZONE = "Europe/Amsterdam";

/** Today in the test teams' zone, and a date n days from it. */
export function today(asOf: Date = new Date()): string {
  return localDateOf(asOf, TEST_ZONE);
}
export function daysAgo(n: number, asOf: Date = new Date()): string {
  return addDays(today(asOf), -n);
}

/** Three sets of 25 s at RPE 6: meets the default hold standard (3 × ≥ 20 s at RPE ≤ 7). */
export const GOOD_SETS: SetEntry[] = [
  { value: 25, rpe: 6 },
  { value: 25, rpe: 6 },
  { value: 25, rpe: 6 },
];
/** Three sets of 10 s: well short of 20 s (and under 70 % of it). */
export const WEAK_SETS: SetEntry[] = [
  { value: 10, rpe: 8 },
  { value: 10, rpe: 8 },
  { value: 10, rpe: 8 },
];

export interface TestLadder {
  ladderId: string;
  rungIds: string[];
}

/** A ladder of `rungCount` hold rungs, each with the default standard plus `standard` overrides. */
export async function createTestLadder(
  teamId: string,
  options: { mode?: "auto" | "approve"; rungCount?: number; standard?: Partial<Standard>; measure?: Measure; name?: string } = {},
): Promise<TestLadder> {
  const measure = options.measure ?? "hold_seconds";
  const [ladder] = await db
    .insert(ladders)
    .values({
      teamId,
      name: options.name ?? `Test ladder ${randomUUID().slice(0, 6)}`,
      targetSkill: "Test skill",
      promotionMode: options.mode ?? "auto",
    })
    .returning({ id: ladders.id });
  const rows = await db
    .insert(rungs)
    .values(
      Array.from({ length: options.rungCount ?? 3 }, (_, i) => ({
        teamId,
        ladderId: ladder!.id,
        position: i + 1,
        name: `Rung ${i + 1}`,
        measure,
      })),
    )
    .returning({ id: rungs.id, position: rungs.position });
  const rungIds = rows.sort((a, b) => a.position - b.position).map((r) => r.id);
  const standard = { ...defaultStandard(measure), ...options.standard };
  await db.insert(standards).values(
    rungIds.map((rungId) => ({
      rungId,
      teamId,
      ...standard,
      minReps: standard.minReps ?? null,
      maxRpe: standard.maxRpe ?? null,
      minRir: standard.minRir ?? null,
      stepDown: standard.stepDown ?? null,
    })),
  );
  return { ladderId: ladder!.id, rungIds };
}

export async function addPrerequisite(teamId: string, rungId: string, requiresRungId: string) {
  await db.insert(rungPrerequisites).values({ teamId, rungId, requiresRungId });
}

/** Places an athlete on a rung since a date (writes the placement audit row); returns the position id. */
export async function placeAthlete(
  teamId: string,
  athleteId: string,
  ladder: { ladderId: string },
  rungId: string,
  since: string,
  actorUserId: string | null = null,
): Promise<string> {
  const { positionId } = await db.transaction((tx) =>
    writePlacement(tx, { teamId, athleteId, ladderId: ladder.ladderId, rungId, since, actorUserId }),
  );
  return positionId;
}

export interface LoggedSession {
  teamId: string;
  athleteId: string;
  ladderId: string;
  rungId: string;
  date: string;
  sets?: SetEntry[];
  pain?: boolean;
}

/** One log with one entry, written directly. */
export async function insertSession(q: Queryable, s: LoggedSession): Promise<string> {
  const sets = s.sets ?? GOOD_SETS;
  const [log] = await q
    .insert(logs)
    .values({ teamId: s.teamId, athleteId: s.athleteId, performedOn: s.date })
    .returning({ id: logs.id });
  await q.insert(logEntries).values({
    teamId: s.teamId,
    logId: log!.id,
    athleteId: s.athleteId,
    ladderId: s.ladderId,
    rungId: s.rungId,
    performedOn: s.date,
    sets,
    bestValue: Math.max(...sets.map((x) => x.value ?? 0)),
    pain: s.pain ?? false,
  });
  return log!.id;
}

/**
 * What the logging API does, through its own pieces: lock the athlete's position while reading the
 * rung, write the session, then evaluate the position if the rung is (still) its current one.
 */
export async function logAndEvaluate(actor: Actor, s: LoggedSession, asOf: Date = new Date()) {
  return db.transaction(async (tx: Tx) => {
    const placed = await lockPlacedRungs(tx, s.teamId, s.athleteId, [s.rungId]);
    const logId = await insertSession(tx, s);
    return evaluateAfterLog(tx, actor, { positionIds: currentPositions([...placed.values()]), logId }, asOf);
  });
}
