import "server-only";
import { and, asc, count, eq, gte, lt, sum } from "drizzle-orm";
import { db } from "@/db/client";
import { billingPayments } from "@/db/schema";
import { instantOfLocal, localDateOf } from "@/lib/engine";
import type { Actor } from "@/lib/server/actor";
import type { RevenueDto } from "@/lib/validation/billing";

const MIDNIGHT = { hour: 0, minute: 0, second: 0 };

/** Paid invoices of the calendar month (in the team's zone), summed per currency. */
export async function revenueThisMonth(actor: Actor, now = new Date()): Promise<RevenueDto> {
  const [year, month] = localDateOf(now, actor.timeZone).split("-").map(Number) as [number, number];
  const first = `${year}-${String(month).padStart(2, "0")}-01`;
  const next = month === 12 ? `${year + 1}-01-01` : `${year}-${String(month + 1).padStart(2, "0")}-01`;
  const rows = await db
    .select({ currency: billingPayments.currency, amountMinor: sum(billingPayments.amountMinor).mapWith(Number), payments: count() })
    .from(billingPayments)
    .where(
      and(
        eq(billingPayments.teamId, actor.teamId),
        gte(billingPayments.paidAt, instantOfLocal(first, MIDNIGHT, actor.timeZone)),
        lt(billingPayments.paidAt, instantOfLocal(next, MIDNIGHT, actor.timeZone)),
      ),
    )
    .groupBy(billingPayments.currency)
    .orderBy(asc(billingPayments.currency));
  return { month: first.slice(0, 7), totals: rows };
}
