import { eq } from "drizzle-orm";
import type { Tx } from "../client";
import { athletes, ladders, rungs, users } from "../schema";
import { DEMO_ATHLETES, DEMO_OWNER, type DemoAthleteKey } from "./demo-cast";

/** Looks up the demo club's ids for later seed steps (by the owner's e-mail and starter keys). */
export async function demoTeam(tx: Tx) {
  const [owner] = await tx.select({ id: users.id, teamId: users.teamId }).from(users).where(eq(users.email, DEMO_OWNER.email));
  if (!owner) throw new Error("the demo club is missing; seed step 001 must run first");
  const teamId = owner.teamId;
  const athleteRows = await tx.select({ id: athletes.id, name: athletes.name }).from(athletes).where(eq(athletes.teamId, teamId));
  const athleteIds = {} as Record<DemoAthleteKey, string>;
  for (const cast of DEMO_ATHLETES) {
    const row = athleteRows.find((a) => a.name === cast.name);
    if (row) athleteIds[cast.key] = row.id;
  }
  const ladderRows = await tx.select({ id: ladders.id, key: ladders.starterKey }).from(ladders).where(eq(ladders.teamId, teamId));
  const rungRows = await tx
    .select({ id: rungs.id, key: rungs.starterKey, ladderId: rungs.ladderId, position: rungs.position })
    .from(rungs)
    .where(eq(rungs.teamId, teamId));
  const ladderIds: Record<string, string> = {};
  for (const l of ladderRows) if (l.key) ladderIds[l.key] = l.id;
  /** A starter rung's id: `rungId("ring-muscle-up", "ring-dip")`. */
  const rungId = (ladderKey: string, rungKey: string): string => {
    const ladderId = ladderIds[ladderKey];
    const row = rungRows.find((r) => r.ladderId === ladderId && r.key === rungKey);
    if (!row) throw new Error(`demo rung ${ladderKey}/${rungKey} is missing`);
    return row.id;
  };
  return { teamId, ownerId: owner.id, athleteIds, ladderIds, rungId };
}
