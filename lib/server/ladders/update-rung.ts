import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { rungPrerequisites, rungs, standards } from "@/db/schema";
import { Unprocessable } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { standardIssues, type RungPatch } from "@/lib/validation/ladders";
import { loadRung } from "./ladder-dto";
import { assertPrerequisiteGraph, lockTeamLadders } from "./prerequisite-graph";
import { rungForWrite } from "./rung-for-write";
import { standardRow } from "./rung-rows";

/**
 * Changes a live rung: its fields, its whole standard, or its whole prerequisite list (checked for
 * same-ladder links and cycles). The rung keeps its id, so athletes on it stay where they are.
 */
export async function updateRung(actor: Actor, rungId: string, input: RungPatch) {
  await db.transaction(async (tx) => {
    await lockTeamLadders(tx, actor.teamId);
    const rung = await rungForWrite(tx, actor.teamId, rungId);
    const measure = input.measure ?? rung.measure;
    const standard = input.standard;
    if (!standard && input.measure) {
      const [current] = await tx.select({ minValue: standards.minValue }).from(standards).where(eq(standards.rungId, rungId));
      if (current && standardIssues(measure, current).length > 0) {
        throw new Unprocessable("The standard does not fit the new measure.", [
          { path: "standard", message: "Send a standard that fits the new measure." },
        ]);
      }
    }
    if (standard) {
      const issues = standardIssues(measure, standard);
      if (issues.length) {
        throw new Unprocessable("The standard is not valid.", issues.map((i) => ({ path: ["standard", ...i.path].join("."), message: i.message })));
      }
    }
    if (input.prerequisites) {
      await assertPrerequisiteGraph(tx, actor.teamId, {
        upsert: [{ id: rung.id, ladderId: rung.ladderId, name: input.name ?? rung.name, position: rung.position, prerequisites: input.prerequisites, path: "prerequisites" }],
      });
      await tx.delete(rungPrerequisites).where(eq(rungPrerequisites.rungId, rungId));
      if (input.prerequisites.length) {
        await tx.insert(rungPrerequisites).values(input.prerequisites.map((requiresRungId) => ({ teamId: actor.teamId, rungId, requiresRungId })));
      }
    }
    await tx
      .update(rungs)
      .set({
        name: input.name,
        measure: input.measure,
        setting: input.setting,
        cues: input.cues,
        caution: input.caution,
        demoVideoUrl: input.demoVideoUrl,
        tags: input.tags,
        updatedAt: new Date(),
      })
      .where(eq(rungs.id, rungId));
    if (standard) await tx.update(standards).set(standardRow(standard)).where(eq(standards.rungId, rungId));
  });
  return loadRung(db, actor.teamId, rungId);
}
