"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Badge, Card, EmptyState, Notice } from "@/components/ui/card";
import { Spinner } from "@/components/ui/spinner";
import { api, ApiError } from "@/lib/client/api";
import { formatMoney } from "@/lib/client/format-money";
import type { MembershipDto, SubscriptionStatus } from "@/lib/validation/billing";
import { MEMBERSHIP_KEY, useMembership, useOffers } from "./use-billing";

const STATUS: Record<SubscriptionStatus, string> = {
  active: "Active",
  past_due: "Payment failed: please pay again",
  cancelled: "Ended",
  pending: "Checkout not finished",
};

const dateOf = (iso: string) => new Intl.DateTimeFormat(undefined, { dateStyle: "long" }).format(new Date(iso));
const messageOf = (error: unknown) => (error instanceof ApiError ? error.message : "Something went wrong. Check your connection and try again.");

/** The athlete's membership: current offer and next charge, or the offers to pick from (phone-first). */
export function AthleteMembership({ returnedFromCheckout }: { returnedFromCheckout: boolean }) {
  const membership = useMembership();
  const offers = useOffers();
  const queryClient = useQueryClient();
  const [error, setError] = useState<string | null>(null);
  const pay = useMutation({
    mutationFn: (offerId: string) => api<{ url: string }>(`/api/v1/offers/${offerId}/checkout`, { method: "POST" }),
    onSuccess: ({ url }) => window.location.assign(url),
    onError: (e) => setError(messageOf(e)),
  });
  const cancel = useMutation({
    mutationFn: (cancelAtPeriodEnd: boolean) => api<MembershipDto>("/api/v1/billing/membership", { method: "PATCH", json: { cancelAtPeriodEnd } }),
    onSuccess: (data) => queryClient.setQueryData(MEMBERSHIP_KEY, data),
    onError: (e) => setError(messageOf(e)),
  });

  if (membership.isPending) return <Spinner label="Loading your membership" />;
  if (membership.isError) return <p className="text-danger">Couldn&apos;t load your membership. Try again in a moment.</p>;
  const sub = membership.data.subscription;
  const live = sub && (sub.status === "active" || sub.status === "past_due");

  return (
    <div className="flex flex-col gap-4">
      {error ? <Notice tone="danger">{error}</Notice> : null}
      {returnedFromCheckout && sub?.status !== "active" ? (
        <Notice>Thanks! Your payment is being confirmed; this page updates in a moment.</Notice>
      ) : null}
      {sub ? (
        <Card>
          <p className="text-sm text-muted">Your offer</p>
          <p className="font-display text-2xl font-bold">{sub.offerName}</p>
          <p className="mt-1">
            {formatMoney(sub.priceMinor, sub.currency)} per month{" "}
            <Badge tone={sub.status === "active" ? "moss" : sub.status === "past_due" ? "ember" : "neutral"}>{STATUS[sub.status]}</Badge>
          </p>
          {sub.nextChargeAt ? <p className="mt-2">Next charge on {dateOf(sub.nextChargeAt)}.</p> : null}
          {sub.cancelAtPeriodEnd && sub.currentPeriodEnd ? <p className="mt-2">Ends on {dateOf(sub.currentPeriodEnd)}; nothing more is charged.</p> : null}
          {live ? (
            <Button className="mt-4 w-full" size="lg" variant="secondary" disabled={cancel.isPending} onClick={() => cancel.mutate(!sub.cancelAtPeriodEnd)}>
              {cancel.isPending ? "Saving…" : sub.cancelAtPeriodEnd ? "Keep my membership" : "Cancel at period end"}
            </Button>
          ) : null}
        </Card>
      ) : null}
      {sub?.status === "active" ? null : (
        <section aria-label="Offers" className="flex flex-col gap-3">
          <h2 className="font-display text-xl font-bold">{sub ? "Pay again" : "Choose an offer"}</h2>
          {offers.isPending ? <Spinner label="Loading offers" /> : null}
          {offers.isError ? <p className="text-danger">Couldn&apos;t load offers.</p> : null}
          {offers.isSuccess && offers.data.length === 0 ? (
            <EmptyState title="Nothing to pay for">Your coach has no paid offers. Your training works as usual.</EmptyState>
          ) : null}
          {offers.data?.map((offer) => (
            <Card key={offer.id}>
              <p className="font-semibold">{offer.name}</p>
              <p>{formatMoney(offer.priceMinor, offer.currency)} per month</p>
              {offer.includes ? <p className="mt-1 text-sm text-muted">{offer.includes}</p> : null}
              <Button className="mt-3 w-full" size="lg" disabled={pay.isPending || !membership.data.billingEnabled} onClick={() => pay.mutate(offer.id)}>
                {pay.isPending && pay.variables === offer.id ? "Opening checkout…" : "Pay"}
              </Button>
            </Card>
          ))}
        </section>
      )}
    </div>
  );
}
