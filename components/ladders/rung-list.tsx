"use client";

import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Badge, Card, EmptyState, Notice } from "@/components/ui/card";
import { api, ApiError } from "@/lib/client/api";
import { MEASURE_LABELS, type LadderDto, type RungDto } from "@/lib/validation/ladders";
import { RungForm } from "./rung-form";
import { useLadderRefresh, useReorderRungs } from "./use-ladder";

function moved(ids: string[], index: number, by: -1 | 1): string[] {
  const next = [...ids];
  const [item] = next.splice(index, 1);
  next.splice(index + by, 0, item!);
  return next;
}

/** Live rungs in order with keyboard-reachable move buttons, edit, archive/remove, and the add form. */
export function RungList({ ladder }: { ladder: LadderDto }) {
  const reorder = useReorderRungs(ladder.id);
  const refresh = useLadderRefresh(ladder.id);
  const [editing, setEditing] = useState<string | "new" | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [status, setStatus] = useState("");
  const remove = useMutation({
    mutationFn: (rung: RungDto) => api<void>(`/api/v1/rungs/${rung.id}`, { method: "DELETE" }),
    onSuccess: (_r, rung) => {
      setStatus(rung.athleteCount > 0 ? `${rung.name} archived; its athletes keep their place.` : `${rung.name} removed.`);
      void refresh();
    },
    onError: (e) => setError(e instanceof ApiError ? e.message : "Couldn't remove the rung."),
  });
  const ids = ladder.rungs.map((r) => r.id);
  const move = (index: number, by: -1 | 1) => {
    setError(null);
    const rung = ladder.rungs[index]!;
    reorder.mutate(moved(ids, index, by), {
      onSuccess: () => setStatus(`${rung.name} moved to position ${index + 1 + by}.`),
      onError: (e) => setError(e instanceof ApiError ? `${e.message} ${e.issues.map((i) => i.message).join(" ")}` : "Couldn't reorder; the order was put back."),
    });
  };
  const readOnly = ladder.archived;

  return (
    <section aria-labelledby="rungs-heading" className="flex flex-col gap-4">
      <div className="flex items-center justify-between">
        <h2 id="rungs-heading" className="font-display text-xl font-bold">
          Rungs, easiest first
        </h2>
        {!readOnly && editing !== "new" ? <Button onClick={() => setEditing("new")}>Add rung</Button> : null}
      </div>
      <p className="sr-only" role="status" aria-live="polite">
        {status}
      </p>
      {error ? <Notice tone="danger">{error}</Notice> : null}
      {editing === "new" ? (
        <Card>
          <h3 className="mb-4 font-display text-lg font-bold">New rung</h3>
          <RungForm ladderId={ladder.id} onDone={() => setEditing(null)} />
        </Card>
      ) : null}
      {ladder.rungs.length === 0 && editing !== "new" ? (
        <EmptyState title="No rungs yet" action={readOnly ? undefined : <Button onClick={() => setEditing("new")}>Add the first rung</Button>}>
          A rung is one progression with its readiness standard. Start with the easiest.
        </EmptyState>
      ) : null}
      <ol className="flex flex-col gap-3">
        {ladder.rungs.map((rung, index) => (
          <li key={rung.id} aria-label={`Rung ${index + 1}: ${rung.name}`}>
            <Card className="flex flex-col gap-3">
              <div className="flex flex-wrap items-start justify-between gap-3">
                <div className="flex items-start gap-3">
                  <span className="flex h-8 w-8 shrink-0 items-center justify-center rounded-full bg-sunken font-mono text-sm font-bold">
                    {index + 1}
                  </span>
                  <div>
                    <p className="font-semibold">{rung.name}</p>
                    <p className="text-sm text-muted">
                      {MEASURE_LABELS[rung.measure]}
                      {rung.setting ? ` · ${rung.setting}` : ""}
                      {rung.athleteCount ? ` · ${rung.athleteCount} on this rung` : ""}
                    </p>
                  </div>
                </div>
                {readOnly ? null : (
                  <div className="flex flex-wrap gap-1">
                    <Button size="sm" variant="ghost" aria-label={`Move ${rung.name} up`} disabled={index === 0 || reorder.isPending} onClick={() => move(index, -1)}>
                      ↑ Up
                    </Button>
                    <Button
                      size="sm"
                      variant="ghost"
                      aria-label={`Move ${rung.name} down`}
                      disabled={index === ladder.rungs.length - 1 || reorder.isPending}
                      onClick={() => move(index, 1)}
                    >
                      ↓ Down
                    </Button>
                    <Button size="sm" variant="secondary" onClick={() => setEditing(editing === rung.id ? null : rung.id)} aria-expanded={editing === rung.id}>
                      {editing === rung.id ? "Close" : "Edit"}
                    </Button>
                    <Button
                      size="sm"
                      variant="ghost"
                      disabled={remove.isPending}
                      onClick={() => {
                        const verb = rung.athleteCount > 0 ? "Archive" : "Remove";
                        if (window.confirm(`${verb} "${rung.name}"? Athletes on it keep their place.`)) remove.mutate(rung);
                      }}
                    >
                      {rung.athleteCount > 0 ? "Archive" : "Remove"}
                    </Button>
                  </div>
                )}
              </div>
              <p className="rounded-lg bg-moss-soft px-3 py-2 text-sm text-moss-strong">
                <span className="font-semibold">Ready when: </span>
                {rung.standardText}
              </p>
              {rung.caution ? <p className="text-sm text-ember">⚠ {rung.caution}</p> : null}
              {rung.prerequisites.length ? (
                <p className="flex flex-wrap items-center gap-1 text-sm text-muted">
                  Needs first:
                  {rung.prerequisites.map((p) => (
                    <Badge key={p.rungId} tone="sky">
                      {p.ladderName} › {p.rungName}
                    </Badge>
                  ))}
                </p>
              ) : null}
              {editing === rung.id ? <RungForm ladderId={ladder.id} rung={rung} onDone={() => setEditing(null)} /> : null}
            </Card>
          </li>
        ))}
      </ol>
      {ladder.archivedRungs.length ? (
        <details className="rounded-card border border-line bg-surface p-4">
          <summary className="cursor-pointer font-semibold">Archived rungs ({ladder.archivedRungs.length})</summary>
          <ul className="mt-3 flex flex-col gap-2 text-sm">
            {ladder.archivedRungs.map((rung) => (
              <li key={rung.id}>
                {rung.name} — {rung.athleteCount} {rung.athleteCount === 1 ? "athlete" : "athletes"} still on it · {rung.standardText}
              </li>
            ))}
          </ul>
        </details>
      ) : null}
    </section>
  );
}
