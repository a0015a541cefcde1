"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { api } from "@/lib/client/api";
import { AssignDialog } from "./assign-dialog";

/** Header actions of a plan: assign it, or remove it (archived when it was ever assigned). */
export function PlanActions({ planId, planName, archived }: { planId: string; planName: string; archived: boolean }) {
  const [open, setOpen] = useState(false);
  const router = useRouter();
  const queryClient = useQueryClient();
  const remove = useMutation({
    mutationFn: () => api(`/api/v1/plans/${planId}`, { method: "DELETE" }),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: ["plans"] });
      router.push("/coach/plans");
    },
  });
  return (
    <>
      {archived ? null : <Button onClick={() => setOpen(true)}>Assign</Button>}
      <Button
        variant="ghost"
        disabled={remove.isPending}
        onClick={() => {
          if (window.confirm("Remove this plan? If anyone was given it, it is archived and their assignments keep running.")) remove.mutate();
        }}
      >
        Remove
      </Button>
      {remove.isError ? <span className="text-sm text-danger">Couldn&apos;t remove it. Try again.</span> : null}
      {open ? <AssignDialog planId={planId} planName={planName} onClose={() => setOpen(false)} /> : null}
    </>
  );
}
