import "server-only";
import { and, asc, eq, gt, or } from "drizzle-orm";
import type { z } from "zod";
import { db } from "@/db/client";
import { athletes, billingOffers, billingSubscriptions } from "@/db/schema";
import type { Actor } from "@/lib/server/actor";
import { decodeCursor, pageOf, zNameIdCursor } from "@/lib/server/http/cursor";
import type { SubscriberDto, SubscriptionStatus, ZSubscribersQuery } from "@/lib/validation/billing";
import { membershipAllowsAssignments } from "./access-rule";
import { graceDaysOf } from "./billing-settings";

/** The team's memberships (active, past due, cancelled, pending) by athlete name, a page at a time. */
export async function listSubscribers(actor: Actor, query: z.output<typeof ZSubscribersQuery>, now = new Date()) {
  const after = decodeCursor(zNameIdCursor, query.cursor);
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
    .where(
      and(
        eq(billingSubscriptions.teamId, actor.teamId),
        after ? or(gt(athletes.name, after.name), and(eq(athletes.name, after.name), gt(athletes.id, after.id))) : undefined,
      ),
    )
    .orderBy(asc(athletes.name), asc(athletes.id))
    .limit(query.limit + 1);
  const page = pageOf(rows, query.limit, (row) => ({ name: row.athleteName, id: row.athleteId }));
  const items: SubscriberDto[] = page.items.map((row) => ({
    ...row,
    status: row.status as SubscriptionStatus,
    currentPeriodEnd: row.currentPeriodEnd?.toISOString() ?? null,
    lapsedAt: row.lapsedAt?.toISOString() ?? null,
    canReceiveAssignments: membershipAllowsAssignments(row, graceDays, now),
  }));
  return { items, nextCursor: page.nextCursor };
}
