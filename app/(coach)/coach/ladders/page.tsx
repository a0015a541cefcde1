import type { Metadata } from "next";
import { LadderLibrary } from "@/components/ladders/ladder-library";
import { Notice, PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";
import { STARTER_LIBRARY_NOTICE } from "@/lib/starter-library";

export const metadata: Metadata = { title: "Ladders" };

export default async function LaddersPage() {
  await requirePageActor("staff");
  return (
    <>
      <PageHeader
        title="Ladders"
        lead="Progressions toward each target skill, with a readiness standard on every rung. Starter ladders are yours to edit."
      />
      <div className="mb-6">
        <Notice tone="ember">{STARTER_LIBRARY_NOTICE}</Notice>
      </div>
      <LadderLibrary />
    </>
  );
}
