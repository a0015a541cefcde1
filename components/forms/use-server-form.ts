"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState, useTransition } from "react";
import { useForm, type DefaultValues, type FieldValues, type Path, type Resolver } from "react-hook-form";
import type { z } from "zod";

interface ServerResult {
  error?: string;
  fieldErrors?: Record<string, string>;
}

/**
 * react-hook-form + the shared zod schema on the client, a server action on submit; server-side
 * field errors land next to the same fields.
 */
export function useServerForm<S extends z.ZodType<FieldValues, FieldValues>, R extends ServerResult>(
  schema: S,
  action: (values: z.output<S>) => Promise<R>,
  defaultValues: DefaultValues<z.input<S>>,
) {
  // zodResolver cannot infer through the generic S; the cast restates what S already guarantees.
  const resolver = zodResolver(schema) as unknown as Resolver<z.input<S>, unknown, z.output<S>>;
  const form = useForm<z.input<S>, unknown, z.output<S>>({ resolver, defaultValues });
  const [formError, setFormError] = useState<string | null>(null);
  const [result, setResult] = useState<R | null>(null);
  const [pending, startTransition] = useTransition();

  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    startTransition(async () => {
      const answer = await action(values);
      setResult(answer);
      if (answer.error) setFormError(answer.error);
      for (const [field, message] of Object.entries(answer.fieldErrors ?? {})) {
        form.setError(field as Path<z.input<S>>, { message });
      }
    });
  });

  return { form, onSubmit, pending, formError, result };
}
