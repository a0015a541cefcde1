import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { READINESS_SORTS, READINESS_STATUS_FILTERS, type ReadinessSort, type ReadinessStatusFilter } from "@/lib/validation/readiness";
import { SORT_LABELS, STATUS_LABELS, shiftWeek, type ReadinessFilters } from "./readiness-params";

export interface Choice {
  id: string;
  name: string;
}

/** Week picker (ISO 8601 weeks), squad, ladder, status, sort and "my athletes". */
export function ReadinessFilterBar({
  filters,
  squads,
  ladders,
  onChange,
}: {
  filters: ReadinessFilters;
  squads: Choice[];
  ladders: Choice[];
  onChange: (next: Partial<ReadinessFilters>) => void;
}) {
  return (
    <div className="flex flex-wrap items-end gap-3">
      <div className="flex items-end gap-1">
        <Button variant="secondary" onClick={() => onChange({ week: shiftWeek(filters.week, -1) })} aria-label="Previous week">
          ←
        </Button>
        <div className="w-44">
          <TextField
            label="ISO week"
            type="week"
            value={filters.week}
            onChange={(e) => (e.target.value ? onChange({ week: e.target.value }) : undefined)}
          />
        </div>
        <Button variant="secondary" onClick={() => onChange({ week: shiftWeek(filters.week, 1) })} aria-label="Next week">
          →
        </Button>
      </div>
      <div className="w-48">
        <SelectField label="Squad" value={filters.squad} onChange={(e) => onChange({ squad: e.target.value })}>
          <option value="">Every squad</option>
          {squads.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </SelectField>
      </div>
      <div className="w-52">
        <SelectField label="Ladder" value={filters.ladder} onChange={(e) => onChange({ ladder: e.target.value })}>
          <option value="">Every ladder</option>
          {ladders.map((l) => (
            <option key={l.id} value={l.id}>
              {l.name}
            </option>
          ))}
        </SelectField>
      </div>
      <div className="w-64">
        <SelectField
          label="Show"
          value={filters.status}
          onChange={(e) => onChange({ status: e.target.value as ReadinessStatusFilter | "" })}
        >
          <option value="">Everyone</option>
          {READINESS_STATUS_FILTERS.map((s) => (
            <option key={s} value={s}>
              {STATUS_LABELS[s]}
            </option>
          ))}
        </SelectField>
      </div>
      {filters.status === "stalled" ? (
        <div className="w-36">
          <TextField
            label="Stalled after (weeks)"
            type="number"
            min={1}
            max={104}
            value={filters.stalledWeeks}
            onChange={(e) => onChange({ stalledWeeks: Math.max(1, Math.min(104, Number(e.target.value) || 4)) })}
          />
        </div>
      ) : null}
      <div className="w-56">
        <SelectField label="Sort" value={filters.sort} onChange={(e) => onChange({ sort: e.target.value as ReadinessSort })}>
          {READINESS_SORTS.map((s) => (
            <option key={s} value={s}>
              {SORT_LABELS[s]}
            </option>
          ))}
        </SelectField>
      </div>
      <label className="flex h-11 items-center gap-2 text-sm font-semibold">
        <input type="checkbox" checked={filters.mine} onChange={(e) => onChange({ mine: e.target.checked })} className="h-4 w-4" />
        Only my athletes
      </label>
    </div>
  );
}
