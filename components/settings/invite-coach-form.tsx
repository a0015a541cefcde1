"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { TextField } from "@/components/ui/field";
import { api, applyIssues } from "@/lib/client/api";
import { ZInviteCoach } from "@/lib/validation/auth";

export function InviteCoachForm() {
  const [message, setMessage] = useState<{ tone: "moss" | "danger"; text: string } | null>(null);
  const form = useForm<z.input<typeof ZInviteCoach>, unknown, z.output<typeof ZInviteCoach>>({
    resolver: zodResolver(ZInviteCoach),
    defaultValues: { email: "" },
  });
  const invite = useMutation({
    mutationFn: (values: z.output<typeof ZInviteCoach>) => api("/api/v1/invites", { method: "POST", json: values }),
    onSuccess: (_data, values) => {
      setMessage({ tone: "moss", text: `Invite sent to ${values.email}.` });
      form.reset();
    },
    onError: (error) => setMessage({ tone: "danger", text: applyIssues(error, form.setError) }),
  });
  return (
    <Card>
      <h2 className="mb-4 font-display text-lg font-bold">Invite a coach</h2>
      <form onSubmit={form.handleSubmit((v) => invite.mutate(v))} className="flex flex-col gap-4" noValidate>
        {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
        <TextField label="E-mail" type="email" error={form.formState.errors.email?.message} {...form.register("email")} />
        <Button type="submit" disabled={invite.isPending}>
          {invite.isPending ? "Sending…" : "Send invite"}
        </Button>
      </form>
    </Card>
  );
}
