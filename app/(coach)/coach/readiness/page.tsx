import type { Metadata } from "next";
import { ReadinessTable } from "@/components/review/readiness-table";
import { PageHeader } from "@/components/ui/card";
import { weekOfInstant } from "@/lib/engine/iso-week";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { listReviewFilters } from "@/lib/server/readiness/list-review-filters";

export const metadata: Metadata = { title: "This week" };

export default async function ReadinessPage() {
  const actor = await requirePageActor("staff");
  const { ladders, squads } = await listReviewFilters(actor);
  return (
    <>
      <PageHeader
        title="This week"
        lead="Every athlete's current rung on each ladder, how ready they are for the next one, and what happened this week. Pain flags always show."
      />
      <ReadinessTable currentWeek={weekOfInstant(new Date(), actor.timeZone)} ladders={ladders} squads={squads} />
    </>
  );
}
