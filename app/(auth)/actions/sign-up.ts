"use server";

import { signInAndGoHome } from "@/lib/server/auth/sign-in-and-go-home";
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
  return signInAndGoHome(parsed.data.email, parsed.data.password);
}
