import { Button } from "@/components/ui/button";
import { Badge } from "@/components/ui/card";
import type { ReadinessCell as Cell } from "@/lib/validation/readiness";

const STATUS_TEXT: Record<Cell["status"], { label: string; tone: "neutral" | "moss" | "ember" | "danger" | "sky" }> = {
  not_yet: { label: "Not yet", tone: "neutral" },
  met: { label: "Standard met", tone: "moss" },
  blocked: { label: "Waits on a prerequisite", tone: "sky" },
  step_down: { label: "Step down proposed", tone: "danger" },
  pending_approval: { label: "Awaiting approval", tone: "ember" },
  achieved: { label: "Skill reached", tone: "moss" },
};

/** One athlete × ladder: rung, readiness bar, this week's sessions, days on the rung, pain and moves. */
export function ReadinessCellView({
  cell,
  athleteName,
  approving,
  onApprove,
}: {
  cell: Cell;
  athleteName: string;
  approving: boolean;
  onApprove: (promotionId: string) => void;
}) {
  const status = STATUS_TEXT[cell.status];
  return (
    <div className="flex min-w-44 flex-col gap-1.5">
      <p className="text-sm font-semibold leading-tight text-ink">{cell.rungName}</p>
      <div className="flex items-center gap-2" title={`Readiness ${cell.readiness} %`}>
        <span className="h-1.5 flex-1 overflow-hidden rounded-full bg-sunken" aria-hidden>
          <span className="block h-full rounded-full bg-ember" style={{ width: `${cell.readiness}%` }} />
        </span>
        <span className="font-mono text-xs tabular-nums">{cell.readiness} %</span>
      </div>
      <div className="flex flex-wrap gap-1">
        <Badge tone={status.tone}>{status.label}</Badge>
        {cell.pain ? <Badge tone="danger">Pain flagged</Badge> : null}
        {cell.promotionsThisWeek > 0 ? <Badge tone="moss">Moved up ×{cell.promotionsThisWeek}</Badge> : null}
      </div>
      <p className="text-xs text-muted">
        {cell.sessionsThisWeek === 0 ? "No sessions" : `${cell.sessionsThisWeek} session${cell.sessionsThisWeek === 1 ? "" : "s"}`} ·{" "}
        {cell.daysOnRung} d on rung
      </p>
      {cell.pendingPromotionId ? (
        <Button
          size="sm"
          variant="primary"
          disabled={approving}
          onClick={() => onApprove(cell.pendingPromotionId!)}
          aria-label={`Approve the promotion of ${athleteName} on ${cell.ladderName}`}
        >
          {approving ? "Approving…" : "Approve"}
        </Button>
      ) : null}
    </div>
  );
}
