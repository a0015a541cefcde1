"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Badge, Card, EmptyState, Notice } from "@/components/ui/card";
import { Spinner } from "@/components/ui/spinner";
import { api } from "@/lib/client/api";
import { formatMoney } from "@/lib/client/format-money";
import type { OfferDto } from "@/lib/validation/billing";
import { GraceDaysForm } from "./grace-days-form";
import { OfferForm } from "./offer-form";
import { SubscribersTable } from "./subscribers-table";
import { OFFERS_KEY, useOffers, useRevenue } from "./use-billing";

type Editing = { kind: "new" } | { kind: "edit"; offer: OfferDto } | null;

/** The owner's billing page: revenue this month, offers, grace period and every membership. */
export function OwnerBilling() {
  const offers = useOffers();
  const revenue = useRevenue();
  const queryClient = useQueryClient();
  const [editing, setEditing] = useState<Editing>(null);
  const [error, setError] = useState<string | null>(null);
  const archive = useMutation({
    mutationFn: (offer: OfferDto) => api(`/api/v1/offers/${offer.id}`, { method: "PATCH", json: { archived: !offer.archived } }),
    onMutate: async (offer) => {
      await queryClient.cancelQueries({ queryKey: OFFERS_KEY });
      const previous = queryClient.getQueryData<OfferDto[]>(OFFERS_KEY);
      queryClient.setQueryData<OfferDto[]>(OFFERS_KEY, (list) => list?.map((o) => (o.id === offer.id ? { ...o, archived: !o.archived } : o)));
      return { previous };
    },
    onError: (_e, _o, context) => {
      if (context?.previous) queryClient.setQueryData(OFFERS_KEY, context.previous);
      setError("Couldn't change the offer. Try again in a moment.");
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: OFFERS_KEY }),
  });

  return (
    <div className="flex flex-col gap-8">
      <section aria-label="Revenue this month">
        <Card>
          <h2 className="font-display text-lg font-bold">Paid this month</h2>
          {revenue.isPending ? <Spinner label="Loading revenue" /> : null}
          {revenue.isError ? <p className="text-danger">Couldn&apos;t load revenue.</p> : null}
          {revenue.isSuccess ? (
            revenue.data.totals.length === 0 ? (
              <p className="text-muted">Nothing paid yet in {revenue.data.month}.</p>
            ) : (
              <ul className="mt-2 flex flex-wrap gap-6">
                {revenue.data.totals.map((t) => (
                  <li key={t.currency}>
                    <span className="font-display text-2xl font-bold">{formatMoney(t.amountMinor, t.currency)}</span>{" "}
                    <span className="text-sm text-muted">({t.payments === 1 ? "1 payment" : `${t.payments} payments`})</span>
                  </li>
                ))}
              </ul>
            )
          ) : null}
        </Card>
      </section>

      <section aria-label="Offers" className="grid gap-6 lg:grid-cols-[1fr_380px]">
        <div className="flex flex-col gap-3">
          <div className="flex items-center justify-between">
            <h2 className="font-display text-xl font-bold">Offers</h2>
            <Button onClick={() => setEditing({ kind: "new" })}>New offer</Button>
          </div>
          {error ? <Notice tone="danger">{error}</Notice> : null}
          {offers.isPending ? <Spinner label="Loading offers" /> : null}
          {offers.isError ? <p className="text-danger">Couldn&apos;t load offers. Try again in a moment.</p> : null}
          {offers.isSuccess && offers.data.length === 0 ? (
            <EmptyState title="No offers yet" action={<Button onClick={() => setEditing({ kind: "new" })}>Create the first offer</Button>}>
              Athletes pay monthly for an offer. While you have no live offer, nobody&apos;s plans depend on payments.
            </EmptyState>
          ) : null}
          <ul className="flex flex-col gap-2">
            {offers.data?.map((offer) => (
              <li key={offer.id}>
                <Card className="flex flex-wrap items-start justify-between gap-3 p-4">
                  <div className="min-w-0 flex-1">
                    <p className="font-semibold">
                      {offer.name} <Badge tone="moss">{formatMoney(offer.priceMinor, offer.currency)} / month</Badge>{" "}
                      {offer.archived ? <Badge>archived</Badge> : null}
                    </p>
                    {offer.includes ? <p className="text-sm text-muted">{offer.includes}</p> : null}
                  </div>
                  <div className="flex gap-2">
                    <Button size="sm" variant="secondary" onClick={() => setEditing({ kind: "edit", offer })}>
                      Edit
                    </Button>
                    <Button size="sm" variant="ghost" onClick={() => archive.mutate(offer)}>
                      {offer.archived ? "Restore" : "Archive"}
                    </Button>
                  </div>
                </Card>
              </li>
            ))}
          </ul>
        </div>
        <aside className="flex flex-col gap-4">
          {editing ? <OfferForm key={editing.kind === "edit" ? editing.offer.id : "new"} offer={editing.kind === "edit" ? editing.offer : null} onDone={() => setEditing(null)} /> : null}
          <GraceDaysForm />
        </aside>
      </section>

      <section aria-label="Memberships">
        <h2 className="mb-3 font-display text-xl font-bold">Memberships</h2>
        <SubscribersTable />
      </section>
    </div>
  );
}
