import type { z } from "zod";

/** What an auth server action answers the form with (a success redirects instead). */
export interface FormResult {
  error?: string;
  fieldErrors?: Record<string, string>;
}

export function fieldErrorsOf(error: z.ZodError): FormResult {
  const fieldErrors: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join(".");
    fieldErrors[key] ??= issue.message;
  }
  return { error: "Please check the highlighted fields.", fieldErrors };
}
