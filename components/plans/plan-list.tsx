"use client";

import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { buttonClass } from "@/components/ui/button";
import { Badge, Card, EmptyState } from "@/components/ui/card";
import { Spinner } from "@/components/ui/spinner";
import { api } from "@/lib/client/api";
import { formatDuration } from "@/lib/training/block-estimate";
import type { Page } from "@/lib/validation/common";
import type { PlanDto } from "@/lib/validation/plans";
import { WEEKDAYS } from "./weekdays";

/** The team's plans: weeks, training days and the estimated time of each day. */
export function PlanList() {
  const plans = useQuery({ queryKey: ["plans", "list"], queryFn: () => api<Page<PlanDto>>("/api/v1/plans?limit=100") });
  if (plans.isPending) return <Spinner label="Loading plans" />;
  if (plans.isError) return <p className="text-danger">Couldn&apos;t load plans. Try again in a moment.</p>;
  if (plans.data.items.length === 0) {
    return (
      <EmptyState title="No plans yet" action={<Link href="/coach/plans/new" className={buttonClass()}>Write the first plan</Link>}>
        A plan puts blocks on weekdays for a number of weeks. Give it to one athlete or a whole squad.
      </EmptyState>
    );
  }
  return (
    <ul className="grid gap-3 md:grid-cols-2">
      {plans.data.items.map((plan) => (
        <li key={plan.id}>
          <Link href={`/coach/plans/${plan.id}`} className="block h-full">
            <Card className="h-full p-4 hover:border-moss">
              <div className="flex items-start justify-between gap-2">
                <p className="font-semibold">{plan.name}</p>
                <Badge tone="sky">{plan.weeks === 1 ? "1 week" : `${plan.weeks} weeks`}</Badge>
              </div>
              {plan.days.length === 0 ? (
                <p className="mt-1 text-sm text-muted">No training days yet.</p>
              ) : (
                <p className="mt-1 text-sm text-muted">
                  {plan.days.map((d) => `${WEEKDAYS[d.weekday - 1]!.short} ≈ ${formatDuration(d.durationSec)}`).join(" · ")}
                </p>
              )}
            </Card>
          </Link>
        </li>
      ))}
    </ul>
  );
}
