import { addDays } from "@/lib/engine/calendar-date";
import { isoWeekOf, parseIsoWeek } from "@/lib/engine/iso-week";
import type { ReadinessSort, ReadinessStatusFilter } from "@/lib/validation/readiness";

/** What the coach chose on the readiness screen; turned into the API's query string. */
export interface ReadinessFilters {
  week: string;
  squad: string;
  ladder: string;
  status: ReadinessStatusFilter | "";
  stalledWeeks: number;
  mine: boolean;
  sort: ReadinessSort;
}

export const PAGE_SIZE = 25;

export function readinessParams(filters: ReadinessFilters, extra: Record<string, string> = {}): URLSearchParams {
  const params = new URLSearchParams({ week: filters.week, sort: filters.sort });
  if (filters.squad) params.set("squad", filters.squad);
  if (filters.ladder) params.set("ladder", filters.ladder);
  if (filters.status) params.set("status", filters.status);
  if (filters.status === "stalled") params.set("stalledWeeks", String(filters.stalledWeeks));
  if (filters.mine) params.set("mine", "true");
  for (const [key, value] of Object.entries(extra)) params.set(key, value);
  return params;
}

/** The ISO week before or after `week` (handles week 53 and the turn of the year). */
export function shiftWeek(week: string, by: number): string {
  const parsed = parseIsoWeek(week);
  return parsed ? isoWeekOf(addDays(parsed.start, 7 * by)) : week;
}

export const STATUS_LABELS: Record<ReadinessStatusFilter, string> = {
  ready: "Ready (standard met or waiting for approval)",
  stalled: "Stalled on a rung",
  pain: "Pain flagged this week",
  none: "No sessions this week",
};

export const SORT_LABELS: Record<ReadinessSort, string> = {
  name: "Name A–Z",
  "-name": "Name Z–A",
  "-readiness": "Closest to a promotion",
  readiness: "Furthest from ready",
  lastSession: "Longest since last session",
  "-lastSession": "Most recent session",
};
