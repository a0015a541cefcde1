"use client";

import { useQuery } from "@tanstack/react-query";
import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { SelectField } from "@/components/ui/field";
import { api } from "@/lib/client/api";
import type { Page } from "@/lib/validation/common";
import type { LadderDto, LadderSummaryDto } from "@/lib/validation/ladders";

export interface PickedRung {
  id: string;
  label: string;
}

/** Rungs of other ladders that must be reached before this rung counts: pick a ladder, then a rung. */
export function PrerequisitePicker({
  ladderId,
  value,
  onChange,
  error,
}: {
  ladderId: string;
  value: PickedRung[];
  onChange: (next: PickedRung[]) => void;
  error?: string;
}) {
  const headingId = useId();
  const [otherId, setOtherId] = useState("");
  const [rungId, setRungId] = useState("");
  const ladders = useQuery({
    queryKey: ["ladders", { picker: true }],
    queryFn: () => api<Page<LadderSummaryDto>>("/api/v1/ladders?limit=100"),
  });
  const other = useQuery({
    queryKey: ["ladder", otherId],
    queryFn: () => api<LadderDto>(`/api/v1/ladders/${otherId}`),
    enabled: Boolean(otherId),
  });
  const choices = (ladders.data?.items ?? []).filter((l) => l.id !== ladderId);
  const add = () => {
    const rung = other.data?.rungs.find((r) => r.id === rungId);
    if (!rung || !other.data || value.some((p) => p.id === rung.id)) return;
    onChange([...value, { id: rung.id, label: `${other.data.name} › ${rung.name}` }]);
    setRungId("");
  };
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-3 rounded-lg border border-line p-4">
      <h4 id={headingId} className="font-display font-bold">
        Prerequisites on other ladders
      </h4>
      {value.length === 0 ? <p className="text-sm text-muted">None: athletes can move onto this rung from the one below.</p> : null}
      <ul className="flex flex-wrap gap-2">
        {value.map((p) => (
          <li key={p.id} className="flex items-center gap-1 rounded-full bg-sky-soft px-3 py-1 text-sm text-sky">
            {p.label}
            <button type="button" className="ml-1 font-bold" aria-label={`Remove prerequisite ${p.label}`} onClick={() => onChange(value.filter((x) => x.id !== p.id))}>
              ×
            </button>
          </li>
        ))}
      </ul>
      <div className="grid gap-3 sm:grid-cols-[1fr_1fr_auto] sm:items-end">
        <SelectField label="Ladder" value={otherId} onChange={(e) => { setOtherId(e.target.value); setRungId(""); }}>
          <option value="">{ladders.isPending ? "Loading…" : "Choose a ladder"}</option>
          {choices.map((l) => (
            <option key={l.id} value={l.id}>
              {l.name}
            </option>
          ))}
        </SelectField>
        <SelectField label="Rung" value={rungId} onChange={(e) => setRungId(e.target.value)} disabled={!other.data}>
          <option value="">{other.isFetching ? "Loading…" : "Choose a rung"}</option>
          {other.data?.rungs.map((r) => (
            <option key={r.id} value={r.id}>
              {r.position}. {r.name}
            </option>
          ))}
        </SelectField>
        <Button variant="secondary" onClick={add} disabled={!rungId}>
          Add prerequisite
        </Button>
      </div>
      {error ? (
        <p role="alert" className="text-sm text-danger">
          {error}
        </p>
      ) : null}
    </section>
  );
}
