"use client";

import type { UseFormReturn } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { SelectField, TextField } from "@/components/ui/field";
import type { LadderChoice } from "@/lib/validation/blocks";
import type { z } from "zod";
import type { ZCreateBlock } from "@/lib/validation/blocks";
import type { BlockFormIn } from "./block-editor";

interface Props {
  index: number;
  count: number;
  form: UseFormReturn<BlockFormIn, unknown, z.output<typeof ZCreateBlock>>;
  ladders: LadderChoice[];
  onMove: (to: number) => void;
  onRemove: () => void;
}

/** One slot: which ladder, optional sets, the coach's target and note; move up/down or remove. */
export function SlotRow({ index, count, form, ladders, onMove, onRemove }: Props) {
  const errors = form.formState.errors.slots?.[index];
  const emptyToNull = (v: string) => (v === "" || v === null || v === undefined ? null : Number(v));
  return (
    <Card className="p-4" aria-label={`Slot ${index + 1}`}>
      <div className="mb-3 flex items-center justify-between gap-2">
        <p className="font-semibold">Slot {index + 1}</p>
        <div className="flex gap-1">
          <Button size="sm" variant="ghost" aria-label={`Move slot ${index + 1} up`} disabled={index === 0} onClick={() => onMove(index - 1)}>
            ↑ Up
          </Button>
          <Button size="sm" variant="ghost" aria-label={`Move slot ${index + 1} down`} disabled={index === count - 1} onClick={() => onMove(index + 1)}>
            ↓ Down
          </Button>
          <Button size="sm" variant="ghost" aria-label={`Remove slot ${index + 1}`} onClick={onRemove}>
            Remove
          </Button>
        </div>
      </div>
      <div className="grid gap-3 md:grid-cols-[2fr_1fr]">
        <SelectField label="Ladder" error={errors?.ladderId?.message} {...form.register(`slots.${index}.ladderId`)}>
          {ladders.map((ladder) => (
            <option key={ladder.id} value={ladder.id}>
              {ladder.name}
              {ladder.firstRung ? "" : " (no rungs yet)"}
            </option>
          ))}
        </SelectField>
        <TextField
          label="Sets (optional)"
          type="number"
          min={1}
          max={20}
          hint="Empty: one per round"
          error={errors?.sets?.message}
          {...form.register(`slots.${index}.sets`, { setValueAs: emptyToNull })}
        />
        <TextField label="Target (optional)" placeholder="e.g. 3 calm holds" error={errors?.target?.message} {...form.register(`slots.${index}.target`)} />
        <TextField label="Note (optional)" error={errors?.note?.message} {...form.register(`slots.${index}.note`)} />
      </div>
    </Card>
  );
}
