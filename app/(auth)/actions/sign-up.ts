"use server";

import { signIn } from "@/auth";
import { AppError } from "@/lib/errors";
import { signUp } from "@/lib/server/auth/sign-up";
import { ZSignUp, type SignUpInput } from "@/lib/validation/auth";
import { fieldErrorsOf, type FormResult } from "./form-result";

export async function signUpAction(input: SignUpInput): Promise<FormResult> {
  const parsed = ZSignUp.safeParse(input);
  if (!parsed.success) return fieldErrorsOf(parsed.error);
  try {
    await signUp(parsed.data);
  } catch (error) {
    if (error instanceof AppError) return { error: error.message };
    throw error;
  }
  await signIn("credentials", { email: parsed.data.email, password: parsed.data.password, redirectTo: "/coach" });
  return {};
}
