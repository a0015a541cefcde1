import "server-only";
import { db } from "@/db/client";
import type { Actor } from "@/lib/server/actor";
import { loadLadder } from "./ladder-dto";

/** One ladder of the actor's team, archived or not; 404 for another team's. */
export function getLadder(actor: Actor, ladderId: string) {
  return loadLadder(db, actor.teamId, ladderId);
}
