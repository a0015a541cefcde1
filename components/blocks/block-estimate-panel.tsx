import { Card, Notice } from "@/components/ui/card";
import { formatDuration } from "@/lib/training/block-estimate";

interface Warning {
  rule: string;
  slotIndexes: number[];
  message: string;
}

/** The live estimate and the pairing warnings beside the block editor. */
export function BlockEstimatePanel({ durationSec, warnings, missingRungs }: { durationSec: number; warnings: Warning[]; missingRungs: number }) {
  return (
    <Card className="flex flex-col gap-3" aria-live="polite">
      <div>
        <p className="text-sm font-semibold text-muted">Estimated time</p>
        <p className="font-display text-3xl font-bold" data-testid="block-duration">
          {formatDuration(durationSec)}
        </p>
        <p className="mt-1 text-xs text-muted">
          Sets × (work + rest), read from each ladder&apos;s first rung. Each athlete&apos;s own rung changes it a little.
        </p>
        {missingRungs > 0 ? <p className="mt-1 text-xs text-ember">A ladder without rungs counts as rest only.</p> : null}
      </div>
      <div>
        <p className="mb-2 text-sm font-semibold text-muted">Order check</p>
        {warnings.length === 0 ? (
          <p className="text-sm text-moss-strong">No pairing concerns in this order.</p>
        ) : (
          <ul className="flex flex-col gap-2" aria-label="Pairing warnings">
            {warnings.map((warning) => (
              <li key={`${warning.rule}-${warning.slotIndexes.join("-")}`}>
                <Notice tone="ember">{warning.message}.</Notice>
              </li>
            ))}
          </ul>
        )}
        <p className="mt-2 text-xs text-muted">Rules of thumb from common practice; you know your athletes best.</p>
      </div>
    </Card>
  );
}
