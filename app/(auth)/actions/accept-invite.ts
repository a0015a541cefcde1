"use server";

import { signInAndGoHome } from "@/lib/server/auth/sign-in-and-go-home";
import { AppError } from "@/lib/errors";
import { acceptInvite } from "@/lib/server/invites/accept-invite";
import { ZAcceptInvite, type AcceptInviteInput } from "@/lib/validation/auth";
import { fieldErrorsOf, type FormResult } from "./form-result";

export async function acceptInviteAction(token: string, input: AcceptInviteInput): Promise<FormResult> {
  const parsed = ZAcceptInvite.safeParse(input);
  if (!parsed.success) return fieldErrorsOf(parsed.error);
  let email: string;
  try {
    ({ email } = await acceptInvite(token, parsed.data));
  } catch (error) {
    if (error instanceof AppError) return { error: error.message };
    throw error;
  }
  return signInAndGoHome(email, parsed.data.password);
}
