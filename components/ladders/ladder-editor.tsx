"use client";

import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button, buttonClass } from "@/components/ui/button";
import { Badge, Notice, PageHeader } from "@/components/ui/card";
import { api, ApiError } from "@/lib/client/api";
import type { LadderDto } from "@/lib/validation/ladders";
import { LadderDetailsForm } from "./ladder-details-form";
import { RungList } from "./rung-list";
import { usePatchLadder, useLadder, useLadderRefresh } from "./use-ladder";

/** The coach's editor for one ladder: details, rungs in order with their standards, sharing. */
export function LadderEditor({ initial, importNote }: { initial: LadderDto; importNote?: string }) {
  const router = useRouter();
  const { data: ladder } = useLadder(initial);
  const patch = usePatchLadder(ladder.id);
  const refresh = useLadderRefresh(ladder.id);
  const [error, setError] = useState<string | null>(null);
  const duplicate = useMutation({
    mutationFn: () => api<LadderDto>(`/api/v1/ladders/${ladder.id}/duplicate`, { method: "POST", json: {} }),
    onSuccess: (copy) => {
      void refresh();
      router.push(`/coach/ladders/${copy.id}`);
    },
    onError: (e) => setError(e instanceof ApiError ? e.message : "Couldn't copy the ladder."),
  });
  const setArchived = (archived: boolean) =>
    patch.mutate({ archived }, { onError: (e) => setError(e instanceof ApiError ? e.message : "Couldn't change the ladder.") });

  return (
    <>
      <PageHeader
        title={ladder.name}
        lead={
          <span className="flex flex-wrap items-center gap-2">
            {ladder.targetSkill}
            {ladder.starter ? <Badge tone="sky">Starter</Badge> : null}
            {ladder.archived ? <Badge>Archived</Badge> : null}
          </span>
        }
        actions={
          <>
            <a href={`/api/v1/ladders/${ladder.id}/export`} download className={buttonClass("secondary")}>
              Export file
            </a>
            <Button variant="secondary" onClick={() => duplicate.mutate()} disabled={duplicate.isPending}>
              {duplicate.isPending ? "Copying…" : "Duplicate"}
            </Button>
            {ladder.archived ? (
              <Button onClick={() => setArchived(false)} disabled={patch.isPending}>
                Restore
              </Button>
            ) : (
              <Button variant="ghost" onClick={() => setArchived(true)} disabled={patch.isPending}>
                Archive
              </Button>
            )}
          </>
        }
      />
      <div className="mb-6 flex flex-col gap-3">
        {importNote !== undefined ? (
          <Notice tone={importNote ? "ember" : "moss"}>
            <p className="font-semibold">Ladder imported.</p>
            {importNote ? <p className="mt-1 whitespace-pre-line">{importNote}</p> : null}
          </Notice>
        ) : null}
        {error ? <Notice tone="danger">{error}</Notice> : null}
        {ladder.archived ? (
          <Notice>This ladder is archived: athletes on it keep their place, but it can't be changed until you restore it.</Notice>
        ) : null}
      </div>
      <div className="grid gap-6 lg:grid-cols-[1fr_320px]">
        <RungList ladder={ladder} />
        <aside>
          <LadderDetailsForm ladder={ladder} />
        </aside>
      </div>
    </>
  );
}
