"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { isEachSide } from "@/lib/engine/set-value";
import type { Measure } from "@/lib/engine/types";
import { ZSet, type SetInput } from "@/lib/validation/logs";
import { HoldTimer } from "./hold-timer";

export interface SetSubmission {
  set: SetInput;
  pain: boolean;
  note: string | null;
}

const BIG = "h-14 text-2xl font-semibold tabular-nums";

function amountLabel(measure: Measure): string {
  if (measure === "reps" || measure === "reps_each_side") return "Reps";
  if (measure === "distance_m") return "Metres";
  return measure === "eccentric_seconds" ? "Seconds per lowering" : "Seconds";
}

function num(text: string): number | undefined {
  const trimmed = text.trim().replace(",", ".");
  return trimmed === "" ? undefined : Number(trimmed);
}

/**
 * One set at a time, with big inputs: the amount (each side where the measure asks for it, lowerings
 * and seconds for eccentric rungs), effort as RPE or RIR, and a pain flag with a short note. Checked
 * with the same zod schema the API uses.
 */
export function SetForm({
  measure,
  preferRir,
  onSubmit,
}: {
  measure: Measure;
  preferRir: boolean;
  onSubmit: (submission: SetSubmission) => void;
}) {
  const sided = isEachSide(measure);
  const timed = measure === "hold_seconds" || measure === "hold_seconds_each_side" || measure === "eccentric_seconds";
  const [value, setValue] = useState("");
  const [left, setLeft] = useState("");
  const [right, setRight] = useState("");
  const [lowerings, setLowerings] = useState("");
  const [effortKind, setEffortKind] = useState<"rpe" | "rir">(preferRir ? "rir" : "rpe");
  const [effort, setEffort] = useState("");
  const [pain, setPain] = useState(false);
  const [note, setNote] = useState("");
  const [errors, setErrors] = useState<Record<string, string>>({});

  function fillFromTimer(seconds: number) {
    if (!sided) setValue(String(seconds));
    else if (left === "") setLeft(String(seconds));
    else setRight(String(seconds));
  }

  function submit() {
    const candidate: Record<string, number | undefined> = sided ? { left: num(left), right: num(right) } : { value: num(value) };
    if (measure === "eccentric_seconds") candidate.reps = num(lowerings);
    candidate[effortKind] = num(effort);
    const parsed = ZSet.safeParse(Object.fromEntries(Object.entries(candidate).filter(([, v]) => v !== undefined)));
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0] ?? "value"), i.message])));
      return;
    }
    setErrors({});
    onSubmit({ set: parsed.data, pain, note: pain && note.trim() ? note.trim() : null });
    setValue("");
    setLeft("");
    setRight("");
    setEffort("");
    setPain(false);
    setNote("");
  }

  return (
    <form
      className="flex flex-col gap-3"
      onSubmit={(event) => {
        event.preventDefault();
        submit();
      }}
    >
      {timed ? <HoldTimer onStop={fillFromTimer} /> : null}
      <div className="grid grid-cols-2 gap-3">
        {measure === "eccentric_seconds" ? (
          <TextField label="Lowerings" inputMode="numeric" className={BIG} value={lowerings} onChange={(e) => setLowerings(e.target.value)} error={errors.reps} />
        ) : null}
        {sided ? (
          <>
            <TextField label={`Left (${amountLabel(measure).toLowerCase()})`} inputMode="decimal" className={BIG} value={left} onChange={(e) => setLeft(e.target.value)} error={errors.left} />
            <TextField label={`Right (${amountLabel(measure).toLowerCase()})`} inputMode="decimal" className={BIG} value={right} onChange={(e) => setRight(e.target.value)} error={errors.right} />
          </>
        ) : (
          <TextField label={amountLabel(measure)} inputMode="decimal" className={BIG} value={value} onChange={(e) => setValue(e.target.value)} error={errors.value} />
        )}
        <div className="flex flex-col gap-1.5">
          <div className="flex items-center justify-between">
            <span className="text-sm font-semibold">Effort</span>
            <div role="group" aria-label="Effort scale" className="flex overflow-hidden rounded-md border border-line text-xs font-semibold">
              {(["rpe", "rir"] as const).map((kind) => (
                <button
                  key={kind}
                  type="button"
                  aria-pressed={effortKind === kind}
                  className={effortKind === kind ? "bg-moss px-2 py-1 text-paper" : "px-2 py-1"}
                  onClick={() => setEffortKind(kind)}
                >
                  {kind.toUpperCase()}
                </button>
              ))}
            </div>
          </div>
          <select
            aria-label={effortKind === "rpe" ? "RPE (1–10)" : "Reps in reserve"}
            className="h-14 rounded-lg border border-line bg-surface px-3 text-xl"
            value={effort}
            onChange={(e) => setEffort(e.target.value)}
          >
            <option value="">–</option>
            {(effortKind === "rpe" ? [1, 2, 3, 4, 5, 6, 6.5, 7, 7.5, 8, 8.5, 9, 9.5, 10] : [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10]).map((n) => (
              <option key={n} value={n}>
                {n}
              </option>
            ))}
          </select>
          {errors[effortKind] ? <p className="text-sm text-danger">{errors[effortKind]}</p> : null}
        </div>
      </div>
      <label className="flex min-h-12 items-center gap-3 rounded-lg border border-line px-3">
        <input type="checkbox" className="h-6 w-6 accent-[var(--danger)]" checked={pain} onChange={(e) => setPain(e.target.checked)} />
        <span className="font-semibold">Pain during this set</span>
      </label>
      {pain ? (
        <TextField label="Where and how it hurt (your coach sees this)" value={note} maxLength={500} onChange={(e) => setNote(e.target.value)} />
      ) : null}
      <Button type="submit" size="lg">
        Log set
      </Button>
    </form>
  );
}
