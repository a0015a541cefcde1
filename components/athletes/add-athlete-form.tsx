"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { SelectField, TextField } from "@/components/ui/field";
import { api, applyIssues } from "@/lib/client/api";
import { ZCreateAthlete, type AthleteDto } from "@/lib/validation/athletes";
import type { StaffMember } from "./athlete-directory";

type FormIn = z.input<typeof ZCreateAthlete>;
type FormOut = z.output<typeof ZCreateAthlete>;

export function AddAthleteForm({ staff, me }: { staff: StaffMember[]; me: string }) {
  const queryClient = useQueryClient();
  const [message, setMessage] = useState<{ tone: "moss" | "danger"; text: string } | null>(null);
  const form = useForm<FormIn, unknown, FormOut>({
    resolver: zodResolver(ZCreateAthlete),
    defaultValues: { name: "", email: "", primaryCoachId: me, invite: true },
  });
  const create = useMutation({
    mutationFn: (values: FormOut) => api<AthleteDto>("/api/v1/athletes", { method: "POST", json: values }),
    onSuccess: (athlete, values) => {
      setMessage({
        tone: "moss",
        text: values.invite && values.email ? `${athlete.name} added; the invite is on its way.` : `${athlete.name} added.`,
      });
      form.reset({ name: "", email: "", primaryCoachId: me, invite: true });
      void queryClient.invalidateQueries({ queryKey: ["athletes"] });
    },
    onError: (error) => setMessage({ tone: "danger", text: applyIssues(error, form.setError) }),
  });
  const { errors } = form.formState;
  return (
    <Card>
      <h2 className="mb-4 font-display text-lg font-bold">Add an athlete</h2>
      <form onSubmit={form.handleSubmit((v) => create.mutate(v))} className="flex flex-col gap-4" noValidate>
        {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
        <TextField label="Name" error={errors.name?.message} {...form.register("name")} />
        <TextField
          label="E-mail (optional)"
          type="email"
          hint="Leave empty for someone you log for in person."
          error={errors.email?.message}
          {...form.register("email", { setValueAs: (v: string) => (v?.trim() ? v : undefined) })}
        />
        <SelectField label="Primary coach" error={errors.primaryCoachId?.message} {...form.register("primaryCoachId")}>
          {staff.map((s) => (
            <option key={s.id} value={s.id}>
              {s.id === me ? `${s.name} (you)` : s.name}
            </option>
          ))}
        </SelectField>
        <label className="flex items-center gap-2 text-sm font-semibold">
          <input type="checkbox" className="h-4 w-4" {...form.register("invite")} />
          E-mail them an invite to sign in
        </label>
        <Button type="submit" disabled={create.isPending}>
          {create.isPending ? "Adding…" : "Add athlete"}
        </Button>
      </form>
    </Card>
  );
}
