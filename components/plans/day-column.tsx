"use client";

import { formatDuration } from "@/lib/training/block-estimate";
import type { BlockDto } from "@/lib/validation/blocks";

interface Props {
  label: string;
  blockIds: string[];
  blocks: Map<string, BlockDto>;
  choices: BlockDto[];
  durationSec: number;
  error?: string;
  onChange: (blockIds: string[]) => void;
}

/** One weekday of the plan grid: its blocks in order, an estimate, and a picker to add one. */
export function DayColumn({ label, blockIds, blocks, choices, durationSec, error, onChange }: Props) {
  const move = (from: number, to: number) => {
    const next = [...blockIds];
    const [item] = next.splice(from, 1);
    next.splice(to, 0, item!);
    onChange(next);
  };
  return (
    <section aria-label={label} className="flex min-h-48 flex-col gap-2 rounded-card border border-line bg-surface p-3">
      <header className="flex items-baseline justify-between">
        <h3 className="font-display font-bold">{label}</h3>
        <span className="text-xs text-muted" data-testid={`day-estimate-${label}`}>
          {blockIds.length ? `≈ ${formatDuration(durationSec)}` : "Rest"}
        </span>
      </header>
      <ol className="flex flex-col gap-1.5">
        {blockIds.map((id, index) => (
          <li key={`${id}-${index}`} className="rounded-lg bg-sunken px-2 py-1.5 text-sm">
            <p className="font-semibold leading-tight">{blocks.get(id)?.name ?? "Unknown block"}</p>
            <div className="mt-1 flex gap-1 text-xs">
              <button type="button" className="text-muted hover:text-ink disabled:opacity-40" aria-label="Earlier" disabled={index === 0} onClick={() => move(index, index - 1)}>
                ↑
              </button>
              <button type="button" className="text-muted hover:text-ink disabled:opacity-40" aria-label="Later" disabled={index === blockIds.length - 1} onClick={() => move(index, index + 1)}>
                ↓
              </button>
              <button type="button" className="ml-auto text-danger hover:underline" onClick={() => onChange(blockIds.filter((_, i) => i !== index))}>
                Remove
              </button>
            </div>
          </li>
        ))}
      </ol>
      <select
        aria-label={`Add a block on ${label}`}
        className="mt-auto h-9 w-full rounded-lg border border-line bg-surface px-2 text-sm"
        value=""
        onChange={(e) => {
          if (e.target.value) onChange([...blockIds, e.target.value]);
        }}
        disabled={choices.length === 0}
      >
        <option value="">+ Add block</option>
        {choices.map((b) => (
          <option key={b.id} value={b.id}>
            {b.name}
          </option>
        ))}
      </select>
      {error ? (
        <p role="alert" className="text-xs text-danger">
          {error}
        </p>
      ) : null}
    </section>
  );
}
