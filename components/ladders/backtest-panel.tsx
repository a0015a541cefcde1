"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { EmptyState, Notice } from "@/components/ui/card";
import { Spinner } from "@/components/ui/spinner";
import { api, ApiError } from "@/lib/client/api";
import type { BacktestResult, BacktestStandard } from "@/lib/validation/backtest";
import { BacktestTable, CompactBacktestTable } from "./backtest-table";

/**
 * What the proposed standard would have done for everyone who has been on the rung: the date they
 * actually moved up beside the first date the proposal would have been met. Read-only. While a new
 * standard replays, the previous table stays up (marked as updating) so the page does not jump.
 * `compact` fits a phone or a narrow side column.
 */
export function BacktestPanel({
  ladderId,
  rungId,
  standard,
  compact = false,
}: {
  ladderId: string;
  rungId: string;
  standard: BacktestStandard;
  compact?: boolean;
}) {
  const query = useQuery({
    queryKey: ["backtest", ladderId, rungId, standard],
    queryFn: () => api<BacktestResult>(`/api/v1/ladders/${ladderId}/backtest`, { method: "POST", json: { rungId, standard } }),
    placeholderData: keepPreviousData,
  });

  if (query.isPending) return <Spinner label="Replaying stored sessions" />;
  if (query.isError) {
    const text = query.error instanceof ApiError ? query.error.message : "Couldn't replay the sessions. Try again in a moment.";
    return <Notice tone="danger">{text}</Notice>;
  }
  const items = query.data.items;
  if (items.length === 0) {
    return (
      <EmptyState title="Nobody has been on this rung yet">
        Once athletes reach this rung and log sessions, you can see here when a different standard would have moved them up.
      </EmptyState>
    );
  }
  const Table = compact ? CompactBacktestTable : BacktestTable;
  return (
    <div className="flex flex-col gap-2" aria-busy={query.isPlaceholderData}>
      {query.isPlaceholderData ? <Spinner label="Updating" /> : null}
      <div className={query.isPlaceholderData ? "overflow-x-auto opacity-60" : "overflow-x-auto"}>
        <Table items={items} />
      </div>
      <p className="text-xs text-muted">
        Replays the sessions each athlete logged on this rung; prerequisites are left out. A date past today means the
        days on the rung alone are still missing.
      </p>
    </div>
  );
}
