"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Badge, Card, Notice } from "@/components/ui/card";
import { SelectField, TextField } from "@/components/ui/field";
import { api, applyIssues } from "@/lib/client/api";
import { ZUpdateAthlete, type AthleteDto } from "@/lib/validation/athletes";
import type { StaffMember } from "./athlete-directory";

type FormIn = z.input<typeof ZUpdateAthlete>;
type FormOut = z.output<typeof ZUpdateAthlete>;

export function AthleteProfile({ athlete, staff }: { athlete: AthleteDto; staff: StaffMember[] }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ tone: "moss" | "danger"; text: string } | null>(null);
  const form = useForm<FormIn, unknown, FormOut>({
    resolver: zodResolver(ZUpdateAthlete),
    defaultValues: {
      name: athlete.name,
      email: athlete.email,
      primaryCoachId: athlete.primaryCoachId,
      notes: athlete.notes,
    },
  });
  const save = useMutation({
    mutationFn: (values: FormOut) => api<AthleteDto>(`/api/v1/athletes/${athlete.id}`, { method: "PATCH", json: values }),
    onSuccess: () => {
      setMessage({ tone: "moss", text: "Saved." });
      router.refresh();
    },
    onError: (error) => setMessage({ tone: "danger", text: applyIssues(error, form.setError) }),
  });
  const invite = useMutation({
    mutationFn: () => api(`/api/v1/athletes/${athlete.id}/invite`, { method: "POST" }),
    onSuccess: () => {
      setMessage({ tone: "moss", text: "Invite sent." });
      router.refresh();
    },
    onError: (error) => setMessage({ tone: "danger", text: applyIssues(error, form.setError) }),
  });
  const { errors } = form.formState;
  return (
    <Card className="max-w-xl">
      <div className="mb-4 flex items-center gap-2">
        {athlete.hasAccount ? <Badge tone="moss">Signs in</Badge> : <Badge>No sign-in yet</Badge>}
        {athlete.invitePending ? <Badge tone="ember">Invite pending</Badge> : null}
        {athlete.archived ? <Badge tone="danger">Archived</Badge> : null}
      </div>
      <form onSubmit={form.handleSubmit((v) => save.mutate(v))} className="flex flex-col gap-4" noValidate>
        {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
        <TextField label="Name" error={errors.name?.message} {...form.register("name")} />
        <TextField
          label="E-mail"
          type="email"
          error={errors.email?.message}
          {...form.register("email", { setValueAs: (v: string | null) => (v?.trim() ? v : null) })}
        />
        <SelectField
          label="Primary coach"
          error={errors.primaryCoachId?.message}
          {...form.register("primaryCoachId", { setValueAs: (v: string) => v || null })}
        >
          <option value="">No primary coach</option>
          {staff.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </SelectField>
        <TextField
          label="Notes"
          error={errors.notes?.message}
          {...form.register("notes", { setValueAs: (v: string | null) => (v?.trim() ? v : null) })}
        />
        <div className="flex flex-wrap gap-2">
          <Button type="submit" disabled={save.isPending}>
            {save.isPending ? "Saving…" : "Save changes"}
          </Button>
          {!athlete.hasAccount && athlete.email ? (
            <Button variant="secondary" onClick={() => invite.mutate()} disabled={invite.isPending}>
              {athlete.invitePending ? "Send the invite again" : "Invite to sign in"}
            </Button>
          ) : null}
          <Button
            variant="ghost"
            onClick={() => save.mutate({ archived: !athlete.archived })}
            disabled={save.isPending}
          >
            {athlete.archived ? "Restore" : "Archive"}
          </Button>
        </div>
      </form>
    </Card>
  );
}
