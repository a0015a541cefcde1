import type { Metadata } from "next";
import { ProgressView } from "@/components/progress/progress-view";
import { EmptyState } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { getAthleteLoad } from "@/lib/server/load/get-athlete-load";
import { getAthleteProgress } from "@/lib/server/progress/get-athlete-progress";

export const metadata: Metadata = { title: "Progress" };

export default async function MyProgressPage() {
  const actor = await requirePageActor("athlete");
  if (!actor.athleteId) {
    return <EmptyState title="No athlete record yet">Ask your coach to link your account to your athlete record.</EmptyState>;
  }
  const [progress, load] = await Promise.all([getAthleteProgress(actor, actor.athleteId), getAthleteLoad(actor, actor.athleteId, {})]);
  return (
    <div className="flex flex-col gap-4 pb-20">
      <h1 className="font-display text-3xl font-bold">Your progress</h1>
      <ProgressView progress={progress} load={load} emptyText="Your coach hasn't placed you on a ladder yet." />
    </div>
  );
}
