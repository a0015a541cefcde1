import "server-only";
import { and, desc, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { apiTokens } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";

/** The actor's own live tokens (never the hash). */
export async function listTokens(actor: Actor) {
  const rows = await db
    .select({
      id: apiTokens.id,
      name: apiTokens.name,
      prefix: apiTokens.prefix,
      lastUsedAt: apiTokens.lastUsedAt,
      createdAt: apiTokens.createdAt,
    })
    .from(apiTokens)
    .where(and(eq(apiTokens.userId, actor.userId), eq(apiTokens.teamId, actor.teamId), isNull(apiTokens.revokedAt)))
    .orderBy(desc(apiTokens.createdAt));
  return {
    items: rows.map((r) => ({
      ...r,
      lastUsedAt: r.lastUsedAt?.toISOString() ?? null,
      createdAt: r.createdAt.toISOString(),
    })),
    nextCursor: null,
  };
}
