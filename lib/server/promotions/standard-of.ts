import "server-only";
import type { standards } from "@/db/schema";
import { defaultStandard, type Measure, type Standard } from "@/lib/engine";

type StandardRow = Omit<typeof standards.$inferSelect, "rungId" | "teamId" | "updatedAt">;

/** The engine's standard from its row; a rung without a row falls back to the measure's default. */
export function standardOf(measure: Measure, row: StandardRow | null): Standard {
  if (!row) return defaultStandard(measure);
  return {
    sets: row.sets,
    minValue: row.minValue,
    minReps: row.minReps,
    maxRpe: row.maxRpe,
    minRir: row.minRir,
    sessionsRequired: row.sessionsRequired,
    sessionsWindow: row.sessionsWindow,
    minDaysOnRung: row.minDaysOnRung,
    painFree: row.painFree,
    // A null column means the coach switched step-down proposals off.
    stepDown: row.stepDown ?? null,
  };
}
