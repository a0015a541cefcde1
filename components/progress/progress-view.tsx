import { EmptyState, Notice } from "@/components/ui/card";
import type { LoadDto } from "@/lib/validation/load";
import type { ProgressDto } from "@/lib/validation/progress";
import { LadderProgressCard } from "./ladder-progress-card";
import { LoadPanel } from "./load-panel";

/** Progress per ladder and the training load, shared by the coach's and the athlete's pages. */
export function ProgressView({ progress, load, emptyText }: { progress: ProgressDto; load: LoadDto; emptyText: string }) {
  return (
    <div className="flex flex-col gap-5">
      <Notice tone="sky">
        Stop on sharp pain and flag it in your log. Rungwise helps plan and track training; it does not replace a qualified coach,
        physiotherapist or physician.
      </Notice>
      {progress.ladders.length === 0 ? <EmptyState title="Not on a ladder yet">{emptyText}</EmptyState> : null}
      {progress.ladders.map((ladder) => (
        <LadderProgressCard key={ladder.ladderId} ladder={ladder} />
      ))}
      <LoadPanel load={load} />
    </div>
  );
}
