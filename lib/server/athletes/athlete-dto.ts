import "server-only";
import { and, eq, gt, isNull, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { Queryable } from "@/db/client";
import { athletes, invites, users } from "@/db/schema";
import type { AthleteDto } from "@/lib/validation/athletes";

const coach = alias(users, "coach");

/** The columns an athlete DTO needs, joined once; never the linked account's secrets. */
export function selectAthletes(q: Queryable) {
  return q
    .select({
      id: athletes.id,
      name: athletes.name,
      email: athletes.email,
      primaryCoachId: athletes.primaryCoachId,
      primaryCoachName: coach.name,
      hasAccount: sql<boolean>`${athletes.userId} is not null`,
      invitePending: sql<boolean>`exists (select 1 from ${invites} where ${and(
        eq(invites.athleteId, athletes.id),
        isNull(invites.acceptedAt),
        gt(invites.expiresAt, sql`now()`),
      )})`,
      notes: athletes.notes,
      archivedAt: athletes.archivedAt,
      createdAt: athletes.createdAt,
    })
    .from(athletes)
    .leftJoin(coach, eq(coach.id, athletes.primaryCoachId));
}

type AthleteRow = Awaited<ReturnType<ReturnType<typeof selectAthletes>["execute"]>>[number];

export function toAthleteDto(row: AthleteRow): AthleteDto {
  return {
    id: row.id,
    name: row.name,
    email: row.email,
    primaryCoachId: row.primaryCoachId,
    primaryCoachName: row.primaryCoachName,
    hasAccount: row.hasAccount,
    invitePending: row.invitePending,
    notes: row.notes,
    archived: row.archivedAt !== null,
    createdAt: row.createdAt.toISOString(),
  };
}
