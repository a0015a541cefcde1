import "server-only";
import { and, eq, isNull, sql } from "drizzle-orm";
import { db, type Db } from "@/db/client";
import { preparedOnce } from "@/db/prepared";
import { apiTokens, athletes, teams, users } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { hashToken, tokenMatches } from "@/lib/server/crypto/secret-token";

/** "Last used" is a hint for people, not an audit trail: stamping it once a minute keeps writes off hot paths. */
const LAST_USED_RESOLUTION_MS = 60_000;

const actorByToken = preparedOnce((database: Db) =>
  database
    .select({
      tokenId: apiTokens.id,
      tokenHash: apiTokens.tokenHash,
      lastUsedAt: apiTokens.lastUsedAt,
      userId: users.id,
      teamId: users.teamId,
      role: users.role,
      name: users.name,
      email: users.email,
      timeZone: teams.timeZone,
      athleteId: athletes.id,
    })
    .from(apiTokens)
    .innerJoin(users, and(eq(users.id, apiTokens.userId), isNull(users.disabledAt)))
    .innerJoin(teams, eq(teams.id, users.teamId))
    .leftJoin(athletes, and(eq(athletes.userId, users.id), eq(athletes.teamId, users.teamId)))
    .where(and(eq(apiTokens.tokenHash, sql.placeholder("tokenHash")), isNull(apiTokens.revokedAt)))
    .prepare("actor_by_token"),
);

/**
 * The actor behind a Bearer token, or null when the token is unknown, revoked, or its user is
 * disabled. One query: token, user, team and linked athlete together (read fresh per request, so
 * a role change or a disabled account takes effect at once).
 */
export async function actorFromApiToken(token: string): Promise<Actor | null> {
  const [row] = await actorByToken(db).execute({ tokenHash: hashToken(token) });
  if (!row || !tokenMatches(token, row.tokenHash)) return null;
  if (!row.lastUsedAt || Date.now() - row.lastUsedAt.getTime() > LAST_USED_RESOLUTION_MS) {
    // Best effort, off the response path: a failed stamp must not fail the request.
    void db
      .update(apiTokens)
      .set({ lastUsedAt: new Date() })
      .where(eq(apiTokens.id, row.tokenId))
      .catch(() => undefined);
  }
  const { tokenId: _tokenId, tokenHash: _tokenHash, lastUsedAt: _lastUsedAt, ...actor } = row;
  return actor;
}
