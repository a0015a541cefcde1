import type { Metadata } from "next";
import Link from "next/link";
import { PlanEditor } from "@/components/plans/plan-editor";
import { PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";

export const metadata: Metadata = { title: "New plan" };

export default async function NewPlanPage() {
  await requirePageActor("staff");
  return (
    <>
      <Link href="/coach/plans" className="text-sm font-semibold text-moss hover:underline">
        ← All plans
      </Link>
      <PageHeader title="New plan" lead="Pick blocks for each training day. Start every session with a warm-up." />
      <PlanEditor plan={null} />
    </>
  );
}
