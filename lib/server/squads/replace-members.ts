import "server-only";
import { and, eq } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { squadMembers } from "@/db/schema";
import { assertTeamAthletes } from "./assert-team-athletes";

/** Makes `athleteIds` the squad's whole member list (inside the caller's transaction). */
export async function replaceMembers(tx: Tx, teamId: string, squadId: string, athleteIds: readonly string[]) {
  await assertTeamAthletes(tx, teamId, athleteIds, "athleteIds");
  await tx.delete(squadMembers).where(and(eq(squadMembers.squadId, squadId), eq(squadMembers.teamId, teamId)));
  if (athleteIds.length > 0) {
    await tx.insert(squadMembers).values(athleteIds.map((athleteId) => ({ teamId, squadId, athleteId })));
  }
}
