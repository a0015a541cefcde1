import "server-only";
import type { Actor } from "@/lib/server/actor";
import type { ReadinessQuery } from "@/lib/validation/readiness";
import { listAllReadiness } from "./list-readiness";
import { csvResponse, readinessCsv } from "./readiness-csv";

/** The whole filtered table as a CSV download (cursor and limit do not apply). */
export async function exportReadiness(actor: Actor, query: ReadinessQuery): Promise<Response> {
  const { week, items } = await listAllReadiness(actor, query);
  return csvResponse(`readiness-${week.week}.csv`, readinessCsv(week.week, items));
}

/** CSV when asked by `format=csv` or an Accept header that prefers text/csv over JSON. */
export function wantsCsv(query: ReadinessQuery, accept: string | null): boolean {
  if (query.format) return query.format === "csv";
  return (accept ?? "").toLowerCase().includes("text/csv");
}
