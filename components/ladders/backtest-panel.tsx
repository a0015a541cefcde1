"use client";

import { useQuery } from "@tanstack/react-query";
import { Badge, EmptyState, Notice } from "@/components/ui/card";
import { Spinner } from "@/components/ui/spinner";
import { api, ApiError } from "@/lib/client/api";
import type { BacktestResult, BacktestStandard } from "@/lib/validation/backtest";

function daysApart(a: string, b: string): number {
  return Math.round((Date.parse(`${b}T00:00:00Z`) - Date.parse(`${a}T00:00:00Z`)) / 86_400_000);
}

function Difference({ actual, would }: { actual: string | null; would: string | null }) {
  if (!would) return <Badge>Not met</Badge>;
  if (!actual) return <Badge tone="sky">Still on the rung</Badge>;
  const days = daysApart(actual, would);
  if (days === 0) return <Badge>Same day</Badge>;
  return days < 0 ? <Badge tone="moss">{-days} d earlier</Badge> : <Badge tone="ember">{days} d later</Badge>;
}

/**
 * What the proposed standard would have done for everyone who has been on the rung: the date they
 * actually moved up beside the first date the proposal would have been met. Read-only.
 */
export function BacktestPanel({ ladderId, rungId, standard }: { ladderId: string; rungId: string; standard: BacktestStandard }) {
  const query = useQuery({
    queryKey: ["backtest", ladderId, rungId, standard],
    queryFn: () => api<BacktestResult>(`/api/v1/ladders/${ladderId}/backtest`, { method: "POST", json: { rungId, standard } }),
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
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Replay of the proposed standard</caption>
        <thead className="text-xs uppercase tracking-wide text-muted">
          <tr>
            <th scope="col" className="py-2 pr-3">Athlete</th>
            <th scope="col" className="py-2 pr-3">Reached rung</th>
            <th scope="col" className="py-2 pr-3">Moved up</th>
            <th scope="col" className="py-2 pr-3">Would move up</th>
            <th scope="col" className="py-2">Change</th>
          </tr>
        </thead>
        <tbody>
          {items.map((item) => (
            <tr key={`${item.athleteId}-${item.reachedOn}`} className="border-t border-line">
              <td className="py-2 pr-3 font-semibold">{item.athleteName}</td>
              <td className="py-2 pr-3 font-mono">{item.reachedOn}</td>
              <td className="py-2 pr-3 font-mono">{item.actualPromotedOn ?? "—"}</td>
              <td className="py-2 pr-3 font-mono">{item.wouldPromoteOn ?? "never, so far"}</td>
              <td className="py-2">
                <Difference actual={item.actualPromotedOn} would={item.wouldPromoteOn} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-2 text-xs text-muted">
        Replays the sessions each athlete logged on this rung; prerequisites are left out. A date past today means the
        days on the rung alone are still missing.
      </p>
    </div>
  );
}
