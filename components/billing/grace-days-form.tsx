"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useEffect, useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { TextField } from "@/components/ui/field";
import { api, applyIssues } from "@/lib/client/api";
import { ZBillingSettings, type BillingSettingsDto } from "@/lib/validation/billing";
import { SETTINGS_KEY, SUBSCRIBERS_KEY, useBillingSettings } from "./use-billing";

type FormIn = z.input<typeof ZBillingSettings>;

/** Days a lapsed athlete still receives new plans. History and current plans are never removed. */
export function GraceDaysForm() {
  const settings = useBillingSettings();
  const queryClient = useQueryClient();
  const [message, setMessage] = useState<{ tone: "moss" | "danger"; text: string } | null>(null);
  const form = useForm<FormIn>({ resolver: zodResolver(ZBillingSettings), defaultValues: { graceDays: 7 } });
  const { reset } = form;
  useEffect(() => {
    if (settings.data) reset({ graceDays: settings.data.graceDays });
  }, [settings.data, reset]);
  const save = useMutation({
    mutationFn: (values: FormIn) => api<BillingSettingsDto>("/api/v1/billing/settings", { method: "PATCH", json: values }),
    onError: (error) => setMessage({ tone: "danger", text: applyIssues(error, form.setError) }),
    onSuccess: (data) => {
      queryClient.setQueryData(SETTINGS_KEY, data);
      setMessage({ tone: "moss", text: "Grace period saved." });
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: SUBSCRIBERS_KEY }),
  });
  return (
    <Card>
      <h2 className="mb-2 font-display text-lg font-bold">Grace period</h2>
      <p className="mb-3 text-sm text-muted">
        After a missed payment or a cancellation, an athlete keeps receiving new plans for this many days. Their history always stays.
      </p>
      <form onSubmit={form.handleSubmit((v) => save.mutate(v))} className="flex flex-col gap-3" noValidate>
        {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
        <TextField label="Days" type="number" inputMode="numeric" error={form.formState.errors.graceDays?.message} {...form.register("graceDays", { valueAsNumber: true })} />
        <Button type="submit" disabled={save.isPending || settings.isPending}>
          {save.isPending ? "Saving…" : "Save"}
        </Button>
      </form>
    </Card>
  );
}
