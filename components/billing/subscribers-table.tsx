"use client";

import { Button } from "@/components/ui/button";
import { Badge, EmptyState } from "@/components/ui/card";
import { Spinner } from "@/components/ui/spinner";
import { formatMoney } from "@/lib/client/format-money";
import type { SubscriptionStatus } from "@/lib/validation/billing";
import { useSubscribers } from "./use-billing";

const STATUS: Record<SubscriptionStatus, { label: string; tone: "moss" | "ember" | "danger" | "neutral" }> = {
  active: { label: "Active", tone: "moss" },
  past_due: { label: "Past due", tone: "ember" },
  cancelled: { label: "Cancelled", tone: "danger" },
  pending: { label: "Checkout not finished", tone: "neutral" },
};

const dateOf = (iso: string | null) => (iso ? new Intl.DateTimeFormat(undefined, { dateStyle: "medium" }).format(new Date(iso)) : "—");

/** Who is active, past due or cancelled, and whether each can still receive new plans. */
export function SubscribersTable() {
  const query = useSubscribers();
  if (query.isPending) return <Spinner label="Loading memberships" />;
  if (query.isError) return <p className="text-danger">Couldn&apos;t load memberships. Try again in a moment.</p>;
  const subscribers = query.data.pages.flatMap((page) => page.items);
  if (subscribers.length === 0) {
    return <EmptyState title="No memberships yet">Athletes pick an offer on their Membership page; they appear here once they start paying.</EmptyState>;
  }
  return (
    <div className="flex flex-col gap-3">
      <div className="overflow-x-auto rounded-card border border-line bg-surface">
        <table className="w-full text-left text-sm">
          <thead className="bg-sunken text-muted">
            <tr>
              <th className="px-4 py-2 font-semibold">Athlete</th>
              <th className="px-4 py-2 font-semibold">Offer</th>
              <th className="px-4 py-2 font-semibold">Status</th>
              <th className="px-4 py-2 font-semibold">Paid until</th>
              <th className="px-4 py-2 font-semibold">New plans</th>
            </tr>
          </thead>
          <tbody>
            {subscribers.map((s) => (
              <tr key={s.athleteId} className="border-t border-line">
                <td className="px-4 py-2 font-semibold">{s.athleteName}</td>
                <td className="px-4 py-2">
                  {s.offerName} <span className="text-muted">({formatMoney(s.priceMinor, s.currency)})</span>
                </td>
                <td className="px-4 py-2">
                  <Badge tone={STATUS[s.status].tone}>{STATUS[s.status].label}</Badge>
                  {s.cancelAtPeriodEnd && s.status === "active" ? <span className="ml-2 text-xs text-muted">ends at period end</span> : null}
                </td>
                <td className="px-4 py-2">{dateOf(s.currentPeriodEnd)}</td>
                <td className="px-4 py-2">{s.canReceiveAssignments ? "Yes" : <span className="text-danger">Paused until they pay</span>}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {query.hasNextPage ? (
        <Button variant="secondary" onClick={() => query.fetchNextPage()} disabled={query.isFetchingNextPage}>
          {query.isFetchingNextPage ? "Loading…" : "Show more"}
        </Button>
      ) : null}
    </div>
  );
}
