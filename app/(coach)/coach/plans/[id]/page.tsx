import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { PlanActions } from "@/components/plans/plan-actions";
import { PlanEditor } from "@/components/plans/plan-editor";
import { Badge, PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { orNotFound } from "@/lib/server/http/page-errors";
import { getPlan } from "@/lib/server/plans/get-plan";
import { zId } from "@/lib/validation/common";

export const metadata: Metadata = { title: "Plan" };

export default async function PlanPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  if (!zId.safeParse(id).success) notFound();
  const actor = await requirePageActor("staff");
  const plan = await orNotFound(getPlan(actor, id));
  return (
    <>
      <Link href="/coach/plans" className="text-sm font-semibold text-moss hover:underline">
        ← All plans
      </Link>
      <PageHeader
        title={plan.name}
        lead={plan.archived ? <Badge tone="ember">Archived: running assignments continue; it can&apos;t be assigned again</Badge> : undefined}
        actions={<PlanActions planId={plan.id} planName={plan.name} archived={plan.archived} />}
      />
      <PlanEditor key={plan.updatedAt} plan={plan} />
    </>
  );
}
