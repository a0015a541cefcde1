import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { billingOffers } from "@/db/schema";
import { isStaff } from "@/lib/permissions";
import type { Actor } from "@/lib/server/actor";
import { offerColumns, toOfferDto } from "./offer-dto";

/**
 * The team's offers by name. Staff see archived ones too (to restore them); athletes only the live
 * offers they can pick. A team has a handful, so the list is one page.
 */
export async function listOffers(actor: Actor) {
  const rows = await db
    .select(offerColumns)
    .from(billingOffers)
    .where(and(eq(billingOffers.teamId, actor.teamId), isStaff(actor.role) ? undefined : isNull(billingOffers.archivedAt)))
    .orderBy(asc(billingOffers.name), asc(billingOffers.id));
  return { items: rows.map(toOfferDto), nextCursor: null };
}
