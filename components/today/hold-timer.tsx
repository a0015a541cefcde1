"use client";

import { useEffect, useRef, useState } from "react";
import { Button } from "@/components/ui/button";

/** A count-up stopwatch for holds: stopping it hands the whole seconds to the set form. */
export function HoldTimer({ onStop }: { onStop: (seconds: number) => void }) {
  const [startedAt, setStartedAt] = useState<number | null>(null);
  const [elapsed, setElapsed] = useState(0);
  const frame = useRef<number | null>(null);

  useEffect(() => {
    if (startedAt === null) return;
    const tick = () => {
      setElapsed((Date.now() - startedAt) / 1000);
      frame.current = window.setTimeout(tick, 100);
    };
    tick();
    return () => {
      if (frame.current !== null) window.clearTimeout(frame.current);
    };
  }, [startedAt]);

  function toggle() {
    if (startedAt === null) {
      setElapsed(0);
      setStartedAt(Date.now());
      return;
    }
    const seconds = Math.round((Date.now() - startedAt) / 1000);
    setStartedAt(null);
    setElapsed(seconds);
    onStop(seconds);
  }

  return (
    <div className="flex items-center gap-3">
      <span aria-live="off" data-testid="hold-timer" className="min-w-20 font-mono text-3xl tabular-nums">
        {elapsed.toFixed(1)}
        <span className="text-base text-muted"> s</span>
      </span>
      <Button variant={startedAt === null ? "secondary" : "primary"} size="lg" className="flex-1" onClick={toggle}>
        {startedAt === null ? "Start hold timer" : "Stop hold timer"}
      </Button>
    </div>
  );
}
