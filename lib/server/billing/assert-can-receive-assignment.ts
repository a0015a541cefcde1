import "server-only";
import { and, eq } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { athletes, billingSubscriptions } from "@/db/schema";
import { Conflict } from "@/lib/errors";
import { membershipAllowsAssignments } from "./access-rule";
import { graceDaysOf } from "./billing-settings";
import { teamSellsOffers } from "./team-sells-offers";

/**
 * The one billing guard on new plan assignments (called inside the assignment's transaction). It
 * passes when the team sells no offers, or the athlete's membership is active or within the team's
 * grace period; otherwise 409. It never touches training data: history, positions and earlier
 * assignments stay as they are.
 */
export async function assertCanReceiveAssignment(q: Queryable, teamId: string, athleteId: string, now = new Date()): Promise<void> {
  if (!(await teamSellsOffers(q, teamId))) return;
  const [membership] = await q
    .select({ status: billingSubscriptions.status, lapsedAt: billingSubscriptions.lapsedAt })
    .from(billingSubscriptions)
    .where(and(eq(billingSubscriptions.teamId, teamId), eq(billingSubscriptions.athleteId, athleteId)));
  const graceDays = await graceDaysOf(q, teamId);
  if (membershipAllowsAssignments(membership, graceDays, now)) return;
  const [athlete] = await q.select({ name: athletes.name }).from(athletes).where(and(eq(athletes.id, athleteId), eq(athletes.teamId, teamId)));
  throw new Conflict(
    `${athlete?.name ?? "This athlete"} has no active membership${graceDays > 0 ? ` (the ${graceDays}-day grace period is over)` : ""}: ` +
      "new plans can be assigned once they pay again. Their history and current plans stay.",
  );
}
