import "server-only";
import type { Queryable } from "@/db/client";
import type { Actor } from "@/lib/server/actor";

/**
 * Bearer tokens seen lately by this process, with the actor each resolved to. A keyed write (one
 * that runs in a transaction) may start from such an actor and send the statement that confirms
 * it in its first trip to the database, instead of a trip of its own before the transaction; no
 * write commits before the confirmation is back. Anything else reads the token fresh.
 */
export interface RecentToken {
  tokenId: string;
  actor: Actor;
  lastUsedAt: Date | null;
  seenAt: number;
}

/** Past this age an entry is not used: the request reads its token fresh. */
const MAX_AGE_MS = 60_000;
const MAX_ENTRIES = 1_000;

/** Keyed by the token's hash: the plain token is never kept. */
const recent = new Map<string, RecentToken>();

export function rememberToken(tokenHash: string, entry: Omit<RecentToken, "seenAt">): void {
  recent.delete(tokenHash);
  if (recent.size >= MAX_ENTRIES) recent.delete(recent.keys().next().value!);
  recent.set(tokenHash, { ...entry, seenAt: Date.now() });
}

export function recentToken(tokenHash: string): RecentToken | null {
  const entry = recent.get(tokenHash);
  if (!entry) return null;
  if (Date.now() - entry.seenAt > MAX_AGE_MS) {
    recent.delete(tokenHash);
    return null;
  }
  return entry;
}

export function forgetToken(tokenHash: string): void {
  recent.delete(tokenHash);
}

/** Thrown inside the transaction when the token no longer resolves to the actor it started from. */
export class StaleActor extends Error {
  constructor() {
    super("The API token's actor changed since it was last read; the request runs again with a fresh read.");
  }
}

interface Provisional {
  confirm: (q: Queryable) => Promise<void>;
  confirmed: boolean;
}

/** Actors taken from the cache, each with its confirmation; a WeakMap keeps the Actor type plain. */
const provisional = new WeakMap<Actor, Provisional>();

/** Marks an actor as not yet confirmed; `confirm` rejects with StaleActor when it is not current. */
export function provisionalActor(actor: Actor, confirm: (q: Queryable) => Promise<void>): Actor {
  const copy = { ...actor };
  provisional.set(copy, { confirm, confirmed: false });
  return copy;
}

/**
 * Confirms a provisional actor inside `q`'s transaction: its statement is submitted at once, so it
 * can travel in a oneTrip. An actor that was read fresh needs nothing (resolved at once).
 */
export function confirmActor(q: Queryable, actor: Actor): Promise<void> {
  const entry = provisional.get(actor);
  if (!entry) return Promise.resolve();
  return entry.confirm(q).then(() => {
    entry.confirmed = true;
  });
}

/** True once a provisional actor's confirmation came back (always true for a fresh one). */
export function isConfirmed(actor: Actor): boolean {
  return provisional.get(actor)?.confirmed ?? true;
}
