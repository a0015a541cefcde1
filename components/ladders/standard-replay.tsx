"use client";

import { useId, useState } from "react";
import { useWatch, type Control } from "react-hook-form";
import type { z } from "zod";
import type { Measure } from "@/lib/engine";
import { replayableStandard } from "@/lib/validation/backtest";
import type { ZRungInput } from "@/lib/validation/ladders";
import { BacktestPanel } from "./backtest-panel";
import { useSettledValue } from "./use-settled-value";

type FormIn = z.input<typeof ZRungInput>;
type FormOut = z.output<typeof ZRungInput>;

/**
 * Beside the standard fields of a saved rung: the standard as typed, replayed over the sessions of
 * everyone who has been on the rung. Nothing is saved by it. Folding it away stops the replays, so a
 * coach on a phone can type without a table in the way.
 */
export function StandardReplay({ control, ladderId, rungId }: { control: Control<FormIn, unknown, FormOut>; ladderId: string; rungId: string }) {
  const headingId = useId();
  const [open, setOpen] = useState(true);
  const typed = useWatch({ control, name: "standard" });
  const measure = useWatch({ control, name: "measure" }) as Measure;
  const usable = replayableStandard(measure, typed);
  const standard = useSettledValue(usable, 500);

  return (
    <section aria-labelledby={headingId} className="min-w-0 rounded-lg border border-line p-4">
      <details open={open} onToggle={(e) => setOpen(e.currentTarget.open)}>
        <summary id={headingId} className="cursor-pointer font-display font-bold">
          Past sessions under this standard
        </summary>
        {open ? (
          <div className="mt-3 flex flex-col gap-2">
            {usable === null ? (
              <p className="text-xs text-muted">
                Finish the standard to replay it.{standard ? " Until then this shows the last complete one." : ""}
              </p>
            ) : null}
            {standard ? <BacktestPanel ladderId={ladderId} rungId={rungId} standard={standard} compact /> : null}
          </div>
        ) : null}
      </details>
    </section>
  );
}
