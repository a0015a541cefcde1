// Small seed factories for integration tests: every call makes fresh, uniquely named rows, so tests
// sharing one worker database never see each other's data.
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { athletes, users } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { loadActor } from "@/lib/server/auth/load-actor";
import { signUp } from "@/lib/server/auth/sign-up";
import { hashPassword } from "@/lib/server/crypto/password";
import { createToken } from "@/lib/server/tokens/create-token";

export const TEST_PASSWORD = "correct horse battery";

export function uniqueEmail(label: string): string {
  return `${label}-${randomUUID().slice(0, 8)}@example.test`;
}

export async function actorOf(userId: string): Promise<Actor> {
  const actor = await loadActor(userId);
  if (!actor) throw new Error(`no actor for ${userId}`);
  return actor;
}

/** A new team and its owner. */
export async function createTeam(options: { timeZone?: string; name?: string } = {}) {
  const email = uniqueEmail("owner");
  const { userId, teamId } = await signUp({
    email,
    password: TEST_PASSWORD,
    name: "Test Owner",
    teamName: options.name ?? `Team ${randomUUID().slice(0, 6)}`,
    timeZone: options.timeZone ?? "Europe/Amsterdam",
  });
  return { teamId, owner: await actorOf(userId), ownerEmail: email };
}

/** Another signed-up person of a team. */
export async function createMember(teamId: string, role: "coach" | "athlete", name = `Test ${role}`) {
  const email = uniqueEmail(role);
  const [user] = await db
    .insert(users)
    .values({ teamId, email, name, role, passwordHash: await hashPassword(TEST_PASSWORD) })
    .returning({ id: users.id });
  if (role === "athlete") {
    await db.insert(athletes).values({ teamId, name, email, userId: user!.id });
  }
  return { actor: await actorOf(user!.id), email };
}

/** An athlete record without a sign-in. */
export async function createAthleteRecord(teamId: string, name = "Record Athlete", primaryCoachId?: string) {
  const [row] = await db.insert(athletes).values({ teamId, name, primaryCoachId }).returning({ id: athletes.id });
  return row!.id;
}

export async function bearerFor(actor: Actor): Promise<string> {
  const { token } = await createToken(actor, { name: "test" });
  return token;
}

export async function userIdByEmail(email: string) {
  const [row] = await db.select({ id: users.id }).from(users).where(eq(users.email, email));
  return row?.id;
}
