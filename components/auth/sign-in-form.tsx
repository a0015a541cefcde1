"use client";

import Link from "next/link";
import { signInAction } from "@/app/(auth)/actions/sign-in";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/card";
import { TextField } from "@/components/ui/field";
import { ZSignIn } from "@/lib/validation/auth";

export function SignInForm() {
  const { form, onSubmit, pending, formError } = useServerForm(ZSignIn, signInAction, { email: "", password: "" });
  const { errors } = form.formState;
  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-4" noValidate>
      {formError ? <Notice tone="danger">{formError}</Notice> : null}
      <TextField label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...form.register("email")} />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...form.register("password")}
      />
      <Button type="submit" size="lg" disabled={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </Button>
      <p className="text-center text-sm text-muted">
        <Link href="/forgot-password" className="font-semibold text-moss hover:underline">
          Forgot your password?
        </Link>
      </p>
    </form>
  );
}
