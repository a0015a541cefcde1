"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/card";
import { FieldFrame, SelectField, TextField } from "@/components/ui/field";
import { api, applyIssues } from "@/lib/client/api";
import { defaultStandard, MEASURES, RUNG_TAGS, type Measure } from "@/lib/engine";
import { MEASURE_LABELS, ZRungInput, type RungDto } from "@/lib/validation/ladders";
import { PrerequisitePicker, type PickedRung } from "./prerequisite-picker";
import { StandardFields } from "./standard-fields";
import { StandardReplay } from "./standard-replay";
import { useLadderRefresh } from "./use-ladder";

type FormIn = z.input<typeof ZRungInput>;
type FormOut = z.output<typeof ZRungInput>;

const TEXTAREA = "w-full rounded-lg border border-line bg-surface px-3 py-2 aria-[invalid=true]:border-danger";
const blankToNull = (v: unknown) => (typeof v === "string" && v.trim() === "" ? null : v);

function defaultsOf(rung?: RungDto): FormIn {
  if (!rung) return { name: "", measure: "hold_seconds", setting: null, cues: null, caution: null, demoVideoUrl: null, tags: [], prerequisites: [], standard: defaultStandard("hold_seconds") };
  return {
    name: rung.name,
    measure: rung.measure,
    setting: rung.setting,
    cues: rung.cues,
    caution: rung.caution,
    demoVideoUrl: rung.demoVideoUrl,
    tags: rung.tags,
    prerequisites: rung.prerequisites.map((p) => p.rungId),
    standard: rung.standard,
  };
}

/** Adds a rung or edits one: movement, measure, cues, caution, tags, standard (with its words) and prerequisites. */
export function RungForm({ ladderId, rung, onDone }: { ladderId: string; rung?: RungDto; onDone: () => void }) {
  const refresh = useLadderRefresh(ladderId);
  const [error, setError] = useState<string | null>(null);
  const [picked, setPicked] = useState<PickedRung[]>(
    rung?.prerequisites.map((p) => ({ id: p.rungId, label: `${p.ladderName} › ${p.rungName}` })) ?? [],
  );
  const form = useForm<FormIn, unknown, FormOut>({ resolver: zodResolver(ZRungInput), defaultValues: defaultsOf(rung) });
  const save = useMutation({
    mutationFn: (values: FormOut) =>
      rung
        ? api<RungDto>(`/api/v1/rungs/${rung.id}`, { method: "PATCH", json: values })
        : api<RungDto>(`/api/v1/ladders/${ladderId}/rungs`, { method: "POST", json: values }),
    onSuccess: () => {
      void refresh();
      onDone();
    },
    onError: (e) => setError(applyIssues(e, form.setError)),
  });
  const { errors } = form.formState;
  const measure = useWatch({ control: form.control, name: "measure" }) as Measure;
  const setPrerequisites = (next: PickedRung[]) => {
    setPicked(next);
    form.setValue("prerequisites", next.map((p) => p.id), { shouldDirty: true });
  };
  const idBase = rung?.id ?? "new";

  return (
    <form onSubmit={form.handleSubmit((v) => save.mutate(v))} className="flex flex-col gap-4" noValidate aria-label={rung ? `Edit ${rung.name}` : "New rung"}>
      {error ? <Notice tone="danger">{error}</Notice> : null}
      <div className="grid gap-4 md:grid-cols-2">
        <TextField label="Rung name" error={errors.name?.message} {...form.register("name")} />
        <SelectField
          label="Measure"
          error={errors.measure?.message}
          {...form.register("measure", {
            onChange: (e: { target: { value: string } }) => {
              if (!rung) form.setValue("standard", defaultStandard(e.target.value as Measure));
            },
          })}
        >
          {MEASURES.map((m) => (
            <option key={m} value={m}>
              {MEASURE_LABELS[m]}
            </option>
          ))}
        </SelectField>
        <TextField
          label="Setting (optional)"
          placeholder="Band, box height, strap length…"
          error={errors.setting?.message}
          {...form.register("setting", { setValueAs: blankToNull })}
        />
        <TextField
          label="Demo video link (optional)"
          placeholder="https://…"
          error={errors.demoVideoUrl?.message}
          {...form.register("demoVideoUrl", { setValueAs: blankToNull })}
        />
      </div>
      <FieldFrame label="Cues (one per line)" id={`${idBase}-cues`} error={errors.cues?.message}>
        <textarea id={`${idBase}-cues`} rows={3} className={TEXTAREA} aria-invalid={errors.cues ? true : undefined} {...form.register("cues", { setValueAs: blankToNull })} />
      </FieldFrame>
      <FieldFrame
        label="Caution (athletes see this)"
        id={`${idBase}-caution`}
        hint="E.g. use a wall or a spotter for first inversions; stop on sharp pain."
        error={errors.caution?.message}
      >
        <textarea id={`${idBase}-caution`} rows={2} className={TEXTAREA} aria-invalid={errors.caution ? true : undefined} {...form.register("caution", { setValueAs: blankToNull })} />
      </FieldFrame>
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-sm font-semibold">Tags (used for fatigue warnings in blocks)</legend>
        <div className="flex flex-wrap gap-x-4 gap-y-2">
          {RUNG_TAGS.map((tag) => (
            <label key={tag} className="flex items-center gap-1.5 text-sm">
              <input type="checkbox" value={tag} className="h-4 w-4" {...form.register("tags")} />
              {tag.replace(/_/g, " ")}
            </label>
          ))}
        </div>
        {errors.tags ? <p className="text-sm text-danger">{errors.tags.message}</p> : null}
      </fieldset>
      {rung ? (
        <div className="grid gap-4 xl:grid-cols-[minmax(0,1fr)_minmax(0,22rem)] xl:items-start">
          <StandardFields form={form} measure={measure} idBase={idBase} />
          <StandardReplay control={form.control} ladderId={ladderId} rungId={rung.id} />
        </div>
      ) : (
        <>
          <StandardFields form={form} measure={measure} idBase={idBase} />
          <p className="text-xs text-muted">Once the rung is saved, editing it replays past sessions under the standard you type.</p>
        </>
      )}
      <PrerequisitePicker ladderId={ladderId} value={picked} onChange={setPrerequisites} error={errors.prerequisites?.message ?? errors.prerequisites?.[0]?.message} />
      <div className="flex gap-2">
        <Button type="submit" disabled={save.isPending}>
          {save.isPending ? "Saving…" : rung ? "Save rung" : "Add rung"}
        </Button>
        <Button variant="ghost" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
