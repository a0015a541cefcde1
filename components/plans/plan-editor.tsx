"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { TextField } from "@/components/ui/field";
import { Spinner } from "@/components/ui/spinner";
import { TextAreaField } from "@/components/ui/text-area";
import { ApiError, api, applyIssues } from "@/lib/client/api";
import { estimateSessionSec } from "@/lib/training/block-estimate";
import type { BlockDto } from "@/lib/validation/blocks";
import type { Page } from "@/lib/validation/common";
import { ZCreatePlan, type PlanDto } from "@/lib/validation/plans";
import { DayColumn } from "./day-column";
import { WEEKDAYS } from "./weekdays";

const ZPlanFields = ZCreatePlan.omit({ days: true });
type FormIn = z.input<typeof ZPlanFields>;
type FormOut = z.output<typeof ZPlanFields>;
type Week = Record<number, string[]>;

const asEstimate = (block: BlockDto) => ({ ...block, slots: block.slots.map((s) => ({ sets: s.sets, rung: s.estimateRung })) });

function weekOf(plan: PlanDto | null): Week {
  const week: Week = {};
  for (const { day } of WEEKDAYS) week[day] = plan?.days.find((d) => d.weekday === day)?.blockIds ?? [];
  return week;
}

/** Errors the API names under `days.N…`, shown under the weekday they belong to. */
function dayErrors(error: unknown, sent: { weekday: number }[]): Record<number, string> {
  const result: Record<number, string> = {};
  if (!(error instanceof ApiError)) return result;
  for (const issue of error.issues) {
    const match = /^days\.(\d+)/.exec(issue.path);
    const weekday = match ? sent[Number(match[1])]?.weekday : undefined;
    if (weekday) result[weekday] = issue.message;
  }
  return result;
}

/** Create or edit a plan: name, weeks, warm-up and cool-down, and a weekday grid of blocks. */
export function PlanEditor({ plan }: { plan: PlanDto | null }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [week, setWeek] = useState<Week>(() => weekOf(plan));
  const [message, setMessage] = useState<{ tone: "moss" | "danger"; text: string } | null>(null);
  const [perDay, setPerDay] = useState<Record<number, string>>({});
  const blocks = useQuery({ queryKey: ["blocks", "list"], queryFn: () => api<Page<BlockDto>>("/api/v1/blocks?limit=100") });
  // Archived blocks stay in the plans that use them: look them up for names and estimates.
  const archived = useQuery({ queryKey: ["blocks", "archived"], queryFn: () => api<Page<BlockDto>>("/api/v1/blocks?archived=true&limit=100") });
  const form = useForm<FormIn, unknown, FormOut>({
    resolver: zodResolver(ZPlanFields),
    defaultValues: { name: plan?.name ?? "", weeks: plan?.weeks ?? 6, warmUp: plan?.warmUp ?? "", coolDown: plan?.coolDown ?? "" },
  });

  const choices = blocks.data?.items ?? [];
  const byId = new Map([...(archived.data?.items ?? []), ...choices].map((b) => [b.id, b]));
  const dayEstimate = (ids: string[]) => estimateSessionSec(ids.flatMap((id) => (byId.has(id) ? [asEstimate(byId.get(id)!)] : [])));
  const days = WEEKDAYS.filter(({ day }) => week[day]!.length > 0).map(({ day }) => ({ weekday: day, blockIds: week[day]! }));

  const save = useMutation({
    mutationFn: (values: FormOut) =>
      plan
        ? api<PlanDto>(`/api/v1/plans/${plan.id}`, { method: "PATCH", json: { ...values, days } })
        : api<PlanDto>("/api/v1/plans", { method: "POST", json: { ...values, days } }),
    onSuccess: (saved) => {
      setPerDay({});
      void queryClient.invalidateQueries({ queryKey: ["plans"] });
      setMessage({ tone: "moss", text: "Plan saved." });
      if (!plan) router.push(`/coach/plans/${saved.id}`);
      else router.refresh();
    },
    onError: (error) => {
      setPerDay(dayErrors(error, days));
      setMessage({ tone: "danger", text: applyIssues(error, form.setError) });
    },
  });

  const { errors } = form.formState;
  return (
    <form onSubmit={form.handleSubmit((v) => save.mutate(v))} className="flex flex-col gap-5" noValidate aria-label="Plan">
      {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
      <Card className="grid gap-4 md:grid-cols-[2fr_1fr]">
        <TextField label="Plan name" placeholder="e.g. Foundations 6 weeks" error={errors.name?.message} {...form.register("name")} />
        <TextField label="Weeks" type="number" min={1} max={104} error={errors.weeks?.message} {...form.register("weeks", { valueAsNumber: true })} />
        <TextAreaField label="Warm-up (optional)" placeholder="e.g. wrist circles, scapula push-ups" error={errors.warmUp?.message} {...form.register("warmUp")} />
        <TextAreaField label="Cool-down (optional)" error={errors.coolDown?.message} {...form.register("coolDown")} />
      </Card>

      <section aria-label="Week" className="flex flex-col gap-3">
        <div className="flex flex-wrap items-end justify-between gap-2">
          <h2 className="font-display text-lg font-bold">The week</h2>
          <p className="text-sm text-muted">Estimates include a minute to change over between blocks. Empty days are rest days.</p>
        </div>
        {blocks.isPending ? <Spinner label="Loading blocks" /> : null}
        {blocks.isError ? <p className="text-danger">Couldn&apos;t load blocks. Try again in a moment.</p> : null}
        {blocks.isSuccess && choices.length === 0 ? <Notice tone="ember">No blocks yet: build one on the Blocks page, then come back.</Notice> : null}
        <div className="grid gap-2 md:grid-cols-4 xl:grid-cols-7">
          {WEEKDAYS.map(({ day, long }) => (
            <DayColumn
              key={day}
              label={long}
              blockIds={week[day]!}
              blocks={byId}
              choices={choices}
              durationSec={dayEstimate(week[day]!)}
              error={perDay[day]}
              onChange={(ids) => setWeek((w) => ({ ...w, [day]: ids }))}
            />
          ))}
        </div>
      </section>
      <div>
        <Button type="submit" disabled={save.isPending}>
          {save.isPending ? "Saving…" : plan ? "Save plan" : "Create plan"}
        </Button>
      </div>
    </form>
  );
}
