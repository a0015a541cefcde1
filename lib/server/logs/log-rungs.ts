import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import type { Db, Queryable, Tx } from "@/db/client";
import { preparedVariants } from "@/db/prepared";
import { keyOpen, type KeyPlaceholders } from "@/lib/server/http/idempotency";
import { athletePositions, athletes, rungs } from "@/db/schema";
import type { Measure } from "@/lib/engine/types";
import { NotFound, Unprocessable, type FieldIssue } from "@/lib/errors";

export interface LogRung {
  rungId: string;
  ladderId: string;
  measure: Measure;
  /** The athlete's position on the rung's ladder (locked by this transaction). */
  positionId: string;
  /** The athlete's current rung on that ladder: only these count toward promotion. */
  isCurrent: boolean;
}

/** Rungs of the team among `rungIds`, joined to the athlete's positions on their ladders, locked. */
const placedRungs = preparedVariants((database: Db, variant: "always" | "while_key_open") =>
  database
    .select({
      rungId: rungs.id,
      ladderId: rungs.ladderId,
      measure: rungs.measure,
      positionId: athletePositions.id,
      currentRungId: athletePositions.rungId,
    })
    .from(rungs)
    .innerJoin(
      athletePositions,
      and(
        eq(athletePositions.ladderId, rungs.ladderId),
        eq(athletePositions.athleteId, sql.placeholder("athleteId")),
        eq(athletePositions.teamId, sql.placeholder("teamId")),
      ),
    )
    .where(
      and(
        sql`${rungs.id} = any(${sql.placeholder("rungIds")}::uuid[])`,
        eq(rungs.teamId, sql.placeholder("teamId")),
        variant === "while_key_open" ? keyOpen : undefined,
      ),
    )
    .orderBy(asc(athletePositions.ladderId))
    .for("update", { of: athletePositions })
    .prepare(`lock_placed_rungs_${variant}`),
);

/**
 * Locks the athlete's positions on the ladders of these rungs (FOR UPDATE, in ladder-id order, the
 * order every writer uses, so two transactions can never deadlock) and returns the rungs found on
 * those ladders. Read under the lock, `isCurrent` already reflects any concurrent promotion. With
 * an Idempotency-Key, nothing is locked (or returned) unless this request may write under that key
 * (see keyOpen). Submits synchronously, so it can travel in a oneTrip.
 */
export async function lockPlacedRungs(
  tx: Tx,
  teamId: string,
  athleteId: string,
  rungIds: readonly string[],
  key?: KeyPlaceholders,
): Promise<Map<string, LogRung>> {
  const rows = await placedRungs(tx, key === undefined ? "always" : "while_key_open").execute({
    teamId,
    athleteId,
    rungIds: [...new Set(rungIds)],
    ...key,
  });
  return new Map(
    rows.map((r) => [r.rungId, { rungId: r.rungId, ladderId: r.ladderId, measure: r.measure, positionId: r.positionId, isCurrent: r.currentRungId === r.rungId }]),
  );
}

/**
 * The rungs a log names, with the athlete's positions locked. Returns only when every rung lies on
 * a ladder this athlete of this team is placed on, which also proves the athlete is of the team.
 * Otherwise: an athlete of another team is not found (404), so is another team's rung; a rung of a
 * ladder the athlete is not placed on is a 422 at `<path>.N.rungId`. Easier or harder rungs of a
 * placed ladder are accepted (warm-ups, a phone syncing after a move).
 */
export async function logRungsOf(
  tx: Tx,
  teamId: string,
  athleteId: string,
  rungIds: readonly string[],
  path = "entries",
): Promise<LogRung[]> {
  return placedOrThrow(tx, teamId, athleteId, rungIds, await lockPlacedRungs(tx, teamId, athleteId, rungIds), path);
}

/** The rungs in the order named when all were found placed (see logRungsOf); otherwise the error. */
export async function placedOrThrow(
  tx: Tx,
  teamId: string,
  athleteId: string,
  rungIds: readonly string[],
  placed: Map<string, LogRung>,
  path = "entries",
): Promise<LogRung[]> {
  if (rungIds.every((id) => placed.has(id))) return rungIds.map((id) => placed.get(id)!);
  throw await whyNotPlaced(tx, teamId, athleteId, rungIds, placed, path);
}

/** The error for a log naming rungs the athlete cannot log: checked in the order a person reads it. */
async function whyNotPlaced(
  q: Queryable,
  teamId: string,
  athleteId: string,
  rungIds: readonly string[],
  placed: Map<string, LogRung>,
  path: string,
): Promise<Error> {
  const [athlete] = await q
    .select({ id: athletes.id })
    .from(athletes)
    .where(and(eq(athletes.id, athleteId), eq(athletes.teamId, teamId)));
  if (!athlete) return new NotFound("athlete");
  const missing = rungIds.filter((id) => !placed.has(id));
  const known = await q
    .select({ id: rungs.id })
    .from(rungs)
    .where(and(sql`${rungs.id} = any(${sql.param(missing)}::uuid[])`, eq(rungs.teamId, teamId)));
  const ofTeam = new Set(known.map((r) => r.id));
  if (missing.some((id) => !ofTeam.has(id))) return new NotFound("rung");
  const issues: FieldIssue[] = rungIds.flatMap((id, i) =>
    placed.has(id) ? [] : [{ path: `${path}.${i}.rungId`, message: "The athlete is not placed on this rung's ladder." }],
  );
  return new Unprocessable("Some entries name a ladder the athlete is not on.", issues);
}

/** The distinct positions holding a logged rung as their current one, for evaluateAfterLog. */
export function currentPositions(list: readonly LogRung[]): string[] {
  return [...new Set(list.filter((r) => r.isCurrent).map((r) => r.positionId))];
}
