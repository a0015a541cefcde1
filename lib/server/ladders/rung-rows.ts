import "server-only";
import type { Tx } from "@/db/client";
import { rungPrerequisites, rungs, standards } from "@/db/schema";
import { DEFAULT_STEP_DOWN } from "@/lib/engine";
import type { RungDto, RungInput, StandardInput } from "@/lib/validation/ladders";

/**
 * A standard as stored: absent optionals become null, except stepDown: absent means the usual rule
 * (stored, so later changes to the default never move a coach's rung), null means switched off.
 */
export function standardRow(standard: StandardInput) {
  return {
    sets: standard.sets,
    minValue: standard.minValue,
    minReps: standard.minReps ?? null,
    maxRpe: standard.maxRpe ?? null,
    minRir: standard.minRir ?? null,
    sessionsRequired: standard.sessionsRequired,
    sessionsWindow: standard.sessionsWindow,
    minDaysOnRung: standard.minDaysOnRung,
    painFree: standard.painFree,
    stepDown: standard.stepDown === undefined ? { ...DEFAULT_STEP_DOWN } : standard.stepDown,
  };
}

/**
 * Inserts rungs at positions `first`, `first + 1`, … with their standards and prerequisite edges, in
 * the caller's transaction (the caller has checked the prerequisite graph). Returns the new ids in
 * input order.
 */
export async function insertRungs(
  tx: Tx,
  teamId: string,
  ladderId: string,
  first: number,
  input: readonly RungInput[],
): Promise<string[]> {
  if (input.length === 0) return [];
  const rows = await tx
    .insert(rungs)
    .values(
      input.map((rung, i) => ({
        teamId,
        ladderId,
        position: first + i,
        name: rung.name,
        measure: rung.measure,
        setting: rung.setting ?? null,
        cues: rung.cues ?? null,
        caution: rung.caution ?? null,
        demoVideoUrl: rung.demoVideoUrl ?? null,
        tags: rung.tags ?? [],
      })),
    )
    .returning({ id: rungs.id, position: rungs.position });
  const ids = rows.sort((a, b) => a.position - b.position).map((r) => r.id);
  await tx.insert(standards).values(input.map((rung, i) => ({ rungId: ids[i]!, teamId, ...standardRow(rung.standard) })));
  const edges = input.flatMap((rung, i) =>
    (rung.prerequisites ?? []).map((requiresRungId) => ({ teamId, rungId: ids[i]!, requiresRungId })),
  );
  if (edges.length) await tx.insert(rungPrerequisites).values(edges);
  return ids;
}

/** A stored rung back as create input (duplicate, export): prerequisites as rung ids. */
export function rungInputOf(rung: RungDto): RungInput {
  return {
    name: rung.name,
    measure: rung.measure,
    setting: rung.setting,
    cues: rung.cues,
    caution: rung.caution,
    demoVideoUrl: rung.demoVideoUrl,
    tags: rung.tags,
    prerequisites: rung.prerequisites.map((p) => p.rungId),
    standard: rung.standard,
  };
}
