import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { athletes } from "@/db/schema";
import { invalidField, NotFound } from "@/lib/errors";
import { isStaff } from "@/lib/permissions";
import type { Actor } from "@/lib/server/actor";
import { visibleAthletes } from "@/lib/server/athletes/athlete-scope";

/**
 * The athlete a new upload is for, row-locked so two uploads cannot both squeeze under the quota.
 * Athletes upload for themselves; staff name an active athlete of their team.
 */
export async function lockUploadAthlete(tx: Tx, actor: Actor, requested: string | undefined): Promise<string> {
  const athleteId = requested ?? (isStaff(actor.role) ? undefined : actor.athleteId);
  if (!athleteId) {
    if (isStaff(actor.role)) throw invalidField("athleteId", "Choose the athlete this form check is for.");
    throw new NotFound("athlete");
  }
  const [row] = await tx
    .select({ id: athletes.id })
    .from(athletes)
    .where(and(eq(athletes.id, athleteId), visibleAthletes(actor), isNull(athletes.archivedAt)))
    .for("update");
  if (!row) throw new NotFound("athlete");
  return row.id;
}
