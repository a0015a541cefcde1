"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { formatMoment } from "@/lib/validation/form-checks";

const SPEEDS = [0.25, 0.5, 1] as const;
/** One frame at 30 fps, the rate phones film at by default. */
export const FRAME_SECONDS = 1 / 30;

/** Slow motion and frame-by-frame stepping for reviewing a movement; the player applies them. */
export function PlayerControls({ now, onSpeed, onStep }: { now: number; onSpeed: (rate: number) => void; onStep: (delta: number) => void }) {
  const [speed, setSpeed] = useState<number>(1);
  return (
    <div className="flex flex-wrap items-center gap-2">
      <div role="group" aria-label="Playback speed" className="flex gap-1">
        {SPEEDS.map((value) => (
          <Button
            key={value}
            size="sm"
            variant={speed === value ? "primary" : "secondary"}
            aria-pressed={speed === value}
            onClick={() => {
              setSpeed(value);
              onSpeed(value);
            }}
          >
            {value}×
          </Button>
        ))}
      </div>
      <div role="group" aria-label="Frame step" className="flex gap-1">
        <Button size="sm" variant="secondary" onClick={() => onStep(-FRAME_SECONDS)} aria-label="Back one frame">
          −1 frame
        </Button>
        <Button size="sm" variant="secondary" onClick={() => onStep(FRAME_SECONDS)} aria-label="Forward one frame">
          +1 frame
        </Button>
      </div>
      <span className="ml-auto font-mono text-sm text-muted" aria-label="Current moment">
        {formatMoment(now)}.{String(Math.floor((now % 1) * 100)).padStart(2, "0")}
      </span>
    </div>
  );
}
