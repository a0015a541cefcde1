import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { cache } from "react";
import { db } from "@/db/client";
import { athletes, teams, users } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";

/**
 * The actor behind a user id, read fresh from the database (once per request) so a role change or a
 * disabled account takes effect at once. Null when the user is gone or disabled.
 */
export const loadActor = cache(async (userId: string): Promise<Actor | null> => {
  const [row] = await db
    .select({
      userId: users.id,
      teamId: users.teamId,
      role: users.role,
      name: users.name,
      email: users.email,
      timeZone: teams.timeZone,
      athleteId: athletes.id,
    })
    .from(users)
    .innerJoin(teams, eq(teams.id, users.teamId))
    .leftJoin(athletes, and(eq(athletes.userId, users.id), eq(athletes.teamId, users.teamId)))
    .where(and(eq(users.id, userId), isNull(users.disabledAt)))
    .prepare("actor_by_user")
    .execute();
  return row ?? null;
});
