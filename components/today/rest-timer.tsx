"use client";

import { useEffect, useState } from "react";
import { Button } from "@/components/ui/button";

/** A short beep through WebAudio where the browser allows it (it may refuse without a gesture). */
function beep() {
  try {
    const AudioCtx = window.AudioContext;
    if (!AudioCtx) return;
    const ctx = new AudioCtx();
    const osc = ctx.createOscillator();
    const gain = ctx.createGain();
    osc.frequency.value = 880;
    gain.gain.value = 0.15;
    osc.connect(gain).connect(ctx.destination);
    osc.start();
    osc.stop(ctx.currentTime + 0.25);
    osc.onended = () => void ctx.close();
  } catch {
    // No audio: the vibration and the on-screen "Rest over" still tell the athlete.
  }
}

/** A countdown of the block's rest; buzzes and beeps when it runs out. */
export function RestTimer({ seconds }: { seconds: number }) {
  const [endsAt, setEndsAt] = useState<number | null>(null);
  const [left, setLeft] = useState(seconds);
  const [done, setDone] = useState(false);

  useEffect(() => {
    if (endsAt === null) return;
    const timer = window.setInterval(() => {
      const remaining = Math.max(0, Math.ceil((endsAt - Date.now()) / 1000));
      setLeft(remaining);
      if (remaining === 0) {
        window.clearInterval(timer);
        setEndsAt(null);
        setDone(true);
        navigator.vibrate?.([200, 100, 200]);
        beep();
      }
    }, 250);
    return () => window.clearInterval(timer);
  }, [endsAt]);

  const running = endsAt !== null;
  return (
    <div className="flex items-center gap-3 rounded-lg bg-sunken px-3 py-2">
      <span className="min-w-16 font-mono text-2xl tabular-nums" aria-live="polite">
        {done ? "Go" : `${Math.floor(left / 60)}:${String(left % 60).padStart(2, "0")}`}
      </span>
      <Button
        variant="secondary"
        size="md"
        className="flex-1"
        onClick={() => {
          setDone(false);
          if (running) {
            setEndsAt(null);
            setLeft(seconds);
          } else {
            setLeft(seconds);
            setEndsAt(Date.now() + seconds * 1000);
          }
        }}
      >
        {running ? "Stop rest" : `Rest ${seconds} s`}
      </Button>
    </div>
  );
}
