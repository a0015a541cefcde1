"use server";

import { signInAndGoHome } from "@/lib/server/auth/sign-in-and-go-home";
import { AppError } from "@/lib/errors";
import { requestPasswordReset } from "@/lib/server/passwords/request-password-reset";
import { resetPassword } from "@/lib/server/passwords/reset-password";
import { ZPasswordReset, ZPasswordResetRequest } from "@/lib/validation/auth";
import { fieldErrorsOf, type FormResult } from "./form-result";

export async function requestResetAction(input: { email: string }): Promise<FormResult & { sent?: boolean }> {
  const parsed = ZPasswordResetRequest.safeParse(input);
  if (!parsed.success) return fieldErrorsOf(parsed.error);
  await requestPasswordReset(parsed.data.email);
  return { sent: true };
}

export async function resetPasswordAction(token: string, input: { password: string }): Promise<FormResult> {
  const parsed = ZPasswordReset.safeParse(input);
  if (!parsed.success) return fieldErrorsOf(parsed.error);
  let email: string;
  try {
    ({ email } = await resetPassword(token, parsed.data.password));
  } catch (error) {
    if (error instanceof AppError) return { error: error.message };
    throw error;
  }
  return signInAndGoHome(email, parsed.data.password);
}
