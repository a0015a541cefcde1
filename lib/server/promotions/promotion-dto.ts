import "server-only";
import { eq, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { Queryable } from "@/db/client";
import { athletes, ladders, promotions, rungs, users } from "@/db/schema";
import type { PromotionDto } from "@/lib/validation/promotions";

const fromRung = alias(rungs, "from_rung");
const toRung = alias(rungs, "to_rung");
const decider = alias(users, "decider");

/** Promotions with the names the API shows, explicit columns only. */
export function selectPromotions(q: Queryable) {
  return q
    .select({
      id: promotions.id,
      athleteId: promotions.athleteId,
      athleteName: athletes.name,
      ladderId: promotions.ladderId,
      ladderName: ladders.name,
      fromRungId: promotions.fromRungId,
      fromRungName: fromRung.name,
      toRungId: promotions.toRungId,
      toRungName: toRung.name,
      direction: promotions.direction,
      status: promotions.status,
      explanation: sql<string | null>`${promotions.verdict}->>'explanation'`,
      readiness: sql<number | null>`(${promotions.verdict}->>'readiness')::int`,
      effectiveOn: promotions.effectiveOn,
      // Text keeps the microseconds, so keyset cursors compare exactly.
      createdAt: sql<string>`${promotions.createdAt}::text`,
      createdAtIso: promotions.createdAt,
      decidedAt: promotions.decidedAt,
      decidedBy: decider.name,
    })
    .from(promotions)
    .innerJoin(athletes, eq(athletes.id, promotions.athleteId))
    .innerJoin(ladders, eq(ladders.id, promotions.ladderId))
    .innerJoin(fromRung, eq(fromRung.id, promotions.fromRungId))
    .leftJoin(toRung, eq(toRung.id, promotions.toRungId))
    .leftJoin(decider, eq(decider.id, promotions.decidedById));
}

type Row = Awaited<ReturnType<typeof selectPromotions>>[number];

export function toPromotionDto(row: Row): PromotionDto {
  return {
    id: row.id,
    athlete: { id: row.athleteId, name: row.athleteName },
    ladder: { id: row.ladderId, name: row.ladderName },
    fromRung: { id: row.fromRungId, name: row.fromRungName },
    toRung: row.toRungId ? { id: row.toRungId, name: row.toRungName ?? "" } : null,
    direction: row.direction,
    status: row.status,
    explanation: row.explanation ?? "",
    readiness: row.readiness ?? 0,
    effectiveOn: row.effectiveOn,
    createdAt: row.createdAtIso.toISOString(),
    decidedAt: row.decidedAt ? row.decidedAt.toISOString() : null,
    decidedBy: row.decidedBy,
  };
}
