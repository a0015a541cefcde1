import "server-only";

const DAY_MS = 86_400_000;

/**
 * Whether a membership still lets an athlete receive new plan assignments: active, or lapsed less
 * than `graceDays` ago. Pending (never paid) and long-lapsed memberships do not.
 */
export function membershipAllowsAssignments(
  membership: { status: string; lapsedAt: Date | null } | undefined,
  graceDays: number,
  now: Date,
): boolean {
  if (!membership) return false;
  if (membership.status === "active") return true;
  if (!membership.lapsedAt) return false;
  return now.getTime() < membership.lapsedAt.getTime() + graceDays * DAY_MS;
}
