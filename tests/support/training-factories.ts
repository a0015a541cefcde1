// Factories for squads, blocks and plans tests: ladders with hand-picked rungs (measure, standard
// value, tags), so estimates and pairing warnings are known in advance.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { ladders, rungs, standards } from "@/db/schema";
import type { Measure, RungTag } from "@/lib/engine";

export interface RungSpec {
  name?: string;
  measure: Measure;
  /** The standard's value per set. */
  target: number;
  lowerings?: number;
  tags?: RungTag[];
}

/** A ladder of the team with live rungs 1..n in the order given. */
export async function createLadder(teamId: string, rungSpecs: RungSpec[], name = `Ladder ${randomUUID().slice(0, 6)}`) {
  const [ladder] = await db.insert(ladders).values({ teamId, name, targetSkill: name }).returning({ id: ladders.id });
  const rows = await db
    .insert(rungs)
    .values(
      rungSpecs.map((spec, index) => ({
        teamId,
        ladderId: ladder!.id,
        position: index + 1,
        name: spec.name ?? `${name} rung ${index + 1}`,
        measure: spec.measure,
        tags: spec.tags ?? [],
      })),
    )
    .returning({ id: rungs.id, position: rungs.position });
  const rungIds = rows.sort((a, b) => a.position - b.position).map((r) => r.id);
  await db.insert(standards).values(
    rungSpecs.map((spec, index) => ({
      rungId: rungIds[index]!,
      teamId,
      sets: 3,
      minValue: spec.target,
      minReps: spec.lowerings ?? null,
      maxRpe: 7,
      sessionsRequired: 2,
      sessionsWindow: 3,
      minDaysOnRung: 7,
    })),
  );
  return { ladderId: ladder!.id, rungIds };
}

/** A starter-library ladder installed for every new team, by its key. */
export async function starterLadderId(teamId: string, key: string): Promise<string> {
  const [row] = await db.select({ id: ladders.id }).from(ladders).where(and(eq(ladders.teamId, teamId), eq(ladders.starterKey, key)));
  if (!row) throw new Error(`starter ladder ${key} missing`);
  return row.id;
}

/** A plain two-slot block body on two ladders. */
export function blockBody(ladderIds: string[], overrides: Record<string, unknown> = {}) {
  return {
    name: `Block ${randomUUID().slice(0, 6)}`,
    rounds: 3,
    restBetweenSlotsSec: 60,
    restBetweenRoundsSec: 120,
    slots: ladderIds.map((ladderId) => ({ ladderId })),
    ...overrides,
  };
}
