import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { teams, users } from "@/db/schema";
import { Conflict } from "@/lib/errors";
import { hashPassword } from "@/lib/server/crypto/password";
import { afterTeamCreated } from "@/lib/server/teams/after-team-created";
import type { SignUpInput } from "@/lib/validation/auth";

/** A new team with its time zone, and the person signing up as its owner. */
export async function signUp(input: SignUpInput): Promise<{ userId: string; teamId: string }> {
  const passwordHash = await hashPassword(input.password);
  return db.transaction(async (tx) => {
    const [taken] = await tx.select({ id: users.id }).from(users).where(eq(users.email, input.email));
    if (taken) throw new Conflict("An account with this e-mail address already exists. Sign in instead.");
    const [team] = await tx
      .insert(teams)
      .values({ name: input.teamName, timeZone: input.timeZone })
      .returning({ id: teams.id });
    const [user] = await tx
      .insert(users)
      .values({ teamId: team!.id, email: input.email, name: input.name, role: "owner", passwordHash })
      .returning({ id: users.id });
    await afterTeamCreated(tx, { teamId: team!.id, ownerId: user!.id });
    return { userId: user!.id, teamId: team!.id };
  });
}
