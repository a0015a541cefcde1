"use client";

import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/card";
import { api } from "@/lib/client/api";

/** Deleting asks once more: the file and its comments go for good. */
export function DeleteFormCheck({ formCheckId, onDeleted }: { formCheckId: string; onDeleted: () => void }) {
  const [confirming, setConfirming] = useState(false);
  const remove = useMutation({
    mutationFn: () => api<void>(`/api/v1/form-checks/${formCheckId}`, { method: "DELETE" }),
    onSuccess: onDeleted,
  });
  if (!confirming) {
    return (
      <Button variant="ghost" onClick={() => setConfirming(true)}>
        Delete form check
      </Button>
    );
  }
  return (
    <div className="flex flex-col gap-2 rounded-lg border border-danger p-3">
      <p className="text-sm">Delete this form check, its file and its comments? This cannot be undone.</p>
      {remove.isError ? <Notice tone="danger">Couldn&apos;t delete it. Try again.</Notice> : null}
      <div className="flex gap-2">
        <Button variant="danger" onClick={() => remove.mutate()} disabled={remove.isPending}>
          {remove.isPending ? "Deleting…" : "Delete for good"}
        </Button>
        <Button variant="secondary" onClick={() => setConfirming(false)}>
          Keep it
        </Button>
      </div>
    </div>
  );
}
