import type { Metadata } from "next";
import Link from "next/link";
import { PlanList } from "@/components/plans/plan-list";
import { buttonClass } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";

export const metadata: Metadata = { title: "Plans" };

export default async function PlansPage() {
  await requirePageActor("staff");
  return (
    <>
      <PageHeader
        title="Plans"
        lead="Blocks on weekdays over a number of weeks. Assign a plan to an athlete or a whole squad."
        actions={
          <Link href="/coach/plans/new" className={buttonClass()}>
            New plan
          </Link>
        }
      />
      <PlanList />
    </>
  );
}
