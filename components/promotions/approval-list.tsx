"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { EmptyState, Notice } from "@/components/ui/card";
import { Spinner } from "@/components/ui/spinner";
import { api, ApiError } from "@/lib/client/api";
import type { Page } from "@/lib/validation/common";
import type { PromotionDto } from "@/lib/validation/promotions";
import { ApprovalCard } from "./approval-card";

const PENDING_KEY = ["promotions", { status: "pending" }] as const;
type Decision = "approve" | "decline";

function doneText(promotion: PromotionDto, decision: Decision): string {
  const who = promotion.athlete.name;
  if (decision === "decline") return `Declined: ${who} stays on ${promotion.fromRung.name}.`;
  if (promotion.toRung === null) return `${who} achieved ${promotion.ladder.name}. Time to celebrate!`;
  if (promotion.direction === "down") return `${who} steps down to ${promotion.toRung.name}.`;
  return `${who} moves up to ${promotion.toRung.name}.`;
}

/** Pending proposals with one-click decisions: the card leaves at once and comes back if the server says no. */
export function ApprovalList() {
  const client = useQueryClient();
  const [message, setMessage] = useState<{ tone: "moss" | "danger"; text: string } | null>(null);
  const query = useQuery({
    queryKey: PENDING_KEY,
    queryFn: () => api<Page<PromotionDto>>("/api/v1/promotions?status=pending&limit=100"),
  });

  const decide = useMutation({
    mutationFn: ({ promotion, decision }: { promotion: PromotionDto; decision: Decision }) =>
      api<PromotionDto>(`/api/v1/promotions/${promotion.id}/${decision}`, { method: "POST" }),
    onMutate: async ({ promotion }) => {
      await client.cancelQueries({ queryKey: PENDING_KEY });
      const previous = client.getQueryData<Page<PromotionDto>>(PENDING_KEY);
      client.setQueryData<Page<PromotionDto>>(PENDING_KEY, (page) =>
        page ? { ...page, items: page.items.filter((p) => p.id !== promotion.id) } : page,
      );
      return { previous };
    },
    onError: (error, _vars, context) => {
      if (context?.previous) client.setQueryData(PENDING_KEY, context.previous);
      setMessage({
        tone: "danger",
        text: error instanceof ApiError ? error.message : "Couldn't save the decision. Check your connection and try again.",
      });
    },
    onSuccess: (_data, { promotion, decision }) => setMessage({ tone: "moss", text: doneText(promotion, decision) }),
    onSettled: () => client.invalidateQueries({ queryKey: ["promotions"] }),
  });

  const items = query.data?.items ?? [];
  return (
    <section aria-label="Pending proposals" className="flex flex-col gap-4">
      {message ? (
        <div role="status">
          <Notice tone={message.tone}>{message.text}</Notice>
        </div>
      ) : null}
      {query.isPending ? <Spinner label="Loading proposals" /> : null}
      {query.isError ? (
        <Notice tone="danger">
          Couldn&apos;t load the proposals.{" "}
          <Button variant="ghost" size="sm" onClick={() => query.refetch()}>
            Try again
          </Button>
        </Notice>
      ) : null}
      {query.isSuccess && items.length === 0 ? (
        <EmptyState title="Nothing waits for you">
          When an athlete meets the standard on an approve ladder, or the engine suggests a step down, the proposal shows up
          here for one click.
        </EmptyState>
      ) : null}
      <ul className="flex flex-col gap-3">
        {items.map((promotion) => (
          <li key={promotion.id}>
            <ApprovalCard
              promotion={promotion}
              busy={decide.isPending && decide.variables?.promotion.id === promotion.id}
              onApprove={() => decide.mutate({ promotion, decision: "approve" })}
              onDecline={() => decide.mutate({ promotion, decision: "decline" })}
            />
          </li>
        ))}
      </ul>
    </section>
  );
}
