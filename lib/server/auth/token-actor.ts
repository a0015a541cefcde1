import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { apiTokens } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { hashToken, tokenMatches } from "@/lib/server/crypto/secret-token";
import { loadActor } from "./load-actor";

/** The actor behind a Bearer token, or null when the token is unknown or revoked. */
export async function actorFromApiToken(token: string): Promise<Actor | null> {
  const [row] = await db
    .select({ id: apiTokens.id, userId: apiTokens.userId, tokenHash: apiTokens.tokenHash })
    .from(apiTokens)
    .where(and(eq(apiTokens.tokenHash, hashToken(token)), isNull(apiTokens.revokedAt)));
  if (!row || !tokenMatches(token, row.tokenHash)) return null;
  const actor = await loadActor(row.userId);
  if (!actor) return null;
  // Best effort, off the response path's critical section: a failed stamp must not fail the request.
  void db
    .update(apiTokens)
    .set({ lastUsedAt: new Date() })
    .where(eq(apiTokens.id, row.id))
    .catch(() => undefined);
  return actor;
}
