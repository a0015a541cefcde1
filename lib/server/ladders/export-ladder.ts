import "server-only";
import { db } from "@/db/client";
import type { Actor } from "@/lib/server/actor";
import { LADDER_DOCUMENT_FORMAT, LADDER_DOCUMENT_VERSION, type LadderDocument } from "@/lib/validation/ladder-document";
import { loadLadder } from "./ladder-dto";

/** A lower-case slug of a rung name, made unique among the document's keys. */
function keyFor(name: string, taken: Set<string>): string {
  const base = name.toLowerCase().normalize("NFKD").replace(/[^a-z0-9]+/g, "-").replace(/^-+|-+$/g, "").slice(0, 50) || "rung";
  let key = base;
  for (let n = 2; taken.has(key); n += 1) key = `${base}-${n}`;
  taken.add(key);
  return key;
}

/**
 * A ladder of the actor's team as a `rungwise.ladder` document: live rungs in order with a local key
 * each; prerequisites (always on other ladders) as ladder name + rung name, since ids mean nothing
 * to another team.
 */
export async function exportLadder(actor: Actor, ladderId: string): Promise<LadderDocument> {
  const ladder = await loadLadder(db, actor.teamId, ladderId);
  const taken = new Set<string>();
  return {
    format: LADDER_DOCUMENT_FORMAT,
    version: LADDER_DOCUMENT_VERSION,
    ladder: { name: ladder.name, targetSkill: ladder.targetSkill, promotionMode: ladder.promotionMode, notes: ladder.notes },
    rungs: ladder.rungs.map((rung) => ({
      key: keyFor(rung.name, taken),
      name: rung.name,
      measure: rung.measure,
      setting: rung.setting,
      cues: rung.cues,
      caution: rung.caution,
      demoVideoUrl: rung.demoVideoUrl,
      tags: rung.tags,
      standard: rung.standard,
      prerequisites: rung.prerequisites.map((p) => ({ ladder: p.ladderName, rung: p.rungName })),
    })),
  };
}
