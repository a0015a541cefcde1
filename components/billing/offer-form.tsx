"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { SelectField, TextField } from "@/components/ui/field";
import { TextAreaField } from "@/components/ui/text-area";
import { api, applyIssues } from "@/lib/client/api";
import { formatMoney } from "@/lib/client/format-money";
import { CURRENCIES, ZCreateOffer, type OfferDto } from "@/lib/validation/billing";
import { OFFERS_KEY } from "./use-billing";

type FormIn = z.input<typeof ZCreateOffer>;
type FormOut = z.output<typeof ZCreateOffer>;

/** Create an offer, or edit one (a new price applies to checkouts started afterwards). */
export function OfferForm({ offer, onDone }: { offer: OfferDto | null; onDone: () => void }) {
  const queryClient = useQueryClient();
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<FormIn, unknown, FormOut>({
    resolver: zodResolver(ZCreateOffer),
    defaultValues: { name: offer?.name ?? "", priceMinor: offer?.priceMinor ?? 4900, currency: offer?.currency ?? "EUR", includes: offer?.includes ?? "" },
  });
  const save = useMutation({
    mutationFn: (values: FormOut) =>
      offer ? api<OfferDto>(`/api/v1/offers/${offer.id}`, { method: "PATCH", json: values }) : api<OfferDto>("/api/v1/offers", { method: "POST", json: values }),
    onError: (error) => setMessage(applyIssues(error, form.setError)),
    onSuccess: () => onDone(),
    onSettled: () => queryClient.invalidateQueries({ queryKey: OFFERS_KEY }),
  });
  const { errors } = form.formState;
  const price = useWatch({ control: form.control, name: "priceMinor" });
  const currency = useWatch({ control: form.control, name: "currency" });
  const preview = Number.isInteger(price) && price > 0 && CURRENCIES.includes(currency as (typeof CURRENCIES)[number]) ? formatMoney(price, currency) : "—";
  return (
    <Card>
      <h2 className="mb-4 font-display text-lg font-bold">{offer ? `Edit ${offer.name}` : "New offer"}</h2>
      <form onSubmit={form.handleSubmit((v) => save.mutate(v))} className="flex flex-col gap-4" noValidate>
        {message ? <Notice tone="danger">{message}</Notice> : null}
        <TextField label="Name" placeholder="e.g. Monthly coaching" error={errors.name?.message} {...form.register("name")} />
        <div className="grid grid-cols-2 gap-3">
          <TextField
            label="Monthly price (smallest unit)"
            type="number"
            inputMode="numeric"
            hint={`Shown as ${preview} per month`}
            error={errors.priceMinor?.message}
            {...form.register("priceMinor", { valueAsNumber: true })}
          />
          <SelectField label="Currency" error={errors.currency?.message} {...form.register("currency")}>
            {CURRENCIES.map((c) => (
              <option key={c} value={c}>
                {c}
              </option>
            ))}
          </SelectField>
        </div>
        <TextAreaField label="What it includes" rows={3} error={errors.includes?.message} {...form.register("includes")} />
        <div className="flex gap-2">
          <Button type="submit" disabled={save.isPending}>
            {save.isPending ? "Saving…" : offer ? "Save offer" : "Create offer"}
          </Button>
          <Button variant="ghost" onClick={onDone}>
            Cancel
          </Button>
        </div>
      </form>
    </Card>
  );
}
