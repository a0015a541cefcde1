"use client";

import { useWatch, type UseFormReturn } from "react-hook-form";
import type { z } from "zod";
import { TextField } from "@/components/ui/field";
import { DEFAULT_STEP_DOWN, type StepDownRule } from "@/lib/engine";
import type { ZRungInput } from "@/lib/validation/ladders";

type FormIn = z.input<typeof ZRungInput>;
type FormOut = z.output<typeof ZRungInput>;

const toNumber = (v: unknown) => (v === "" || v === null || v === undefined ? undefined : Number(v));

function ruleInWords(rule: StepDownRule): string {
  return `A step down to the rung below is proposed (never applied on its own) when pain is flagged in ${rule.painSessions} of the last ${rule.painWindow} sessions, or when the best set stays below ${rule.dropBelowPct} % of the target in ${rule.dropSessions} sessions in a row.`;
}

/**
 * When the engine proposes moving an athlete back down: on with the usual rule for every new rung;
 * the coach can tune the numbers or switch proposals off for this rung.
 */
export function StepDownFields({ form, idBase }: { form: UseFormReturn<FormIn, unknown, FormOut>; idBase: string }) {
  const rule = useWatch({ control: form.control, name: "standard.stepDown" });
  const on = rule !== null;
  const errors = form.formState.errors.standard?.stepDown;
  const num = (name: keyof StepDownRule) => form.register(`standard.stepDown.${name}`, { setValueAs: toNumber });
  const complete = rule && Object.values(rule).every((n) => typeof n === "number" && Number.isFinite(n));

  return (
    <div className="flex flex-col gap-3 border-t border-line pt-3">
      <label className="flex items-center gap-2 text-sm font-semibold" htmlFor={`${idBase}-step-down`}>
        <input
          id={`${idBase}-step-down`}
          type="checkbox"
          className="h-4 w-4"
          checked={on}
          onChange={(e) => form.setValue("standard.stepDown", e.target.checked ? { ...DEFAULT_STEP_DOWN } : null, { shouldDirty: true })}
        />
        Propose a step down when it hurts or slips
      </label>
      {on ? (
        <div className="grid gap-3 sm:grid-cols-4">
          <TextField label="Pain in" type="number" inputMode="numeric" error={errors?.painSessions?.message} {...num("painSessions")} />
          <TextField label="…of the last (sessions)" type="number" inputMode="numeric" error={errors?.painWindow?.message} {...num("painWindow")} />
          <TextField label="Best set below (% of target)" type="number" inputMode="numeric" error={errors?.dropBelowPct?.message} {...num("dropBelowPct")} />
          <TextField label="…sessions in a row" type="number" inputMode="numeric" error={errors?.dropSessions?.message} {...num("dropSessions")} />
        </div>
      ) : null}
      <p className="text-sm text-muted" data-testid="step-down-preview">
        {!on ? "No step-down proposals on this rung." : complete ? ruleInWords(rule as StepDownRule) : "Complete the numbers to see the rule in words."}
      </p>
    </div>
  );
}
