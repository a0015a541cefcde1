import "server-only";
import { and, asc, eq, inArray } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { athletes, squadMembers, squads } from "@/db/schema";
import type { SquadDto } from "@/lib/validation/squads";

export const squadColumns = {
  id: squads.id,
  name: squads.name,
  description: squads.description,
  createdAt: squads.createdAt,
};

type SquadRow = { id: string; name: string; description: string | null; createdAt: Date };

/** Squad rows of one team with their members (by name), in the rows' order. */
export async function withMembers(q: Queryable, teamId: string, rows: SquadRow[]): Promise<SquadDto[]> {
  if (rows.length === 0) return [];
  const members = await q
    .select({ squadId: squadMembers.squadId, id: athletes.id, name: athletes.name })
    .from(squadMembers)
    .innerJoin(athletes, and(eq(athletes.id, squadMembers.athleteId), eq(athletes.teamId, teamId)))
    .where(and(eq(squadMembers.teamId, teamId), inArray(squadMembers.squadId, rows.map((r) => r.id))))
    .orderBy(asc(athletes.name), asc(athletes.id));
  return rows.map((row) => {
    const own = members.filter((m) => m.squadId === row.id).map(({ id, name }) => ({ id, name }));
    return {
      id: row.id,
      name: row.name,
      description: row.description,
      memberCount: own.length,
      members: own,
      createdAt: row.createdAt.toISOString(),
    };
  });
}
