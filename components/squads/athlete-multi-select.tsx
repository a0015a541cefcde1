"use client";

import { useId, useState } from "react";
import { Spinner } from "@/components/ui/spinner";
import { useAllAthletes } from "./use-team-data";

/** Checkbox list of the team's athletes with a name filter; the value is the chosen ids. */
export function AthleteMultiSelect({ value, onChange, error }: { value: string[]; onChange: (ids: string[]) => void; error?: string }) {
  const athletes = useAllAthletes();
  const [filter, setFilter] = useState("");
  const id = useId();
  const chosen = new Set(value);
  const shown = (athletes.data ?? []).filter((a) => a.name.toLowerCase().includes(filter.trim().toLowerCase()));
  const toggle = (athleteId: string) => onChange(chosen.has(athleteId) ? value.filter((v) => v !== athleteId) : [...value, athleteId]);
  return (
    <fieldset className="flex flex-col gap-2" aria-describedby={error ? `${id}-error` : undefined}>
      <legend className="text-sm font-semibold text-ink">
        Members <span className="font-normal text-muted">({value.length} chosen)</span>
      </legend>
      <input
        type="search"
        aria-label="Filter athletes by name"
        placeholder="Filter by name"
        value={filter}
        onChange={(e) => setFilter(e.target.value)}
        className="h-9 rounded-lg border border-line bg-surface px-3 text-sm focus:border-moss focus:outline-none"
      />
      {athletes.isPending ? <Spinner label="Loading athletes" /> : null}
      {athletes.isError ? <p className="text-sm text-danger">Couldn&apos;t load athletes. Try again in a moment.</p> : null}
      {athletes.isSuccess && athletes.data.length === 0 ? <p className="text-sm text-muted">No athletes yet: add some on the Athletes page first.</p> : null}
      <ul className="max-h-64 overflow-y-auto rounded-lg border border-line bg-surface">
        {shown.map((athlete) => (
          <li key={athlete.id} className="border-b border-line last:border-b-0">
            <label className="flex cursor-pointer items-center gap-3 px-3 py-2 text-sm hover:bg-sunken">
              <input type="checkbox" className="h-4 w-4" checked={chosen.has(athlete.id)} onChange={() => toggle(athlete.id)} />
              {athlete.name}
              {athlete.archived ? <span className="text-xs text-muted">(archived)</span> : null}
            </label>
          </li>
        ))}
      </ul>
      {error ? (
        <p id={`${id}-error`} role="alert" className="text-sm text-danger">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}
