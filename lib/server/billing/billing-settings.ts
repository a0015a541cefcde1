import "server-only";
import { eq } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { billingSettings } from "@/db/schema";

export const DEFAULT_GRACE_DAYS = 7;

/** The team's grace period in days (the default until the owner sets one). */
export async function graceDaysOf(q: Queryable, teamId: string): Promise<number> {
  const [row] = await q.select({ graceDays: billingSettings.graceDays }).from(billingSettings).where(eq(billingSettings.teamId, teamId));
  return row?.graceDays ?? DEFAULT_GRACE_DAYS;
}
