import { Badge, Card } from "@/components/ui/card";
import type { LadderProgress } from "@/lib/validation/progress";
import { SessionChart } from "./session-chart";

const CAUSE: Record<LadderProgress["moves"][number]["cause"], string> = {
  placement: "Placed",
  auto: "Promoted (automatic)",
  approved: "Promoted (approved by coach)",
  manual: "Moved by coach",
  step_down: "Stepped down",
};

const UNIT: Record<string, string> = {
  hold_seconds: "s",
  hold_seconds_each_side: "s (weaker side)",
  reps: "reps",
  reps_each_side: "reps (weaker side)",
  eccentric_seconds: "s lowering",
  distance_m: "m",
};

function forecastText(ladder: LadderProgress): string {
  const f = ladder.forecast;
  if (f.reason === "already_met") return "The latest session already reached the standard's value.";
  if (f.reason === "too_few_sessions") return "Too few sessions on this rung for a trend yet (three are needed).";
  if (f.reason === "not_trending_up") return "Bests are not rising at the moment, so there is no estimate.";
  return f.estimate
    ? `If the recent trend holds, the standard's value might be reached around ${f.estimate}. This is an estimate, not a promise.`
    : "Rising, but too slowly for a useful estimate within a year.";
}

/** One ladder: where the athlete stands, how they got there, their sessions and the audit of moves. */
export function LadderProgressCard({ ladder }: { ladder: LadderProgress }) {
  const painNotes = ladder.sessions.filter((s) => s.pain);
  const unit = UNIT[ladder.standard?.measure ?? ""] ?? "";
  return (
    <Card className="flex flex-col gap-4">
      <header className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <h2 className="font-display text-xl font-semibold">{ladder.ladderName}</h2>
          <p className="text-sm text-muted">
            Rung {ladder.current.position} of {ladder.current.rungCount}: <span className="font-semibold text-ink">{ladder.current.rungName}</span>{" "}
            since {ladder.current.since}
          </p>
        </div>
        <Badge tone="ember">Readiness {ladder.current.readiness} %</Badge>
      </header>
      {ladder.standard ? <p className="text-sm">Standard: {ladder.standard.text}.</p> : null}
      <SessionChart ladder={ladder} unit={unit} />
      <p className="text-sm text-muted">{forecastText(ladder)}</p>
      <section>
        <h3 className="text-sm font-semibold">Path so far</h3>
        <ol className="mt-1 flex flex-wrap gap-2 text-sm">
          {ladder.path.map((step, i) => (
            <li key={`${step.rungId}-${i}`} className="rounded-lg bg-sunken px-2 py-1">
              {step.rungName ?? "Skill reached"} <span className="text-muted">· {step.reachedOn}</span>
            </li>
          ))}
        </ol>
      </section>
      {painNotes.length > 0 ? (
        <section>
          <h3 className="text-sm font-semibold text-danger">Pain flags</h3>
          <ul className="mt-1 text-sm">
            {painNotes.map((s) => (
              <li key={`${s.date}-${s.rungId}`}>
                {s.date}: {s.note ?? "no note"}
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <details className="text-sm">
        <summary className="cursor-pointer font-semibold text-moss">Moves ({ladder.moves.length})</summary>
        <table className="mt-2 w-full text-left">
          <thead className="text-xs text-muted">
            <tr>
              <th className="py-1">Date</th>
              <th>Change</th>
              <th>From → to</th>
              <th>By</th>
            </tr>
          </thead>
          <tbody>
            {ladder.moves.map((m) => (
              <tr key={m.id} className="border-t border-line">
                <td className="py-1">{m.effectiveOn}</td>
                <td>{CAUSE[m.cause]}</td>
                <td>
                  {m.fromRungName ?? "—"} → {m.toRungName ?? "skill reached"}
                </td>
                <td>{m.byName ?? "Rungwise"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </details>
    </Card>
  );
}
