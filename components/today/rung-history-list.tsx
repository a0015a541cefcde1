import { Badge, Card, EmptyState } from "@/components/ui/card";
import { calendarDayLabel } from "@/lib/calendar-day-label";
import type { Measure, SetEntry } from "@/lib/engine/types";
import { setText } from "./set-text";

interface HistoryRung {
  rungId: string;
  rungName: string;
  ladderName: string;
  measure: Measure;
  sessions: { date: string; sets: SetEntry[]; pain: boolean; best: number | null }[];
}

/** Past sessions, one card per rung, newest first. */
export function RungHistoryList({ rungs }: { rungs: HistoryRung[] }) {
  if (rungs.length === 0) {
    return <EmptyState title="No sessions yet">Sets you log on Today show up here, one card per rung.</EmptyState>;
  }
  return (
    <div className="flex flex-col gap-4">
      {rungs.map((rung) => (
        <Card key={rung.rungId}>
          <p className="text-xs font-semibold uppercase tracking-wide text-muted">{rung.ladderName}</p>
          <h2 className="font-display text-lg font-bold">{rung.rungName}</h2>
          <ul className="mt-3 flex flex-col divide-y divide-line">
            {rung.sessions.map((session) => (
              <li key={session.date} className="flex flex-col gap-1 py-2">
                <div className="flex items-center justify-between">
                  <time dateTime={session.date} className="font-semibold">
                    {calendarDayLabel(session.date)}
                  </time>
                  {session.pain ? <Badge tone="danger">pain</Badge> : null}
                </div>
                <p className="text-sm text-muted">{session.sets.map((set) => setText(rung.measure, set)).join(" · ")}</p>
              </li>
            ))}
          </ul>
        </Card>
      ))}
    </div>
  );
}
