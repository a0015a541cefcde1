"use client";

import { useQuery } from "@tanstack/react-query";
import { Badge, Card } from "@/components/ui/card";
import { Spinner } from "@/components/ui/spinner";
import { api } from "@/lib/client/api";
import type { PositionVerdictDto } from "@/lib/validation/position-verdict";
import { ForecastNote } from "./forecast-note";

const STATUS: Record<PositionVerdictDto["status"], { label: string; tone: "moss" | "ember" | "danger" | "sky" | "neutral" }> = {
  met: { label: "Standard met", tone: "moss" },
  not_yet: { label: "Working on it", tone: "neutral" },
  blocked: { label: "Waiting for a prerequisite", tone: "sky" },
  step_down: { label: "Step down suggested", tone: "danger" },
};

/**
 * The live verdict of one athlete on one ladder: readiness, the plain-words explanation, the
 * checklist of clauses and a forecast. Finishing the ladder is celebrated.
 */
export function VerdictCard({ athleteId, ladderId, showForecast = true }: { athleteId: string; ladderId: string; showForecast?: boolean }) {
  const query = useQuery({
    queryKey: ["verdict", athleteId, ladderId],
    queryFn: () => api<PositionVerdictDto>(`/api/v1/athletes/${athleteId}/positions/${ladderId}/verdict`),
  });
  if (query.isPending) return <Spinner label="Reading the standard" />;
  if (query.isError) return <p className="text-sm text-danger">Couldn&apos;t load this verdict. Try again in a moment.</p>;
  const v = query.data;

  if (v.achieved) {
    return (
      <Card className="border-ember bg-ember-soft">
        <p className="font-display text-xl font-bold text-ember">Skill achieved: {v.ladderName}</p>
        <p className="mt-1 text-sm text-ink">Every rung climbed, the last one being {v.rungName}. Well earned.</p>
      </Card>
    );
  }
  const status = STATUS[v.status];
  return (
    <Card className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <div>
          <p className="text-xs uppercase tracking-wide text-muted">{v.ladderName}</p>
          <p className="font-display text-lg font-semibold">{v.rungName}</p>
        </div>
        {v.pendingDirection === "up" ? (
          <Badge tone="ember">Waiting for the coach</Badge>
        ) : v.pendingDirection === "down" ? (
          <Badge tone="danger">Step down proposed</Badge>
        ) : (
          <Badge tone={status.tone}>{status.label}</Badge>
        )}
      </div>
      <div>
        <div className="flex justify-between text-sm">
          <span className="font-semibold">Readiness</span>
          <span className="font-mono">{v.readiness} %</span>
        </div>
        <div
          className="mt-1 h-2 rounded-full bg-sunken"
          role="progressbar"
          aria-valuenow={v.readiness}
          aria-valuemin={0}
          aria-valuemax={100}
          aria-label="Readiness"
        >
          <div className="h-2 rounded-full bg-moss" style={{ width: `${v.readiness}%` }} />
        </div>
      </div>
      <p className="text-sm">{v.explanation}</p>
      <ul className="flex flex-col gap-1 text-sm text-muted">
        {v.clauses.map((clause, i) => (
          <li key={clause.clause} className="flex gap-2">
            <span aria-hidden className={clause.pass ? "text-moss" : "text-muted"}>
              {clause.pass ? "✓" : "○"}
            </span>
            <span>{v.clauseLines[i]}</span>
          </li>
        ))}
      </ul>
      {v.status === "step_down" ? (
        <p className="text-xs text-danger">Stop on sharp pain. This app does not replace a qualified coach, physiotherapist or physician.</p>
      ) : null}
      {showForecast ? <ForecastNote athleteId={athleteId} ladderId={ladderId} /> : null}
      <p className="text-xs text-muted">
        On this rung since {v.since}
        {v.nextRungName ? ` · next: ${v.nextRungName}` : " · last rung of the ladder"}
      </p>
    </Card>
  );
}
