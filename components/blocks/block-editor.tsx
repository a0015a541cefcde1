"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useFieldArray, useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { TextField } from "@/components/ui/field";
import { TextAreaField } from "@/components/ui/text-area";
import { api, applyIssues } from "@/lib/client/api";
import { blockWarnings, estimateBlockSec } from "@/lib/training/block-estimate";
import { SLOTS_MAX, SLOTS_MIN, ZCreateBlock, type BlockDto, type LadderChoice } from "@/lib/validation/blocks";
import { BlockEstimatePanel } from "./block-estimate-panel";
import { SlotRow } from "./slot-row";

export type BlockFormIn = z.input<typeof ZCreateBlock>;
type FormOut = z.output<typeof ZCreateBlock>;

function defaultsOf(block: BlockDto | null, ladders: LadderChoice[]): BlockFormIn {
  if (block) {
    return {
      name: block.name,
      rounds: block.rounds,
      restBetweenSlotsSec: block.restBetweenSlotsSec,
      restBetweenRoundsSec: block.restBetweenRoundsSec,
      notes: block.notes ?? "",
      slots: block.slots.map((s) => ({ ladderId: s.ladderId, sets: s.sets, target: s.target ?? "", note: s.note ?? "" })),
    };
  }
  const first = ladders.slice(0, SLOTS_MIN).map((l) => ({ ladderId: l.id, sets: null, target: "", note: "" }));
  return { name: "", rounds: 3, restBetweenSlotsSec: 60, restBetweenRoundsSec: 120, notes: "", slots: first };
}

/** Create or edit a block: slots with ladder pickers, live estimate and pairing warnings. */
export function BlockEditor({ block, ladders }: { block: BlockDto | null; ladders: LadderChoice[] }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [message, setMessage] = useState<{ tone: "moss" | "danger"; text: string } | null>(null);
  const form = useForm<BlockFormIn, unknown, FormOut>({ resolver: zodResolver(ZCreateBlock), defaultValues: defaultsOf(block, ladders) });
  const slots = useFieldArray({ control: form.control, name: "slots" });
  const live = useWatch({ control: form.control });

  const byId = new Map(ladders.map((l) => [l.id, l]));
  const estimateInput = {
    rounds: Number(live.rounds) || 0,
    restBetweenSlotsSec: Number(live.restBetweenSlotsSec) || 0,
    restBetweenRoundsSec: Number(live.restBetweenRoundsSec) || 0,
    slots: (live.slots ?? []).map((s) => ({ sets: s?.sets ?? null, rung: byId.get(s?.ladderId ?? "")?.firstRung ?? null })),
  };
  const missingRungs = estimateInput.slots.filter((s) => !s.rung).length;

  const save = useMutation({
    mutationFn: (values: FormOut) =>
      block
        ? api<BlockDto>(`/api/v1/blocks/${block.id}`, { method: "PATCH", json: values })
        : api<BlockDto>("/api/v1/blocks", { method: "POST", json: values }),
    onSuccess: (saved) => {
      void queryClient.invalidateQueries({ queryKey: ["blocks"] });
      setMessage({ tone: "moss", text: `Saved. Estimated ${Math.round(saved.durationSec / 60)} min.` });
      if (!block) router.push(`/coach/blocks/${saved.id}`);
      else router.refresh();
    },
    onError: (error) => setMessage({ tone: "danger", text: applyIssues(error, form.setError) }),
  });
  const remove = useMutation({
    mutationFn: () => api(`/api/v1/blocks/${block!.id}`, { method: "DELETE" }),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: ["blocks"] });
      router.push("/coach/blocks");
    },
    onError: (error) => setMessage({ tone: "danger", text: applyIssues(error, form.setError) }),
  });

  const { errors } = form.formState;
  const number = { valueAsNumber: true } as const;
  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_340px]">
      <form onSubmit={form.handleSubmit((v) => save.mutate(v))} className="flex flex-col gap-4" noValidate aria-label="Block">
        {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
        <Card className="grid gap-4 md:grid-cols-2">
          <div className="md:col-span-2">
            <TextField label="Block name" placeholder="e.g. Balance and press" error={errors.name?.message} {...form.register("name")} />
          </div>
          <TextField label="Rounds" type="number" min={1} max={20} error={errors.rounds?.message} {...form.register("rounds", number)} />
          <TextField label="Rest between slots (s)" type="number" min={0} error={errors.restBetweenSlotsSec?.message} {...form.register("restBetweenSlotsSec", number)} />
          <TextField label="Rest between rounds (s)" type="number" min={0} error={errors.restBetweenRoundsSec?.message} {...form.register("restBetweenRoundsSec", number)} />
          <div className="md:col-span-2">
            <TextAreaField label="Notes for athletes (optional)" error={errors.notes?.message} {...form.register("notes")} />
          </div>
        </Card>

        <section aria-label="Slots" className="flex flex-col gap-3">
          <div className="flex items-end justify-between">
            <h2 className="font-display text-lg font-bold">Slots, in rotation</h2>
            <span className="text-sm text-muted">
              {slots.fields.length} of {SLOTS_MIN}–{SLOTS_MAX}
            </span>
          </div>
          {ladders.length === 0 ? <Notice tone="ember">Your team has no ladders yet. Add one on the Ladders page first.</Notice> : null}
          {slots.fields.map((field, index) => (
            <SlotRow
              key={field.id}
              index={index}
              count={slots.fields.length}
              form={form}
              ladders={ladders}
              onMove={(to) => slots.move(index, to)}
              onRemove={() => slots.remove(index)}
            />
          ))}
          {errors.slots?.message || errors.slots?.root?.message ? (
            <p role="alert" className="text-sm text-danger">
              {errors.slots?.message ?? errors.slots?.root?.message}
            </p>
          ) : null}
          <div>
            <Button
              variant="secondary"
              disabled={slots.fields.length >= SLOTS_MAX || ladders.length === 0}
              onClick={() => slots.append({ ladderId: ladders[0]?.id ?? "", sets: null, target: "", note: "" })}
            >
              Add a slot
            </Button>
          </div>
        </section>

        <div className="flex gap-2">
          <Button type="submit" disabled={save.isPending}>
            {save.isPending ? "Saving…" : block ? "Save block" : "Create block"}
          </Button>
          {block ? (
            <Button
              variant="ghost"
              disabled={remove.isPending}
              onClick={() => {
                if (window.confirm("Remove this block? If a plan uses it, it is archived and those plans keep it.")) remove.mutate();
              }}
            >
              Remove block
            </Button>
          ) : null}
        </div>
      </form>
      <aside className="lg:sticky lg:top-20 lg:self-start">
        <BlockEstimatePanel durationSec={estimateBlockSec(estimateInput)} warnings={blockWarnings(estimateInput)} missingRungs={missingRungs} />
      </aside>
    </div>
  );
}
