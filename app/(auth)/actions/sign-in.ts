"use server";

import { AuthError } from "next-auth";
import { headers } from "next/headers";
import { signInAndGoHome } from "@/lib/server/auth/sign-in-and-go-home";
import { clientIp, signInRetryAfter, throttleKey } from "@/lib/server/auth/sign-in-throttle";
import { ZSignIn, type SignInInput } from "@/lib/validation/auth";
import { fieldErrorsOf, type FormResult } from "./form-result";

export async function signInAction(input: SignInInput): Promise<FormResult> {
  const parsed = ZSignIn.safeParse(input);
  if (!parsed.success) return fieldErrorsOf(parsed.error);
  const retryAfter = await signInRetryAfter(throttleKey(parsed.data.email, clientIp(await headers())));
  if (retryAfter > 0) {
    return { error: `Too many failed attempts. Try again in ${Math.ceil(retryAfter / 60)} minutes, or reset your password.` };
  }
  try {
    return await signInAndGoHome(parsed.data.email, parsed.data.password);
  } catch (error) {
    // signIn throws a redirect on success: only Auth.js errors are a failed sign-in.
    if (error instanceof AuthError) return { error: "That e-mail and password don't match an account." };
    throw error;
  }
}
