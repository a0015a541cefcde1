// Factories for the review screens' tests: ladders, placements, logs and promotions written straight
// with drizzle, so each test sets up exactly the figures it checks.
import { randomUUID } from "node:crypto";
import { db } from "@/db/client";
import { athletePositions, ladders, logEntries, logs, positionMoves, promotions, rungs, squadMembers, squads, standards } from "@/db/schema";

/** A ladder with `rungCount` hold rungs (positions 1..n), each with a 3 × 20 s standard. */
export async function createLadder(teamId: string, name = `Ladder ${randomUUID().slice(0, 6)}`, rungCount = 3) {
  const [ladder] = await db.insert(ladders).values({ teamId, name, targetSkill: name }).returning({ id: ladders.id });
  const rungIds: string[] = [];
  for (let position = 1; position <= rungCount; position += 1) {
    const [rung] = await db
      .insert(rungs)
      .values({ teamId, ladderId: ladder!.id, position, name: `${name} rung ${position}`, measure: "hold_seconds" })
      .returning({ id: rungs.id });
    await db.insert(standards).values({
      rungId: rung!.id,
      teamId,
      sets: 3,
      minValue: 20,
      maxRpe: 7,
      sessionsRequired: 2,
      sessionsWindow: 3,
      minDaysOnRung: 7,
    });
    rungIds.push(rung!.id);
  }
  return { ladderId: ladder!.id, rungIds };
}

export interface PlaceOptions {
  since: string;
  readiness?: number;
  status?: "not_yet" | "met" | "blocked" | "step_down" | "pending_approval" | "achieved";
  lastSessionOn?: string | null;
  lastPainOn?: string | null;
}

/** Puts an athlete on a rung with the stored figures given, plus the placement audit row. */
export async function placeAthlete(teamId: string, athleteId: string, ladderId: string, rungId: string, options: PlaceOptions) {
  const [row] = await db
    .insert(athletePositions)
    .values({
      teamId,
      athleteId,
      ladderId,
      rungId,
      since: options.since,
      readiness: options.readiness ?? 0,
      status: options.status ?? "not_yet",
      lastSessionOn: options.lastSessionOn ?? null,
      lastPainOn: options.lastPainOn ?? null,
    })
    .returning({ id: athletePositions.id });
  await db.insert(positionMoves).values({
    teamId,
    athleteId,
    ladderId,
    toRungId: rungId,
    cause: "placement",
    actorKind: "system",
    effectiveOn: options.since,
  });
  return row!.id;
}

export interface EntryInput {
  ladderId: string;
  rungId: string;
  best?: number | null;
  pain?: boolean;
  note?: string | null;
}

/** One log on a date, with an optional session RPE × minutes and rung entries. */
export async function logSession(
  teamId: string,
  athleteId: string,
  performedOn: string,
  options: { sessionRpe?: number; durationMinutes?: number; entries?: EntryInput[] } = {},
) {
  const [log] = await db
    .insert(logs)
    .values({ teamId, athleteId, performedOn, sessionRpe: options.sessionRpe ?? null, durationMinutes: options.durationMinutes ?? null })
    .returning({ id: logs.id });
  for (const entry of options.entries ?? []) {
    const best = entry.best ?? null;
    await db.insert(logEntries).values({
      teamId,
      logId: log!.id,
      athleteId,
      ladderId: entry.ladderId,
      rungId: entry.rungId,
      performedOn,
      sets: best === null ? [] : [{ value: best }],
      bestValue: best,
      pain: entry.pain ?? false,
      note: entry.note ?? null,
    });
  }
  return log!.id;
}

interface PromotionInput {
  teamId: string;
  athleteId: string;
  ladderId: string;
  positionId: string;
  fromRungId: string;
  toRungId: string;
  effectiveOn: string;
}

/** A proposal waiting for a coach. */
export async function pendingPromotion(input: PromotionInput) {
  const [row] = await db
    .insert(promotions)
    .values({ ...input, status: "pending", verdict: { status: "met" } })
    .returning({ id: promotions.id });
  return row!.id;
}

/** A move up already applied by the engine, with its audit row. */
export async function appliedPromotion(input: PromotionInput) {
  const [row] = await db.insert(promotions).values({ ...input, status: "auto", verdict: { status: "met" } }).returning({ id: promotions.id });
  await db.insert(positionMoves).values({
    teamId: input.teamId,
    athleteId: input.athleteId,
    ladderId: input.ladderId,
    fromRungId: input.fromRungId,
    toRungId: input.toRungId,
    cause: "auto",
    actorKind: "engine",
    promotionId: row!.id,
    effectiveOn: input.effectiveOn,
  });
  return row!.id;
}

export async function createSquad(teamId: string, athleteIds: string[], name = `Squad ${randomUUID().slice(0, 6)}`) {
  const [squad] = await db.insert(squads).values({ teamId, name }).returning({ id: squads.id });
  for (const athleteId of athleteIds) await db.insert(squadMembers).values({ teamId, squadId: squad!.id, athleteId });
  return squad!.id;
}
