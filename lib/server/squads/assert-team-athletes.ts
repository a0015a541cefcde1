import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { athletes } from "@/db/schema";
import { invalidField } from "@/lib/errors";

/** Every id must be an athlete of the team; the first one that is not is named by its index (422). */
export async function assertTeamAthletes(q: Queryable, teamId: string, athleteIds: readonly string[], path: string) {
  if (athleteIds.length === 0) return;
  const found = await q
    .select({ id: athletes.id })
    .from(athletes)
    .where(and(eq(athletes.teamId, teamId), inArray(athletes.id, [...athleteIds])));
  const known = new Set(found.map((row) => row.id));
  const missing = athleteIds.findIndex((id) => !known.has(id));
  if (missing >= 0) throw invalidField(`${path}.${missing}`, "No athlete with this id in your team.");
}
