"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Badge, Card, EmptyState, Notice } from "@/components/ui/card";
import { Spinner } from "@/components/ui/spinner";
import { api } from "@/lib/client/api";
import type { SquadDto } from "@/lib/validation/squads";
import { SquadForm } from "./squad-form";
import { SQUADS_KEY, useSquads } from "./use-team-data";

type Editing = { kind: "new" } | { kind: "edit"; squad: SquadDto } | null;

/** The team's squads, with a side panel to create one or edit its name and members. */
export function SquadManager() {
  const squads = useSquads();
  const queryClient = useQueryClient();
  const [editing, setEditing] = useState<Editing>(null);
  const [error, setError] = useState<string | null>(null);
  const remove = useMutation({
    mutationFn: (squad: SquadDto) => api(`/api/v1/squads/${squad.id}`, { method: "DELETE" }),
    onMutate: async (squad) => {
      await queryClient.cancelQueries({ queryKey: SQUADS_KEY });
      const previous = queryClient.getQueryData<SquadDto[]>(SQUADS_KEY);
      queryClient.setQueryData<SquadDto[]>(SQUADS_KEY, (list) => list?.filter((s) => s.id !== squad.id));
      return { previous };
    },
    onError: (_error, _squad, context) => {
      if (context?.previous) queryClient.setQueryData(SQUADS_KEY, context.previous);
      setError("Couldn't delete the squad. Try again in a moment.");
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: SQUADS_KEY }),
  });

  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_380px]">
      <section aria-label="Squads" className="flex flex-col gap-3">
        <div>
          <Button onClick={() => setEditing({ kind: "new" })}>New squad</Button>
        </div>
        {error ? <Notice tone="danger">{error}</Notice> : null}
        {squads.isPending ? <Spinner label="Loading squads" /> : null}
        {squads.isError ? <p className="text-danger">Couldn&apos;t load squads. Try again in a moment.</p> : null}
        {squads.isSuccess && squads.data.length === 0 ? (
          <EmptyState title="No squads yet" action={<Button onClick={() => setEditing({ kind: "new" })}>Create the first squad</Button>}>
            Group athletes who train together (a class, a level) to give them a plan in one go. An athlete can be in several squads.
          </EmptyState>
        ) : null}
        <ul className="flex flex-col gap-2">
          {squads.data?.map((squad) => (
            <li key={squad.id}>
              <Card className="flex flex-wrap items-start justify-between gap-3 p-4">
                <div className="min-w-0 flex-1">
                  <p className="font-semibold">
                    {squad.name} <Badge tone="sky">{squad.memberCount === 1 ? "1 athlete" : `${squad.memberCount} athletes`}</Badge>
                  </p>
                  {squad.description ? <p className="text-sm text-muted">{squad.description}</p> : null}
                  <p className="mt-1 text-sm text-muted">{squad.members.length ? squad.members.map((m) => m.name).join(", ") : "No members yet."}</p>
                </div>
                <div className="flex gap-2">
                  <Button size="sm" variant="secondary" onClick={() => setEditing({ kind: "edit", squad })}>
                    Edit
                  </Button>
                  <Button
                    size="sm"
                    variant="ghost"
                    onClick={() => {
                      if (window.confirm(`Delete ${squad.name}? Plans already given through it stay with each athlete.`)) remove.mutate(squad);
                    }}
                  >
                    Delete
                  </Button>
                </div>
              </Card>
            </li>
          ))}
        </ul>
      </section>
      <aside>
        {editing ? (
          <SquadForm key={editing.kind === "edit" ? editing.squad.id : "new"} squad={editing.kind === "edit" ? editing.squad : null} onDone={() => setEditing(null)} />
        ) : (
          <Card className="text-sm text-muted">Choose a squad to edit its members, or start a new one.</Card>
        )}
      </aside>
    </div>
  );
}
