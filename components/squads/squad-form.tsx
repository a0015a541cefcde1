"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Controller, useForm, type FieldErrors } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { TextField } from "@/components/ui/field";
import { api, applyIssues } from "@/lib/client/api";
import { ZCreateSquad, type SquadDto } from "@/lib/validation/squads";
import { AthleteMultiSelect } from "./athlete-multi-select";
import { SQUADS_KEY } from "./use-team-data";

type FormIn = z.input<typeof ZCreateSquad>;
type FormOut = z.output<typeof ZCreateSquad>;

/** The first message under `athleteIds` or one of its entries (the API names the index). */
function membersError(errors: FieldErrors<FormIn>): string | undefined {
  const field = errors.athleteIds;
  if (!field) return undefined;
  if (field.message) return field.message;
  const entries = Array.isArray(field) ? field : Object.values(field);
  return entries.find((entry) => entry && typeof entry === "object" && "message" in entry)?.message as string | undefined;
}

async function saveSquad(squad: SquadDto | null, values: FormOut): Promise<SquadDto> {
  if (!squad) return api<SquadDto>("/api/v1/squads", { method: "POST", json: values });
  await api(`/api/v1/squads/${squad.id}`, { method: "PATCH", json: { name: values.name, description: values.description ?? null } });
  return api<SquadDto>(`/api/v1/squads/${squad.id}/members`, { method: "PUT", json: { athleteIds: values.athleteIds ?? [] } });
}

/** Create a squad, or edit one: name, description and the member list (saved optimistically). */
export function SquadForm({ squad, onDone }: { squad: SquadDto | null; onDone: () => void }) {
  const queryClient = useQueryClient();
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<FormIn, unknown, FormOut>({
    resolver: zodResolver(ZCreateSquad),
    defaultValues: { name: squad?.name ?? "", description: squad?.description ?? "", athleteIds: squad?.members.map((m) => m.id) ?? [] },
  });
  const save = useMutation({
    mutationFn: (values: FormOut) => saveSquad(squad, values),
    onMutate: async (values) => {
      if (!squad) return { previous: undefined };
      await queryClient.cancelQueries({ queryKey: SQUADS_KEY });
      const previous = queryClient.getQueryData<SquadDto[]>(SQUADS_KEY);
      queryClient.setQueryData<SquadDto[]>(SQUADS_KEY, (list) =>
        list?.map((s) => (s.id === squad.id ? { ...s, name: values.name, description: values.description ?? null, memberCount: values.athleteIds?.length ?? 0 } : s)),
      );
      return { previous };
    },
    onError: (error, _values, context) => {
      if (context?.previous) queryClient.setQueryData(SQUADS_KEY, context.previous);
      setMessage(applyIssues(error, form.setError));
    },
    onSuccess: () => onDone(),
    onSettled: () => queryClient.invalidateQueries({ queryKey: SQUADS_KEY }),
  });
  const { errors } = form.formState;
  return (
    <Card>
      <h2 className="mb-4 font-display text-lg font-bold">{squad ? `Edit ${squad.name}` : "New squad"}</h2>
      <form onSubmit={form.handleSubmit((v) => save.mutate(v))} className="flex flex-col gap-4" noValidate>
        {message ? <Notice tone="danger">{message}</Notice> : null}
        <TextField label="Name" placeholder="e.g. Saturday beginners" error={errors.name?.message} {...form.register("name")} />
        <TextField label="Description (optional)" error={errors.description?.message} {...form.register("description")} />
        <Controller
          control={form.control}
          name="athleteIds"
          render={({ field }) => <AthleteMultiSelect value={field.value ?? []} onChange={field.onChange} error={membersError(errors)} />}
        />
        <div className="flex gap-2">
          <Button type="submit" disabled={save.isPending}>
            {save.isPending ? "Saving…" : squad ? "Save squad" : "Create squad"}
          </Button>
          <Button variant="ghost" onClick={onDone}>
            Cancel
          </Button>
        </div>
      </form>
    </Card>
  );
}
