import "server-only";
import { and, eq, isNull, sql, type SQL } from "drizzle-orm";
import { db, type Db, type Queryable } from "@/db/client";
import { preparedVariants } from "@/db/prepared";
import { apiTokens, athletes, teams, users } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { hashToken, tokenMatches } from "@/lib/server/crypto/secret-token";
import { forgetToken, provisionalActor, recentToken, rememberToken, StaleActor } from "./recent-token-actors";

/** "Last used" is a hint for people, not an audit trail: stamping it once a minute keeps writes off hot paths. */
const LAST_USED_RESOLUTION_MS = 60_000;

/** A live token (not revoked, user not disabled) with its user, team and linked athlete. */
function tokenActorQuery(database: Db, by: "hash" | "id") {
  const token: SQL = by === "hash" ? eq(apiTokens.tokenHash, sql.placeholder("tokenHash")) : eq(apiTokens.id, sql.placeholder("tokenId"));
  return database
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
    .where(and(token, isNull(apiTokens.revokedAt)))
    .prepare(`actor_by_token_${by}`);
}

const actorByToken = preparedVariants(tokenActorQuery);

type Row = Awaited<ReturnType<ReturnType<typeof tokenActorQuery>["execute"]>>[number];

function actorOf(row: Row): Actor {
  const { tokenId: _tokenId, tokenHash: _tokenHash, lastUsedAt: _lastUsedAt, ...actor } = row;
  return actor;
}

/** Stamps "last used" at most once a minute; returns the stamp kept for the token. */
function stampLastUsed(tokenId: string, lastUsedAt: Date | null): Date | null {
  if (lastUsedAt && Date.now() - lastUsedAt.getTime() <= LAST_USED_RESOLUTION_MS) return lastUsedAt;
  // Best effort, off the response path: a failed stamp must not fail the request.
  void db
    .update(apiTokens)
    .set({ lastUsedAt: new Date() })
    .where(eq(apiTokens.id, tokenId))
    .catch(() => undefined);
  return new Date();
}

/**
 * The actor behind a Bearer token, or null when the token is unknown, revoked, or its user is
 * disabled. One query: token, user, team and linked athlete together (read fresh per request, so
 * a role change or a disabled account takes effect at once).
 */
export async function actorFromApiToken(token: string): Promise<Actor | null> {
  const tokenHash = hashToken(token);
  const [row] = await actorByToken(db, "hash").execute({ tokenHash });
  if (!row || !tokenMatches(token, row.tokenHash)) {
    forgetToken(tokenHash);
    return null;
  }
  const actor = actorOf(row);
  rememberToken(tokenHash, { tokenId: row.tokenId, actor, lastUsedAt: stampLastUsed(row.tokenId, row.lastUsedAt) });
  return actor;
}

/** Every field the same (an actor holds plain values only), so a field added later is compared too. */
function sameActor(a: Actor, b: Actor): boolean {
  const keys = Object.keys(a) as (keyof Actor)[];
  return keys.length === Object.keys(b).length && keys.every((key) => a[key] === b[key]);
}

/**
 * The actor a token resolved to in this process during the last minute, not yet confirmed: for a
 * write that confirms it inside its own transaction (see recent-token-actors.ts). Null when the
 * token was not seen lately; the caller then reads it fresh.
 */
export function recentTokenActor(token: string): Actor | null {
  const tokenHash = hashToken(token);
  const entry = recentToken(tokenHash);
  if (!entry) return null;
  entry.lastUsedAt = stampLastUsed(entry.tokenId, entry.lastUsedAt);
  return provisionalActor(entry.actor, (q: Queryable) =>
    actorByToken(q, "id")
      .execute({ tokenId: entry.tokenId })
      .then(([row]) => {
        if (row && row.tokenHash === tokenHash && sameActor(actorOf(row), entry.actor)) return;
        forgetToken(tokenHash);
        throw new StaleActor();
      }),
  );
}
