"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { SelectField, TextField } from "@/components/ui/field";
import { api, applyIssues } from "@/lib/client/api";
import { ZCreateLadder, type LadderDto } from "@/lib/validation/ladders";

type FormIn = z.input<typeof ZCreateLadder>;
type FormOut = z.output<typeof ZCreateLadder>;

/** Name, target skill and promotion mode; rungs are added in the editor it opens. */
export function NewLadderForm() {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [error, setError] = useState<string | null>(null);
  const form = useForm<FormIn, unknown, FormOut>({
    resolver: zodResolver(ZCreateLadder),
    defaultValues: { name: "", targetSkill: "", promotionMode: "auto", rungs: [] },
  });
  const create = useMutation({
    mutationFn: (values: FormOut) => api<LadderDto>("/api/v1/ladders", { method: "POST", json: values }),
    onSuccess: (ladder) => {
      void queryClient.invalidateQueries({ queryKey: ["ladders"] });
      router.push(`/coach/ladders/${ladder.id}`);
    },
    onError: (e) => setError(applyIssues(e, form.setError)),
  });
  const { errors } = form.formState;
  return (
    <Card>
      <h2 className="mb-4 font-display text-lg font-bold">New ladder</h2>
      <form onSubmit={form.handleSubmit((v) => create.mutate(v))} className="flex flex-col gap-4" noValidate>
        {error ? <Notice tone="danger">{error}</Notice> : null}
        <TextField label="Ladder name" error={errors.name?.message} {...form.register("name")} />
        <TextField label="Target skill" placeholder="e.g. Straddle planche" error={errors.targetSkill?.message} {...form.register("targetSkill")} />
        <SelectField
          label="Promotion"
          hint="Automatic moves an athlete up as soon as the standard is met; otherwise you confirm each move."
          error={errors.promotionMode?.message}
          {...form.register("promotionMode")}
        >
          <option value="auto">Automatic</option>
          <option value="approve">Coach approves</option>
        </SelectField>
        <Button type="submit" disabled={create.isPending}>
          {create.isPending ? "Creating…" : "Create and add rungs"}
        </Button>
      </form>
    </Card>
  );
}
