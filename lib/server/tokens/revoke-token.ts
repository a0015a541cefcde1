import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { apiTokens } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";

/** Revokes one of the actor's own tokens; it stops working on the next request. */
export async function revokeToken(actor: Actor, tokenId: string): Promise<void> {
  const revoked = await db
    .update(apiTokens)
    .set({ revokedAt: new Date() })
    .where(and(eq(apiTokens.id, tokenId), eq(apiTokens.userId, actor.userId), isNull(apiTokens.revokedAt)))
    .returning({ id: apiTokens.id });
  if (revoked.length === 0) throw new NotFound("token");
}
