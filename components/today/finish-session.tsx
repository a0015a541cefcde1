"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { TextField } from "@/components/ui/field";

/**
 * Session RPE (CR-10) and minutes, for training load (session RPE × minutes, Foster et al. 2001).
 * They are stored on the day's first log.
 */
export function FinishSession({
  canFinish,
  saved,
  onFinish,
}: {
  canFinish: boolean;
  saved: { durationMinutes: number | null; sessionRpe: number | null } | null;
  onFinish: (values: { durationMinutes: number; sessionRpe: number }) => void;
}) {
  const [minutes, setMinutes] = useState(saved?.durationMinutes ? String(saved.durationMinutes) : "");
  const [rpe, setRpe] = useState(saved?.sessionRpe ? String(saved.sessionRpe) : "");
  const [errors, setErrors] = useState<{ minutes?: string; rpe?: string }>({});
  const [done, setDone] = useState(false);

  function submit() {
    const m = Number(minutes);
    const r = Number(rpe);
    const next: typeof errors = {};
    if (!Number.isInteger(m) || m < 1 || m > 600) next.minutes = "Whole minutes from 1 to 600.";
    if (!(r >= 1 && r <= 10)) next.rpe = "Choose how hard the whole session felt, 1 to 10.";
    setErrors(next);
    if (next.minutes || next.rpe) return;
    onFinish({ durationMinutes: m, sessionRpe: r });
    setDone(true);
  }

  return (
    <Card className="flex flex-col gap-3">
      <h2 className="font-display text-lg font-bold">Finish session</h2>
      <p className="text-sm text-muted">How long did you train, and how hard was the whole session (1 easy – 10 maximal)?</p>
      {saved?.sessionRpe && saved.durationMinutes ? (
        <p className="text-sm">
          Saved: {saved.durationMinutes} min at session RPE {saved.sessionRpe}.
        </p>
      ) : null}
      <div className="grid grid-cols-2 gap-3">
        <TextField label="Minutes" inputMode="numeric" className="h-14 text-2xl" value={minutes} onChange={(e) => setMinutes(e.target.value)} error={errors.minutes} />
        <TextField label="Session RPE" inputMode="decimal" className="h-14 text-2xl" value={rpe} onChange={(e) => setRpe(e.target.value)} error={errors.rpe} />
      </div>
      <Button size="lg" variant="secondary" disabled={!canFinish} onClick={submit}>
        {done ? "Saved — update" : "Finish session"}
      </Button>
      {!canFinish ? <p className="text-xs text-muted">Log at least one set first.</p> : null}
    </Card>
  );
}
