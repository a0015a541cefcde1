import type { Metadata } from "next";
import { RungHistoryList } from "@/components/today/rung-history-list";
import { EmptyState } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { rungHistory } from "@/lib/server/logs/rung-history";

export const metadata: Metadata = { title: "History" };

export default async function HistoryPage() {
  const actor = await requirePageActor("athlete");
  return (
    <div className="flex flex-col gap-5">
      <h1 className="font-display text-3xl font-bold">History</h1>
      <p className="text-sm text-muted">Your sessions of the last 12 weeks, per rung. All sets of one rung on one day count as one session.</p>
      {actor.athleteId ? (
        <RungHistoryList rungs={await rungHistory(actor, actor.athleteId)} />
      ) : (
        <EmptyState title="No athlete record">Ask your coach to link your account to your athlete record.</EmptyState>
      )}
    </div>
  );
}
