"use client";

import { Badge, Card } from "@/components/ui/card";
import { cueLines } from "@/lib/cue-lines";
import type { PendingSet } from "@/lib/client/offline-queue";
import type { TodayRung } from "@/lib/validation/logs";
import { RestTimer } from "./rest-timer";
import { SetForm, type SetSubmission } from "./set-form";
import { setText } from "./set-text";

const STATUS_TEXT: Record<string, string> = {
  not_yet: "Working on it",
  met: "Standard met",
  blocked: "Waiting on a prerequisite",
  step_down: "Step down proposed",
  pending_approval: "Waiting for your coach",
  achieved: "Achieved",
};

function ReadinessBar({ readiness }: { readiness: number }) {
  return (
    <div>
      <div className="flex justify-between text-xs text-muted">
        <span>Readiness</span>
        <span className="font-semibold text-ink">{readiness}%</span>
      </div>
      <div className="mt-1 h-2.5 overflow-hidden rounded-full bg-sunken" role="progressbar" aria-valuemin={0} aria-valuemax={100} aria-valuenow={readiness} aria-label="Readiness toward the standard">
        <div className="h-full rounded-full bg-ember" style={{ width: `${readiness}%` }} />
      </div>
    </div>
  );
}

/** One slot of the day: the athlete's current rung, how to do it safely, the standard, and the sets. */
export function RungCard({
  rung,
  slotNote,
  target,
  restSeconds,
  pending,
  onLog,
  onDiscard,
}: {
  rung: TodayRung;
  slotNote?: string | null;
  target?: string | null;
  restSeconds: number;
  pending: PendingSet[];
  onLog: (submission: SetSubmission) => void;
  onDiscard: (key: string) => void;
}) {
  const logged = rung.logged.flatMap((entry) => entry.sets.map((set, i) => ({ key: `${entry.id}-${i}`, set, pain: entry.pain })));
  const cues = cueLines(rung.cues);
  return (
    <Card className="flex flex-col gap-4" data-testid={`rung-${rung.rungId}`}>
      <div>
        <p className="text-xs font-semibold uppercase tracking-wide text-muted">{rung.ladderName}</p>
        <h3 className="font-display text-xl font-bold">{rung.rungName}</h3>
        <div className="mt-1 flex flex-wrap gap-2">
          <Badge tone={rung.status === "met" || rung.status === "achieved" ? "moss" : rung.status === "step_down" ? "danger" : "neutral"}>
            {STATUS_TEXT[rung.status] ?? rung.status}
          </Badge>
          {rung.setting ? <Badge tone="sky">{rung.setting}</Badge> : null}
          {target ? <Badge tone="ember">Today: {target}</Badge> : null}
        </div>
      </div>
      {cues.length > 0 ? (
        <ul aria-label="Cues" className="list-disc space-y-0.5 pl-5 text-sm">
          {cues.map((cue, i) => (
            <li key={i}>{cue}</li>
          ))}
        </ul>
      ) : null}
      {rung.caution ? <p className="rounded-lg bg-ember-soft px-3 py-2 text-sm text-ember">⚠ {rung.caution}</p> : null}
      {slotNote ? <p className="text-sm text-muted">Coach: {slotNote}</p> : null}
      {rung.standardText ? (
        <p className="text-sm">
          <span className="font-semibold">To move up: </span>
          {rung.standardText}.
        </p>
      ) : null}
      <ReadinessBar readiness={rung.readiness} />
      {rung.explanation ? (
        <p className="text-sm text-muted" data-testid="verdict-explanation">
          {rung.explanation}
        </p>
      ) : null}
      <div>
        <p className="text-sm font-semibold">Sets today</p>
        {logged.length === 0 && pending.length === 0 ? <p className="text-sm text-muted">None yet.</p> : null}
        <ol className="mt-1 flex flex-col gap-1" data-testid="sets-today">
          {logged.map((row) => (
            <li key={row.key} data-state="logged" className="flex items-center justify-between rounded-md bg-moss-soft px-3 py-2 text-sm">
              <span>{setText(rung.measure, row.set)}</span>
              {row.pain ? <Badge tone="danger">pain</Badge> : <span className="text-xs text-moss-strong">logged</span>}
            </li>
          ))}
          {pending.map((item) => (
            <li key={item.key} data-state="pending" className="flex items-center justify-between rounded-md bg-sunken px-3 py-2 text-sm">
              <span>{setText(rung.measure, item.set)}</span>
              {item.error ? (
                <span className="flex items-center gap-2 text-xs text-danger">
                  {item.error}
                  <button type="button" className="underline" onClick={() => onDiscard(item.key)}>
                    Remove
                  </button>
                </span>
              ) : (
                <Badge tone="ember">pending</Badge>
              )}
            </li>
          ))}
        </ol>
      </div>
      <SetForm measure={rung.measure} preferRir={rung.standard?.minRir != null} onSubmit={onLog} />
      <RestTimer seconds={restSeconds} />
    </Card>
  );
}
