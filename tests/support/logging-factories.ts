// Factories for logging tests: place athletes on starter rungs and post logs through the handler.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { POST as postLog } from "@/app/api/v1/logs/route";
import { db } from "@/db/client";
import { ladders, rungs } from "@/db/schema";
import { writePlacement } from "@/lib/server/positions/write-placement";
import { call } from "./http";

/** A starter rung of the team by ladder and rung key, with its ladder and measure. */
export async function starterRung(teamId: string, ladderKey: string, rungKey: string) {
  const [row] = await db
    .select({ rungId: rungs.id, ladderId: rungs.ladderId, measure: rungs.measure })
    .from(rungs)
    .innerJoin(ladders, eq(ladders.id, rungs.ladderId))
    .where(and(eq(rungs.teamId, teamId), eq(ladders.starterKey, ladderKey), eq(rungs.starterKey, rungKey)));
  if (!row) throw new Error(`no starter rung ${ladderKey}/${rungKey}`);
  return row;
}

/** Places an athlete on a starter rung (since a date, default long ago) and returns the rung. */
export async function placeOn(
  teamId: string,
  athleteId: string,
  ladderKey: string,
  rungKey: string,
  since = "2020-01-01",
) {
  const rung = await starterRung(teamId, ladderKey, rungKey);
  await db.transaction((tx) =>
    writePlacement(tx, { teamId, athleteId, ladderId: rung.ladderId, rungId: rung.rungId, since, actorUserId: null }),
  );
  return rung;
}

export function newKey(): string {
  return `test-${randomUUID()}`;
}

export function postLogAs(token: string, json: unknown, key: string | null = newKey()) {
  return call(postLog, {
    method: "POST",
    path: "/api/v1/logs",
    token,
    json,
    headers: key ? { "idempotency-key": key } : {},
  });
}
