"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Badge, Card, EmptyState, Notice } from "@/components/ui/card";
import { SelectField, TextField } from "@/components/ui/field";
import { Spinner } from "@/components/ui/spinner";
import { api, applyIssues } from "@/lib/client/api";
import { zId } from "@/lib/validation/common";
import type { Page } from "@/lib/validation/common";
import { ZPlacement, type LadderDto, type LadderSummaryDto, type PositionDto } from "@/lib/validation/ladders";

const ZPlaceForm = ZPlacement.extend({ ladderId: zId });
type FormIn = z.input<typeof ZPlaceForm>;
type FormOut = z.output<typeof ZPlaceForm>;

const STATUS_TEXT: Record<PositionDto["status"], string> = {
  not_yet: "Working",
  met: "Standard met",
  blocked: "Waiting on a prerequisite",
  step_down: "Step down proposed",
  pending_approval: "Awaiting your approval",
  achieved: "Ladder finished",
};

/** On the coach's athlete page: the athlete's rung on each ladder, and placing them on any rung. */
export function AthletePositions({ athleteId }: { athleteId: string }) {
  const queryClient = useQueryClient();
  const key = ["positions", athleteId];
  const positions = useQuery({ queryKey: key, queryFn: () => api<Page<PositionDto>>(`/api/v1/athletes/${athleteId}/positions`) });
  const ladders = useQuery({ queryKey: ["ladders", { placement: true }], queryFn: () => api<Page<LadderSummaryDto>>("/api/v1/ladders?limit=100") });
  const [message, setMessage] = useState<{ tone: "moss" | "danger"; text: string } | null>(null);
  const form = useForm<FormIn, unknown, FormOut>({ resolver: zodResolver(ZPlaceForm), defaultValues: { ladderId: "", rungId: "", since: undefined } });
  const ladderId = useWatch({ control: form.control, name: "ladderId" });
  const ladder = useQuery({
    queryKey: ["ladder", ladderId],
    queryFn: () => api<LadderDto>(`/api/v1/ladders/${ladderId}`),
    enabled: zId.safeParse(ladderId).success,
  });
  const place = useMutation({
    mutationFn: ({ ladderId: target, ...body }: FormOut) =>
      api<PositionDto>(`/api/v1/athletes/${athleteId}/positions/${target}`, { method: "PUT", json: body }),
    onSuccess: (position) => {
      setMessage({ tone: "moss", text: `Placed on ${position.ladderName}: ${position.rungName}.` });
      form.reset({ ladderId: "", rungId: "", since: undefined });
      void queryClient.invalidateQueries({ queryKey: key });
    },
    onError: (e) => setMessage({ tone: "danger", text: applyIssues(e, form.setError) }),
  });
  const { errors } = form.formState;
  const items = positions.data?.items ?? [];

  return (
    <section aria-labelledby="positions-heading" className="mt-8 grid gap-6 lg:grid-cols-[1fr_340px]">
      <div className="flex flex-col gap-3">
        <h2 id="positions-heading" className="font-display text-xl font-bold">
          Ladder positions
        </h2>
        {positions.isPending ? <Spinner label="Loading positions" /> : null}
        {positions.isError ? <p className="text-danger">Couldn't load positions. Try again in a moment.</p> : null}
        {positions.isSuccess && items.length === 0 ? (
          <EmptyState title="Not on any ladder yet">Place this athlete on the rung that matches what they can do today.</EmptyState>
        ) : null}
        <ul className="flex flex-col gap-2">
          {items.map((p) => (
            <li key={p.ladderId}>
              <Card className="flex flex-wrap items-center justify-between gap-3 p-4">
                <div>
                  <p className="font-semibold">{p.ladderName}</p>
                  <p className="text-sm text-muted">
                    {p.rungArchived ? "Archived rung" : `Rung ${p.rungPosition}`}: {p.rungName} · since {p.since}
                  </p>
                </div>
                <div className="flex items-center gap-2">
                  <span className="font-mono text-sm" aria-label={`Readiness ${p.readiness} percent`}>
                    {p.readiness}%
                  </span>
                  <Badge tone={p.status === "step_down" ? "danger" : p.status === "met" || p.status === "achieved" ? "moss" : "neutral"}>
                    {STATUS_TEXT[p.status]}
                  </Badge>
                </div>
              </Card>
            </li>
          ))}
        </ul>
      </div>
      <Card>
        <h3 className="mb-4 font-display text-lg font-bold">Place on a rung</h3>
        <form onSubmit={form.handleSubmit((v) => place.mutate(v))} className="flex flex-col gap-4" noValidate>
          {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
          <SelectField label="Ladder" error={errors.ladderId?.message} {...form.register("ladderId", { onChange: () => form.setValue("rungId", "") })}>
            <option value="">{ladders.isPending ? "Loading…" : "Choose a ladder"}</option>
            {ladders.data?.items.map((l) => (
              <option key={l.id} value={l.id}>
                {l.name}
              </option>
            ))}
          </SelectField>
          <SelectField label="Rung" error={errors.rungId?.message} disabled={!ladder.data} {...form.register("rungId")}>
            <option value="">{ladder.isFetching ? "Loading…" : "Choose a rung"}</option>
            {ladder.data?.rungs.map((r) => (
              <option key={r.id} value={r.id}>
                {r.position}. {r.name}
              </option>
            ))}
          </SelectField>
          <TextField
            label="On this rung since (optional)"
            type="date"
            hint="Leave empty for today. An earlier date counts the athlete's sessions on this rung from then."
            error={errors.since?.message}
            {...form.register("since", { setValueAs: (v: string) => (v ? v : undefined) })}
          />
          <Button type="submit" disabled={place.isPending}>
            {place.isPending ? "Placing…" : "Place athlete"}
          </Button>
        </form>
      </Card>
    </section>
  );
}
