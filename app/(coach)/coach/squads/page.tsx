import type { Metadata } from "next";
import { SquadManager } from "@/components/squads/squad-manager";
import { PageHeader } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";

export const metadata: Metadata = { title: "Squads" };

export default async function SquadsPage() {
  await requirePageActor("staff");
  return (
    <>
      <PageHeader title="Squads" lead="Groups of athletes who train together. Give a whole squad a plan from the Plans page." />
      <SquadManager />
    </>
  );
}
