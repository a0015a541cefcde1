"use client";

import { acceptInviteAction } from "@/app/(auth)/actions/accept-invite";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/card";
import { TextField } from "@/components/ui/field";
import { ZAcceptInvite } from "@/lib/validation/auth";
import { PASSWORD_MIN } from "@/lib/validation/common";

export function AcceptInviteForm({ token, email, suggestedName }: { token: string; email: string; suggestedName: string }) {
  const { form, onSubmit, pending, formError } = useServerForm(
    ZAcceptInvite,
    (values) => acceptInviteAction(token, values),
    { name: suggestedName, password: "" },
  );
  const { errors } = form.formState;
  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-4" noValidate>
      {formError ? <Notice tone="danger">{formError}</Notice> : null}
      <TextField label="E-mail" value={email} readOnly disabled />
      <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...form.register("name")} />
      <TextField
        label="Choose a password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN} characters.`}
        error={errors.password?.message}
        {...form.register("password")}
      />
      <Button type="submit" size="lg" disabled={pending}>
        {pending ? "Setting up…" : "Join and sign in"}
      </Button>
    </form>
  );
}
