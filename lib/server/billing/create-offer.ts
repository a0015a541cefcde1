import "server-only";
import { db } from "@/db/client";
import { billingOffers } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import type { CreateOffer } from "@/lib/validation/billing";
import { offerColumns, toOfferDto } from "./offer-dto";

/** A new monthly coaching offer of the owner's team. */
export async function createOffer(actor: Actor, input: CreateOffer) {
  const [row] = await db
    .insert(billingOffers)
    .values({ teamId: actor.teamId, name: input.name, priceMinor: input.priceMinor, currency: input.currency, includes: input.includes })
    .returning(offerColumns);
  return toOfferDto(row!);
}
