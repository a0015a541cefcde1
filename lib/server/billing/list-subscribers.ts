import "server-only";
import { asc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { athletes, billingOffers, billingSubscriptions } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import type { SubscriberDto, SubscriptionStatus } from "@/lib/validation/billing";
import { membershipAllowsAssignments } from "./access-rule";
import { graceDaysOf } from "./billing-settings";

/** Every membership of the team (active, past due, cancelled, pending), by athlete name. */
export async function listSubscribers(actor: Actor, now = new Date()) {
  const graceDays = await graceDaysOf(db, actor.teamId);
  const rows = await db
    .select({
      athleteId: athletes.id,
      athleteName: athletes.name,
      offerId: billingOffers.id,
      offerName: billingOffers.name,
      priceMinor: billingOffers.priceMinor,
      currency: billingOffers.currency,
      status: billingSubscriptions.status,
      currentPeriodEnd: billingSubscriptions.currentPeriodEnd,
      cancelAtPeriodEnd: billingSubscriptions.cancelAtPeriodEnd,
      lapsedAt: billingSubscriptions.lapsedAt,
    })
    .from(billingSubscriptions)
    .innerJoin(athletes, eq(athletes.id, billingSubscriptions.athleteId))
    .innerJoin(billingOffers, eq(billingOffers.id, billingSubscriptions.offerId))
    .where(eq(billingSubscriptions.teamId, actor.teamId))
    .orderBy(asc(athletes.name), asc(athletes.id));
  const items: SubscriberDto[] = rows.map((row) => ({
    ...row,
    status: row.status as SubscriptionStatus,
    currentPeriodEnd: row.currentPeriodEnd?.toISOString() ?? null,
    lapsedAt: row.lapsedAt?.toISOString() ?? null,
    canReceiveAssignments: membershipAllowsAssignments(row, graceDays, now),
  }));
  return { items, nextCursor: null };
}
