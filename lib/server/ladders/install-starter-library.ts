import "server-only";
import type { Tx } from "@/db/client";
import { ladders, rungPrerequisites, rungs, standards } from "@/db/schema";
import { STARTER_LADDERS } from "@/lib/starter-library";

/** Ids of the installed rows, by starter key: `ladders["ring-muscle-up"]`, `rungs["ring-muscle-up/ring-dip"]`. */
export interface InstalledLibrary {
  ladders: Record<string, string>;
  rungs: Record<string, string>;
}

/**
 * Copies the starter library into a team: ladders, rungs in order, one standard per rung, and the
 * prerequisites between ladders. The library is ordered so every prerequisite already exists.
 */
export async function installStarterLibrary(tx: Tx, teamId: string): Promise<InstalledLibrary> {
  const installed: InstalledLibrary = { ladders: {}, rungs: {} };
  for (const starter of STARTER_LADDERS) {
    const [ladder] = await tx
      .insert(ladders)
      .values({
        teamId,
        name: starter.name,
        targetSkill: starter.targetSkill,
        notes: starter.notes,
        promotionMode: starter.promotionMode,
        starterKey: starter.key,
      })
      .returning({ id: ladders.id });
    installed.ladders[starter.key] = ladder!.id;

    const rows = await tx
      .insert(rungs)
      .values(
        starter.rungs.map((rung, index) => ({
          teamId,
          ladderId: ladder!.id,
          position: index + 1,
          name: rung.name,
          measure: rung.measure,
          setting: rung.setting ?? null,
          cues: rung.cues.join("\n"),
          caution: rung.caution ?? null,
          tags: [...rung.tags],
          starterKey: rung.key,
        })),
      )
      .returning({ id: rungs.id, starterKey: rungs.starterKey });
    for (const row of rows) installed.rungs[`${starter.key}/${row.starterKey}`] = row.id;

    await tx.insert(standards).values(
      starter.rungs.map((rung) => ({
        rungId: installed.rungs[`${starter.key}/${rung.key}`]!,
        teamId,
        ...rung.standard,
        minReps: rung.standard.minReps ?? null,
        maxRpe: rung.standard.maxRpe ?? null,
        minRir: rung.standard.minRir ?? null,
        stepDown: rung.standard.stepDown ?? null,
      })),
    );

    const prerequisites = starter.rungs.flatMap((rung) =>
      (rung.prerequisites ?? []).map((ref) => ({
        teamId,
        rungId: installed.rungs[`${starter.key}/${rung.key}`]!,
        requiresRungId: installed.rungs[`${ref.ladder}/${ref.rung}`]!,
      })),
    );
    if (prerequisites.length) await tx.insert(rungPrerequisites).values(prerequisites);
  }
  return installed;
}
