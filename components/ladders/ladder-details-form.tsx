"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { FieldFrame, SelectField, TextField } from "@/components/ui/field";
import { applyIssues } from "@/lib/client/api";
import { ZLadderPatch, type LadderDto } from "@/lib/validation/ladders";
import { usePatchLadder } from "./use-ladder";

type FormIn = z.input<typeof ZLadderPatch>;
type FormOut = z.output<typeof ZLadderPatch>;

export function LadderDetailsForm({ ladder }: { ladder: LadderDto }) {
  const patch = usePatchLadder(ladder.id);
  const [message, setMessage] = useState<{ tone: "moss" | "danger"; text: string } | null>(null);
  const form = useForm<FormIn, unknown, FormOut>({
    resolver: zodResolver(ZLadderPatch),
    values: { name: ladder.name, targetSkill: ladder.targetSkill, promotionMode: ladder.promotionMode, notes: ladder.notes ?? "" },
  });
  const { errors } = form.formState;
  const submit = form.handleSubmit((values) =>
    patch.mutate(
      { ...values, notes: values.notes ? values.notes : null },
      {
        onSuccess: () => setMessage({ tone: "moss", text: "Saved." }),
        onError: (e) => setMessage({ tone: "danger", text: applyIssues(e, form.setError) }),
      },
    ),
  );
  return (
    <Card>
      <h2 className="mb-4 font-display text-lg font-bold">Ladder details</h2>
      <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
        {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
        <fieldset disabled={ladder.archived} className="flex flex-col gap-4">
          <TextField label="Ladder name" error={errors.name?.message} {...form.register("name")} />
          <TextField label="Target skill" error={errors.targetSkill?.message} {...form.register("targetSkill")} />
          <SelectField label="Promotion" error={errors.promotionMode?.message} {...form.register("promotionMode")}>
            <option value="auto">Automatic</option>
            <option value="approve">Coach approves</option>
          </SelectField>
          <FieldFrame label="Notes for coaches" id="ladder-notes" error={errors.notes?.message}>
            <textarea id="ladder-notes" rows={3} className="w-full rounded-lg border border-line bg-surface px-3 py-2" {...form.register("notes")} />
          </FieldFrame>
          <Button type="submit" disabled={patch.isPending}>
            {patch.isPending ? "Saving…" : "Save details"}
          </Button>
        </fieldset>
      </form>
    </Card>
  );
}
