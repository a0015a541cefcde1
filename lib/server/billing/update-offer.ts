import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { billingOffers } from "@/db/schema";
import { NotFound } from "@/lib/errors";
import type { Actor } from "@/lib/server/actor";
import type { UpdateOffer } from "@/lib/validation/billing";
import { offerColumns, toOfferDto } from "./offer-dto";

/**
 * Changes an offer. A new price applies to checkouts started afterwards; running memberships keep
 * the price they were sold at (the provider charges what the checkout created). Archiving hides the
 * offer from athletes without touching anyone's membership.
 */
export async function updateOffer(actor: Actor, offerId: string, input: UpdateOffer) {
  const { archived, ...fields } = input;
  const [row] = await db
    .update(billingOffers)
    .set({ ...fields, ...(archived === undefined ? {} : { archivedAt: archived ? new Date() : null }) })
    .where(and(eq(billingOffers.id, offerId), eq(billingOffers.teamId, actor.teamId)))
    .returning(offerColumns);
  if (!row) throw new NotFound("offer");
  return toOfferDto(row);
}
