import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import type { Queryable } from "@/db/client";
import { athletePositions, rungs } from "@/db/schema";
import type { Measure } from "@/lib/engine/types";
import { NotFound, Unprocessable, type FieldIssue } from "@/lib/errors";

export interface LogRung {
  rungId: string;
  ladderId: string;
  measure: Measure;
  /** The athlete's current rung on that ladder: only these count toward promotion. */
  isCurrent: boolean;
}

/**
 * The rungs a log names, in one query with the athlete's positions. Another team's rung is not
 * found (404); a rung of a ladder the athlete is not placed on is a 422 at `<path>.N.rungId`.
 * Easier or harder rungs of a placed ladder are accepted (warm-ups, a phone syncing after a move).
 */
export async function logRungsOf(
  q: Queryable,
  teamId: string,
  athleteId: string,
  rungIds: readonly string[],
  path = "entries",
): Promise<LogRung[]> {
  const distinct = [...new Set(rungIds)];
  const rows = await q
    .select({ rungId: rungs.id, ladderId: rungs.ladderId, measure: rungs.measure, currentRungId: athletePositions.rungId })
    .from(rungs)
    .leftJoin(athletePositions, and(eq(athletePositions.ladderId, rungs.ladderId), eq(athletePositions.athleteId, athleteId)))
    .where(and(inArray(rungs.id, distinct), eq(rungs.teamId, teamId)));
  const byId = new Map(rows.map((r) => [r.rungId, r]));
  const issues: FieldIssue[] = [];
  const result = rungIds.map((rungId, i) => {
    const row = byId.get(rungId);
    if (!row) throw new NotFound("rung");
    if (row.currentRungId === null) issues.push({ path: `${path}.${i}.rungId`, message: "The athlete is not placed on this rung's ladder." });
    return { rungId, ladderId: row.ladderId, measure: row.measure, isCurrent: row.currentRungId === rungId };
  });
  if (issues.length > 0) throw new Unprocessable("Some entries name a ladder the athlete is not on.", issues);
  return result;
}

/** Distinct current rungs among logged ones, for evaluateAfterLog. */
export function currentRungs(list: readonly { ladderId: string; rungId: string; isCurrent: boolean }[]) {
  const seen = new Map<string, { ladderId: string; rungId: string }>();
  for (const r of list) if (r.isCurrent) seen.set(r.rungId, { ladderId: r.ladderId, rungId: r.rungId });
  return [...seen.values()];
}
