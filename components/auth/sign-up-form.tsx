"use client";

import { useEffect } from "react";
import { signUpAction } from "@/app/(auth)/actions/sign-up";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/card";
import { TextField } from "@/components/ui/field";
import { PASSWORD_MIN } from "@/lib/validation/common";
import { ZSignUp } from "@/lib/validation/auth";

export function SignUpForm() {
  const { form, onSubmit, pending, formError } = useServerForm(ZSignUp, signUpAction, {
    name: "",
    teamName: "",
    email: "",
    password: "",
    timeZone: "UTC",
  });
  const { errors } = form.formState;
  // Default to the browser's zone; the coach can change it.
  useEffect(() => {
    form.setValue("timeZone", Intl.DateTimeFormat().resolvedOptions().timeZone || "UTC");
  }, [form]);
  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-4" noValidate>
      {formError ? <Notice tone="danger">{formError}</Notice> : null}
      <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...form.register("name")} />
      <TextField
        label="Club or business name"
        hint="What your athletes will see, e.g. Harbourside Hand Balance."
        error={errors.teamName?.message}
        {...form.register("teamName")}
      />
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN} characters.`}
        error={errors.password?.message}
        {...form.register("password")}
      />
      <TextField
        label="Time zone"
        hint="Weeks, days on a rung and digests follow this zone."
        error={errors.timeZone?.message}
        {...form.register("timeZone")}
      />
      <Button type="submit" size="lg" disabled={pending}>
        {pending ? "Creating your team…" : "Create my team"}
      </Button>
    </form>
  );
}
