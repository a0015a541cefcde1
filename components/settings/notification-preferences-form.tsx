"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { SelectField } from "@/components/ui/field";
import { api, applyIssues } from "@/lib/client/api";
import { WEEKDAYS, ZNotificationPreferences, type NotificationPreferencesInput } from "@/lib/validation/notifications";

function Toggle({ label, hint, ...props }: { label: string; hint: string } & React.InputHTMLAttributes<HTMLInputElement>) {
  return (
    <label className="flex min-h-11 cursor-pointer items-start gap-3">
      <input type="checkbox" className="mt-1 size-5 accent-moss" {...props} />
      <span>
        <span className="block text-sm font-semibold">{label}</span>
        <span className="block text-xs text-muted">{hint}</span>
      </span>
    </label>
  );
}

/** The person's mail choices; security mail (sign-in links, invites) is always sent. */
export function NotificationPreferencesForm({
  initial,
  staff,
  timeZone,
}: {
  initial: NotificationPreferencesInput;
  staff: boolean;
  timeZone: string;
}) {
  const [message, setMessage] = useState<{ tone: "moss" | "danger"; text: string } | null>(null);
  const form = useForm<NotificationPreferencesInput>({ resolver: zodResolver(ZNotificationPreferences), defaultValues: initial });
  const save = useMutation({
    mutationFn: (values: NotificationPreferencesInput) =>
      api<NotificationPreferencesInput>("/api/v1/notification-preferences", { method: "PUT", json: values }),
    onSuccess: (values) => {
      form.reset(values);
      setMessage({ tone: "moss", text: "Saved." });
    },
    onError: (error) => setMessage({ tone: "danger", text: applyIssues(error, form.setError) }),
  });
  const { register, formState } = form;
  return (
    <Card>
      <h2 className="font-display text-lg font-bold">E-mail</h2>
      <p className="mb-4 text-sm text-muted">Sign-in, reset and invite mail always arrives.</p>
      <form onSubmit={form.handleSubmit((v) => save.mutate(v))} className="flex flex-col gap-3" noValidate>
        {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
        <Toggle label="Promotion notices" hint="When a rung is reached, with the new rung's cues." {...register("promotionNotices")} />
        {staff ? (
          <>
            <Toggle label="Approval requests" hint="When an athlete on an approve ladder is ready." {...register("approvalNotices")} />
            <Toggle label="Weekly digest" hint="Promotions, approvals, stalls, pain flags and missed weeks." {...register("weeklyDigest")} />
          </>
        ) : (
          <Toggle label="Weekly summary" hint="Your training days, moves up and where you stand." {...register("athleteSummary")} />
        )}
        <div className="grid grid-cols-2 gap-3">
          <SelectField label="Weekly mail on" error={formState.errors.digestWeekday?.message} {...register("digestWeekday", { valueAsNumber: true })}>
            {WEEKDAYS.map((day, i) => (
              <option key={day} value={i + 1}>
                {day}
              </option>
            ))}
          </SelectField>
          <SelectField
            label="At"
            hint={timeZone}
            error={formState.errors.digestHour?.message}
            {...register("digestHour", { valueAsNumber: true })}
          >
            {Array.from({ length: 24 }, (_, h) => (
              <option key={h} value={h}>
                {String(h).padStart(2, "0")}:00
              </option>
            ))}
          </SelectField>
        </div>
        <Button type="submit" disabled={save.isPending || !formState.isDirty}>
          {save.isPending ? "Saving…" : "Save e-mail choices"}
        </Button>
      </form>
    </Card>
  );
}
