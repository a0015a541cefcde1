import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { promotions } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import { selectPromotions, toPromotionDto } from "./promotion-dto";
import { visiblePromotions } from "./promotion-scope";

export async function getPromotion(actor: Actor, promotionId: string) {
  const [row] = await selectPromotions(db).where(and(eq(promotions.id, promotionId), visiblePromotions(actor)));
  if (!row) throw new NotFound("promotion");
  return toPromotionDto(row);
}
