import "server-only";
import { and, eq, ne } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { athletes } from "@/db/schema";
import { Conflict } from "@/lib/errors";

/** Two athlete records of one team cannot share an e-mail address (invites would be ambiguous). */
export async function assertEmailFree(q: Queryable, teamId: string, email: string, exceptId?: string) {
  const [taken] = await q
    .select({ id: athletes.id })
    .from(athletes)
    .where(and(eq(athletes.teamId, teamId), eq(athletes.email, email), exceptId ? ne(athletes.id, exceptId) : undefined));
  if (taken) throw new Conflict("Another athlete of this team already uses that e-mail address.");
}
