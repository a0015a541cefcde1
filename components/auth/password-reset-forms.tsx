"use client";

import { requestResetAction, resetPasswordAction } from "@/app/(auth)/actions/password-reset";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/card";
import { TextField } from "@/components/ui/field";
import { ZPasswordReset, ZPasswordResetRequest } from "@/lib/validation/auth";
import { PASSWORD_MIN } from "@/lib/validation/common";

export function ForgotPasswordForm() {
  const { form, onSubmit, pending, formError, result } = useServerForm(ZPasswordResetRequest, requestResetAction, {
    email: "",
  });
  if (result?.sent) {
    return (
      <Notice tone="moss">
        If that address has an account, a link to choose a new password is on its way. It works once, for one hour.
      </Notice>
    );
  }
  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-4" noValidate>
      {formError ? <Notice tone="danger">{formError}</Notice> : null}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        error={form.formState.errors.email?.message}
        {...form.register("email")}
      />
      <Button type="submit" size="lg" disabled={pending}>
        {pending ? "Sending…" : "Send me a link"}
      </Button>
    </form>
  );
}

export function ResetPasswordForm({ token }: { token: string }) {
  const { form, onSubmit, pending, formError } = useServerForm(
    ZPasswordReset,
    (values) => resetPasswordAction(token, values),
    { password: "" },
  );
  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-4" noValidate>
      {formError ? <Notice tone="danger">{formError}</Notice> : null}
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN} characters.`}
        error={form.formState.errors.password?.message}
        {...form.register("password")}
      />
      <Button type="submit" size="lg" disabled={pending}>
        {pending ? "Saving…" : "Save and sign in"}
      </Button>
    </form>
  );
}
