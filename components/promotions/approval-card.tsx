import Link from "next/link";
import { Button } from "@/components/ui/button";
import { Badge, Card } from "@/components/ui/card";
import type { PromotionDto } from "@/lib/validation/promotions";

/** One pending proposal: who, which ladder, from → to, why, and the one-click decision. */
export function ApprovalCard({
  promotion,
  busy,
  onApprove,
  onDecline,
}: {
  promotion: PromotionDto;
  busy: boolean;
  onApprove: () => void;
  onDecline: () => void;
}) {
  const down = promotion.direction === "down";
  const finishes = promotion.toRung === null;
  return (
    <Card className="flex flex-col gap-3 p-4 md:flex-row md:items-center md:justify-between">
      <div className="flex min-w-0 flex-col gap-1">
        <div className="flex flex-wrap items-center gap-2">
          <Link href={`/coach/athletes/${promotion.athlete.id}`} className="font-semibold text-ink hover:underline">
            {promotion.athlete.name}
          </Link>
          <span className="text-sm text-muted">· {promotion.ladder.name}</span>
          {down ? <Badge tone="danger">Step down</Badge> : finishes ? <Badge tone="ember">Finishes the ladder</Badge> : <Badge tone="moss">Move up</Badge>}
        </div>
        <p className="text-sm">
          <span className="font-semibold">{promotion.fromRung.name}</span>
          <span aria-hidden> → </span>
          <span className="sr-only"> to </span>
          <span className="font-semibold">{promotion.toRung?.name ?? "skill achieved"}</span>
        </p>
        <p className="text-sm text-muted">{promotion.explanation}</p>
        {down ? (
          <p className="text-xs text-danger">
            Check in with the athlete before they train this again; sharp or lasting pain needs a clinician, not a lower rung alone.
          </p>
        ) : null}
        <p className="font-mono text-xs text-muted">Evidence up to {promotion.effectiveOn}</p>
      </div>
      <div className="flex shrink-0 gap-2">
        <Button variant="secondary" disabled={busy} onClick={onDecline} aria-label={`Decline for ${promotion.athlete.name}`}>
          Decline
        </Button>
        <Button variant={down ? "danger" : "primary"} disabled={busy} onClick={onApprove} aria-label={`Approve for ${promotion.athlete.name}`}>
          {down ? "Approve step down" : "Approve"}
        </Button>
      </div>
    </Card>
  );
}
