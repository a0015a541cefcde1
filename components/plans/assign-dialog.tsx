"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { useAllAthletes, useSquads } from "@/components/squads/use-team-data";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { SelectField, TextField } from "@/components/ui/field";
import { api, applyIssues } from "@/lib/client/api";
import { ZCreateAssignment, type AssignmentDto } from "@/lib/validation/plans";

type FormIn = z.input<typeof ZCreateAssignment>;
type FormOut = z.output<typeof ZCreateAssignment>;
type Target = { kind: "athlete" | "squad"; id: string };

function localToday(): string {
  const now = new Date();
  return `${now.getFullYear()}-${String(now.getMonth() + 1).padStart(2, "0")}-${String(now.getDate()).padStart(2, "0")}`;
}

function summary(items: AssignmentDto[]): string {
  const placed = items.reduce((sum, a) => sum + (a.placed?.length ?? 0), 0);
  const who = items.length === 1 ? items[0]!.athleteName : `${items.length} athletes`;
  return `Assigned to ${who}.${placed ? ` ${placed} new starting ${placed === 1 ? "rung" : "rungs"} set (first rung of each ladder they had not started).` : ""}`;
}

/** "Assign" for a plan: to one athlete or to every member of a squad, with start and optional end dates. */
export function AssignDialog({ planId, planName, onClose }: { planId: string; planName: string; onClose: () => void }) {
  const athletes = useAllAthletes();
  const squads = useSquads();
  const queryClient = useQueryClient();
  const [target, setTarget] = useState<Target>({ kind: "squad", id: "" });
  const [targetError, setTargetError] = useState<string | null>(null);
  const [message, setMessage] = useState<{ tone: "moss" | "danger"; text: string } | null>(null);
  const form = useForm<FormIn, unknown, FormOut>({ resolver: zodResolver(ZCreateAssignment), defaultValues: { planId, startsOn: localToday(), endsOn: null } });
  const assign = useMutation({
    mutationFn: async (values: FormOut): Promise<AssignmentDto[]> => {
      if (target.kind === "athlete") return [await api<AssignmentDto>(`/api/v1/athletes/${target.id}/assignments`, { method: "POST", json: values })];
      return (await api<{ items: AssignmentDto[] }>(`/api/v1/squads/${target.id}/assignments`, { method: "POST", json: values })).items;
    },
    onSuccess: (items) => {
      setMessage({ tone: "moss", text: summary(items) });
      void queryClient.invalidateQueries({ queryKey: ["assignments"] });
    },
    onError: (error) => setMessage({ tone: "danger", text: applyIssues(error, form.setError) }),
  });
  const submit = form.handleSubmit((values) => {
    if (!target.id) {
      setTargetError(target.kind === "squad" ? "Choose a squad." : "Choose an athlete.");
      return;
    }
    setTargetError(null);
    assign.mutate(values);
  });
  const { errors } = form.formState;
  return (
    <div className="fixed inset-0 z-30 flex items-center justify-center bg-ink/40 p-4" onClick={onClose}>
      <Card role="dialog" aria-modal="true" aria-labelledby="assign-title" className="w-full max-w-md" onClick={(e) => e.stopPropagation()}>
        <h2 id="assign-title" className="mb-4 font-display text-lg font-bold">
          Assign {planName}
        </h2>
        <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
          {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
          <fieldset className="flex gap-4 text-sm font-semibold">
            <legend className="sr-only">Assign to</legend>
            {(["squad", "athlete"] as const).map((kind) => (
              <label key={kind} className="flex items-center gap-2">
                <input type="radio" name="kind" checked={target.kind === kind} onChange={() => setTarget({ kind, id: "" })} />
                {kind === "squad" ? "A squad" : "One athlete"}
              </label>
            ))}
          </fieldset>
          {target.kind === "squad" ? (
            <SelectField label="Squad" value={target.id} error={targetError ?? undefined} onChange={(e) => setTarget({ kind: "squad", id: e.target.value })}>
              <option value="">{squads.isPending ? "Loading…" : "Choose a squad"}</option>
              {squads.data?.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.name} ({s.memberCount})
                </option>
              ))}
            </SelectField>
          ) : (
            <SelectField label="Athlete" value={target.id} error={targetError ?? undefined} onChange={(e) => setTarget({ kind: "athlete", id: e.target.value })}>
              <option value="">{athletes.isPending ? "Loading…" : "Choose an athlete"}</option>
              {athletes.data?.filter((a) => !a.archived).map((a) => (
                <option key={a.id} value={a.id}>
                  {a.name}
                </option>
              ))}
            </SelectField>
          )}
          <div className="grid grid-cols-2 gap-3">
            <TextField label="Starts on" type="date" error={errors.startsOn?.message} {...form.register("startsOn")} />
            <TextField
              label="Ends on (optional)"
              type="date"
              error={errors.endsOn?.message}
              {...form.register("endsOn", { setValueAs: (v: string | null) => (v ? v : null) })}
            />
          </div>
          <p className="text-xs text-muted">
            Athletes who have not started a ladder of this plan begin on its first rung. Existing rungs stay as they are.
          </p>
          <div className="flex gap-2">
            <Button type="submit" disabled={assign.isPending}>
              {assign.isPending ? "Assigning…" : "Assign"}
            </Button>
            <Button variant="ghost" onClick={onClose}>
              Close
            </Button>
          </div>
        </form>
      </Card>
    </div>
  );
}
