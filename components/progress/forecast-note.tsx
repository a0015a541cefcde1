"use client";

import { useQuery } from "@tanstack/react-query";
import { Spinner } from "@/components/ui/spinner";
import { api } from "@/lib/client/api";
import { formatValue, type Measure } from "@/lib/engine";
import type { ForecastDto } from "@/lib/validation/promotions";

function longDate(date: string): string {
  return new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", timeZone: "UTC" }).format(new Date(`${date}T00:00:00Z`));
}

function forecastText(forecast: ForecastDto): string {
  const target = formatValue(forecast.measure as Measure, forecast.target);
  switch (forecast.reason) {
    case "trending_up":
      return forecast.estimate
        ? `If the recent trend holds, ${target} per set could come around ${longDate(forecast.estimate)}. An estimate, not a promise.`
        : `Trending up, but too slowly to guess a date for ${target} per set.`;
    case "not_trending_up":
      return `Not trending up yet toward ${target} per set. Steady, pain-free sessions matter more than a date.`;
    case "already_met":
      return `The latest session already reached ${target}; the rest of the standard decides the move.`;
    case "too_few_sessions":
      return "An estimate needs at least 3 sessions on this rung.";
  }
}

/** A one-line readiness forecast for an athlete's current rung on a ladder, worded as an estimate. */
export function ForecastNote({ athleteId, ladderId }: { athleteId: string; ladderId: string }) {
  const query = useQuery({
    queryKey: ["forecast", athleteId, ladderId],
    queryFn: () => api<ForecastDto>(`/api/v1/athletes/${athleteId}/positions/${ladderId}/forecast`),
  });
  if (query.isPending) return <Spinner label="Estimating" />;
  if (query.isError) return <p className="text-sm text-muted">No estimate right now.</p>;
  return <p className="text-sm text-muted">{forecastText(query.data)}</p>;
}
