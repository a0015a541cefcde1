import "server-only";
import { and, eq } from "drizzle-orm";
import { db, type Queryable } from "@/db/client";
import { blocks } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { blockColumns, toBlockDtos } from "./block-dto";

/** One block of the actor's team (archived ones too: plans still show them); 404 for another team's. */
export async function getBlock(actor: Actor, blockId: string, q: Queryable = db) {
  const rows = await q.select(blockColumns).from(blocks).where(and(eq(blocks.id, blockId), eq(blocks.teamId, actor.teamId)));
  const [block] = await toBlockDtos(q, actor.teamId, rows);
  if (!block) throw new NotFound("block");
  return block;
}
