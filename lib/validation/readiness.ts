import { z } from "zod";
import { parseIsoWeek } from "@/lib/engine/iso-week";
import { zId } from "./common";

/** An ISO 8601 week label that exists ("2026-W53" does, "2025-W53" does not). */
export const zIsoWeek = z
  .string()
  .regex(/^\d{4}-W\d{2}$/, "Use an ISO 8601 week such as 2026-W49.")
  .refine((value) => parseIsoWeek(value) !== null, "That ISO 8601 week does not exist in that year.");

export const READINESS_STATUS_FILTERS = ["ready", "stalled", "pain", "none"] as const;
export type ReadinessStatusFilter = (typeof READINESS_STATUS_FILTERS)[number];

export const READINESS_SORTS = ["name", "-name", "readiness", "-readiness", "lastSession", "-lastSession"] as const;
export type ReadinessSort = (typeof READINESS_SORTS)[number];

export const READINESS_PAGE_MAX = 100;

export const ZReadinessQuery = z
  .strictObject({
    week: zIsoWeek.optional().meta({ description: "ISO 8601 week in the team's time zone; default: the current week." }),
    squad: zId.optional().meta({ description: "Only athletes in this squad." }),
    ladder: zId.optional().meta({ description: "Only athletes placed on this ladder, and only that ladder's cells." }),
    status: z.enum(READINESS_STATUS_FILTERS).optional().meta({
      description:
        "ready: a position with status met or pending_approval. " +
        "stalled: a position (not achieved) whose rung has not changed for more than `stalledWeeks` weeks " +
        "(its `since`, the date of the last move, counted to the end of the week or today). " +
        "pain: a logged session with a pain flag within the week. " +
        "none: no session logged within the week. " +
        "ready/stalled/pain list the athlete when at least one of their positions matches; none when none of them has a session. " +
        "With `ladder`, only that ladder's position counts.",
    }),
    stalledWeeks: z.coerce.number().int().min(1).max(104).default(4),
    mine: z.stringbool().optional().meta({ description: "Only athletes whose primary coach is the caller." }),
    sort: z.enum(READINESS_SORTS).default("name").meta({
      description:
        "name / -name: by athlete name. readiness: lowest readiness of their ladders first (who is furthest away). " +
        "-readiness: best readiness of their ladders first (who is closest to a promotion). " +
        "lastSession: longest since their last session first (never logged first). -lastSession: most recent first. " +
        "Athletes without a position sort last by readiness. Ties by name, then id.",
    }),
    cursor: z.string().max(500).optional(),
    limit: z.coerce.number().int().min(1).max(READINESS_PAGE_MAX).default(50),
    format: z.enum(["json", "csv"]).optional().meta({
      description: "csv (or Accept: text/csv): every matching athlete × ladder as RFC 4180 CSV; cursor and limit are ignored.",
    }),
  })
  .meta({ id: "ReadinessQuery" });
export type ReadinessQuery = z.output<typeof ZReadinessQuery>;

export const POSITION_STATUSES = ["not_yet", "met", "blocked", "step_down", "pending_approval", "achieved"] as const;

export const ZReadinessCell = z
  .object({
    ladderId: z.uuid(),
    ladderName: z.string(),
    rungId: z.uuid(),
    rungName: z.string(),
    readiness: z.number().int().min(0).max(100),
    status: z.enum(POSITION_STATUSES),
    /** Distinct days with a logged session on this ladder within the week. */
    sessionsThisWeek: z.number().int().min(0),
    /** Days since the current rung was reached, to the end of the week (or today for the current week). */
    daysOnRung: z.number().int().min(0),
    /** A session with a pain flag on this ladder within the week. */
    pain: z.boolean(),
    pendingPromotionId: z.uuid().nullable(),
    /** Moves up applied (automatically or approved) within the week. */
    promotionsThisWeek: z.number().int().min(0),
  })
  .meta({ id: "ReadinessCell" });
export type ReadinessCell = z.infer<typeof ZReadinessCell>;

export const ZReadinessRow = z
  .object({ athleteId: z.uuid(), athleteName: z.string(), ladders: z.array(ZReadinessCell) })
  .meta({ id: "ReadinessRow" });
export type ReadinessRow = z.infer<typeof ZReadinessRow>;

export const ZReadinessPage = z
  .object({
    week: z.string(),
    weekStart: z.string(),
    weekEnd: z.string(),
    items: z.array(ZReadinessRow),
    nextCursor: z.string().nullable(),
  })
  .meta({ id: "ReadinessPage" });
export type ReadinessPage = z.infer<typeof ZReadinessPage>;

/** Columns of the CSV export, in order. */
export const READINESS_CSV_COLUMNS = [
  "week",
  "athlete_id",
  "athlete",
  "ladder_id",
  "ladder",
  "rung_id",
  "rung",
  "readiness",
  "status",
  "sessions_this_week",
  "days_on_rung",
  "pain",
  "pending_promotion_id",
  "promotions_this_week",
] as const;
