"use client";

import { useWatch, type UseFormReturn } from "react-hook-form";
import type { z } from "zod";
import { TextField } from "@/components/ui/field";
import { describeStandard, type Measure } from "@/lib/engine";
import { ZStandardInput, type ZRungInput } from "@/lib/validation/ladders";
import { StepDownFields } from "./step-down-fields";

type FormIn = z.input<typeof ZRungInput>;
type FormOut = z.output<typeof ZRungInput>;

const toNumber = (v: unknown) => (v === "" || v === null || v === undefined ? undefined : Number(v));
const toNullableNumber = (v: unknown) => (v === "" || v === null || v === undefined ? null : Number(v));

const UNIT: Record<Measure, string> = {
  hold_seconds: "seconds per set",
  hold_seconds_each_side: "seconds per side",
  eccentric_seconds: "seconds per lowering",
  reps: "reps per set",
  reps_each_side: "reps per side",
  distance_m: "metres per set",
};

/** The readiness standard's numbers, with the rule said in plain words as the coach types. */
export function StandardFields({ form, measure, idBase }: { form: UseFormReturn<FormIn, unknown, FormOut>; measure: Measure; idBase: string }) {
  const errors = form.formState.errors.standard;
  const watched = useWatch({ control: form.control, name: "standard" });
  const parsed = ZStandardInput.safeParse(watched);
  const num = (name: "sets" | "minValue" | "sessionsRequired" | "sessionsWindow" | "minDaysOnRung") =>
    form.register(`standard.${name}`, { setValueAs: toNumber });
  return (
    <fieldset className="flex flex-col gap-3 rounded-lg border border-line p-4">
      <legend className="px-1 font-display font-bold">Readiness standard</legend>
      <div className="grid gap-3 sm:grid-cols-3">
        <TextField label="Sets" type="number" inputMode="numeric" error={errors?.sets?.message} {...num("sets")} />
        <TextField label={`Target (${UNIT[measure]})`} type="number" inputMode="decimal" step="any" error={errors?.minValue?.message} {...num("minValue")} />
        {measure === "eccentric_seconds" ? (
          <TextField
            label="Lowerings per set"
            type="number"
            inputMode="numeric"
            error={errors?.minReps?.message}
            {...form.register("standard.minReps", { setValueAs: toNullableNumber })}
          />
        ) : null}
        <TextField
          label="Effort ceiling: RPE (optional)"
          type="number"
          inputMode="decimal"
          step="0.5"
          hint="Or reps in reserve; not both."
          error={errors?.maxRpe?.message}
          {...form.register("standard.maxRpe", { setValueAs: toNullableNumber })}
        />
        <TextField
          label="Reps in reserve (optional)"
          type="number"
          inputMode="numeric"
          error={errors?.minRir?.message}
          {...form.register("standard.minRir", { setValueAs: toNullableNumber })}
        />
        <TextField label="Good sessions needed" type="number" inputMode="numeric" error={errors?.sessionsRequired?.message} {...num("sessionsRequired")} />
        <TextField label="…out of the last" type="number" inputMode="numeric" error={errors?.sessionsWindow?.message} {...num("sessionsWindow")} />
        <TextField label="Minimum days on rung" type="number" inputMode="numeric" error={errors?.minDaysOnRung?.message} {...num("minDaysOnRung")} />
      </div>
      <label className="flex items-center gap-2 text-sm font-semibold" htmlFor={`${idBase}-pain-free`}>
        <input id={`${idBase}-pain-free`} type="checkbox" className="h-4 w-4" {...form.register("standard.painFree")} />
        Only pain-free sessions count
      </label>
      <p className="rounded-lg bg-moss-soft px-3 py-2 text-sm text-moss-strong" aria-live="polite" data-testid="standard-preview">
        <span className="font-semibold">In words: </span>
        {parsed.success ? describeStandard(measure, parsed.data) : "complete the numbers above to see the rule in words."}
      </p>
      <StepDownFields form={form} idBase={idBase} />
    </fieldset>
  );
}
