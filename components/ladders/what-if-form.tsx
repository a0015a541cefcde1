"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { TextField } from "@/components/ui/field";
import { describeStandard, type Measure } from "@/lib/engine";
import { ZBacktestStandard, type BacktestStandard } from "@/lib/validation/backtest";
import { BacktestPanel } from "./backtest-panel";

type FormIn = z.input<typeof ZBacktestStandard>;

const asNumber = (v: unknown) => (v === "" || v === null ? undefined : Number(v));
const asNullableNumber = (v: unknown) => (v === "" || v === null ? null : Number(v));

/** Try a different standard on a rung and see, beside the form, what it would have done. */
export function WhatIfForm({
  ladderId,
  rungId,
  measure,
  current,
}: {
  ladderId: string;
  rungId: string;
  measure: Measure;
  current: BacktestStandard;
}) {
  const [tried, setTried] = useState<BacktestStandard>(current);
  const form = useForm<FormIn, unknown, BacktestStandard>({ resolver: zodResolver(ZBacktestStandard), defaultValues: current });
  const errors = form.formState.errors;
  const field = (name: "sets" | "minValue" | "sessionsRequired" | "sessionsWindow" | "minDaysOnRung") =>
    form.register(name, { setValueAs: asNumber });

  return (
    <div className="grid gap-6 lg:grid-cols-[360px_1fr]">
      <Card>
        <form className="flex flex-col gap-4" noValidate onSubmit={form.handleSubmit((values) => setTried(values))}>
          <div className="grid grid-cols-2 gap-3">
            <TextField label="Sets" type="number" inputMode="numeric" error={errors.sets?.message} {...field("sets")} />
            <TextField label="Value per set" type="number" inputMode="decimal" step="any" error={errors.minValue?.message} {...field("minValue")} />
            <TextField
              label="RPE at most"
              type="number"
              inputMode="decimal"
              step="0.5"
              hint="Leave empty for none"
              error={errors.maxRpe?.message}
              {...form.register("maxRpe", { setValueAs: asNullableNumber })}
            />
            <TextField
              label="Reps in reserve"
              type="number"
              inputMode="numeric"
              hint="Or this instead of RPE"
              error={errors.minRir?.message}
              {...form.register("minRir", { setValueAs: asNullableNumber })}
            />
            <TextField label="Sessions meeting it" type="number" inputMode="numeric" error={errors.sessionsRequired?.message} {...field("sessionsRequired")} />
            <TextField label="Of the last" type="number" inputMode="numeric" error={errors.sessionsWindow?.message} {...field("sessionsWindow")} />
            <TextField label="Days on the rung" type="number" inputMode="numeric" error={errors.minDaysOnRung?.message} {...field("minDaysOnRung")} />
          </div>
          <label className="flex items-center gap-2 text-sm font-semibold">
            <input type="checkbox" className="h-4 w-4" {...form.register("painFree")} />
            Sessions with a pain flag never count
          </label>
          <div className="flex gap-2">
            <Button type="submit">Replay</Button>
            <Button
              variant="ghost"
              onClick={() => {
                form.reset(current);
                setTried(current);
              }}
            >
              Back to the current standard
            </Button>
          </div>
        </form>
      </Card>
      <section aria-label="Replay" className="flex flex-col gap-3">
        <p className="text-sm text-muted">
          Trying: <span className="font-semibold text-ink">{describeStandard(measure, tried)}</span>
        </p>
        <BacktestPanel ladderId={ladderId} rungId={rungId} standard={tried} />
      </section>
    </div>
  );
}
