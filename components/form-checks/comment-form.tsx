"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { FieldFrame } from "@/components/ui/field";
import { api, applyIssues } from "@/lib/client/api";
import { formatMoment, ZCreateComment, type FormCheckCommentDto } from "@/lib/validation/form-checks";

type FormIn = z.input<typeof ZCreateComment>;
type FormOut = z.output<typeof ZCreateComment>;

/** A staff comment pinned to the player's current moment. */
export function CommentForm({ formCheckId, at, showMoment, onAdded }: { formCheckId: string; at: number; showMoment: boolean; onAdded: () => void }) {
  const form = useForm<FormIn, unknown, FormOut>({ resolver: zodResolver(ZCreateComment), defaultValues: { body: "", atSeconds: 0 } });
  const add = useMutation({
    mutationFn: (values: FormOut) => api<FormCheckCommentDto>(`/api/v1/form-checks/${formCheckId}/comments`, { method: "POST", json: values }),
    onSuccess: () => {
      form.reset({ body: "", atSeconds: 0 });
      onAdded();
    },
    onError: (error) => form.setError("root", { message: applyIssues(error, form.setError) }),
  });
  const { errors } = form.formState;
  const moment = Math.round(at * 1000) / 1000;
  return (
    <form
      noValidate
      className="flex flex-col gap-2"
      onSubmit={(e) => {
        form.setValue("atSeconds", moment);
        void form.handleSubmit((values) => add.mutate(values))(e);
      }}
    >
      <FieldFrame label="Comment" id="comment-body" error={errors.body?.message ?? errors.atSeconds?.message ?? errors.root?.message}>
        <textarea
          id="comment-body"
          rows={3}
          className="w-full rounded-lg border border-line bg-surface px-3 py-2 text-ink focus:border-moss focus:outline-none"
          placeholder="What to keep, what to change"
          {...form.register("body")}
        />
      </FieldFrame>
      <Button type="submit" disabled={add.isPending}>
        {add.isPending ? "Saving…" : showMoment ? `Comment at ${formatMoment(moment)}` : "Comment"}
      </Button>
    </form>
  );
}
