import "server-only";
import { and, eq, gt, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { athletes, invites, teams } from "@/db/schema";
import { hashToken } from "@/lib/server/crypto/secret-token";

/** What the accept page shows for a live invite token; null when unknown, used or expired. */
export async function findInvite(token: string) {
  const [row] = await db
    .select({
      id: invites.id,
      email: invites.email,
      role: invites.role,
      teamName: teams.name,
      athleteName: athletes.name,
    })
    .from(invites)
    .innerJoin(teams, eq(teams.id, invites.teamId))
    .leftJoin(athletes, eq(athletes.id, invites.athleteId))
    .where(and(eq(invites.tokenHash, hashToken(token)), isNull(invites.acceptedAt), gt(invites.expiresAt, new Date())));
  return row ?? null;
}
