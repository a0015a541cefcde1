import "server-only";
import { and, asc, eq, inArray, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { users } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";

/** The owner and coaches of the actor's team, by name. */
export async function listStaff(actor: Actor) {
  const rows = await db
    .select({ id: users.id, name: users.name, role: users.role })
    .from(users)
    .where(and(eq(users.teamId, actor.teamId), inArray(users.role, ["owner", "coach"]), isNull(users.disabledAt)))
    .orderBy(asc(users.name));
  return rows as { id: string; name: string; role: "owner" | "coach" }[];
}
