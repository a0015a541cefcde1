import "server-only";
import { billingOffers } from "@/db/schema";
import type { OfferDto } from "@/lib/validation/billing";

export const offerColumns = {
  id: billingOffers.id,
  name: billingOffers.name,
  priceMinor: billingOffers.priceMinor,
  currency: billingOffers.currency,
  includes: billingOffers.includes,
  archivedAt: billingOffers.archivedAt,
  createdAt: billingOffers.createdAt,
};

interface OfferRow {
  id: string;
  name: string;
  priceMinor: number;
  currency: string;
  includes: string;
  archivedAt: Date | null;
  createdAt: Date;
}

export function toOfferDto(row: OfferRow): OfferDto {
  return {
    id: row.id,
    name: row.name,
    priceMinor: row.priceMinor,
    currency: row.currency,
    includes: row.includes,
    archived: row.archivedAt !== null,
    createdAt: row.createdAt.toISOString(),
  };
}
